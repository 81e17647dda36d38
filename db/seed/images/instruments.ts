// One entry point for drawing any of the instruments in its own frame, and the counts a scholar
// would read off it (the same numbers the drawing used).
import { drawCittern } from "./cittern";
import type { Pen } from "./pen";
import { drawFlatHeaded } from "./guitar";
import { stringCount, type Geometry } from "./instrument";
import type { Palette } from "./look";
import { drawLute, drawTheorbo, THEORBO_DIAPASONS } from "./lute";
import type { Rng } from "./random";
import type { Evidence, InstrumentSpec } from "./types";

export function drawInstrument(pen: Pen, g: Geometry, spec: InstrumentSpec, pal: Palette, rng: Rng) {
  switch (spec.kind) {
    case "guitar":
    case "vihuela":
      return drawFlatHeaded(pen, g, spec, pal, rng);
    case "lute":
      return drawLute(pen, g, pal, rng);
    case "theorbo":
      return drawTheorbo(pen, g, pal, rng);
    case "cittern":
      return drawCittern(pen, g, spec, pal, rng);
  }
}

export function instrumentCounts(g: Geometry, spec: InstrumentSpec): Omit<Evidence["instrument"], "rect"> {
  const theorbo = spec.kind === "theorbo";
  const perCourse = theorbo ? [...g.stringsPerCourse, ...Array<number>(THEORBO_DIAPASONS).fill(1)] : g.stringsPerCourse;
  const strings = stringCount(g) + (theorbo ? THEORBO_DIAPASONS : 0);
  const pegs = g.pegs.length + (theorbo ? THEORBO_DIAPASONS : 0);
  return {
    kind: spec.kind,
    courses: perCourse.length,
    strings,
    stringsPerCourse: perCourse,
    pegs,
    pegPlacement: spec.kind === "lute" || theorbo ? "side" : "rear",
    unusedPegs: pegs - strings,
    unusedPegVisible: pegs > strings && spec.unusedPegVisible,
    frets: g.frets.length - 1,
    fretKind: spec.kind === "cittern" ? "fixed-metal" : "tied-gut",
    fretSlant: spec.fretSlant,
  };
}
