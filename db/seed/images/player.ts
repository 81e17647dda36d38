// A player with an instrument: the figure, the instrument held in its frame, and the arms joining the
// shoulders to the hands' poses, drawn back to front so the right forearm lies over the lower bout.
import { apply, IDENTITY, mix, mul, frame, type Mat, type Pt } from "./geom";
import { type Pen } from "./pen";
import { drawCuff, drawChair, drawLegs, drawSleeve, drawTorso, SKELETON, type Posture } from "./figure";
import { drawHand, leftHandPose, rightHandPose } from "./hands";
import { drawHead } from "./head";
import { bodyHalf, type Geometry } from "./instrument";
import { drawInstrument } from "./instruments";
import type { Palette } from "./look";
import type { Rng } from "./random";
import type { FigureSpec, InstrumentSpec, LeftHandSpec, RightHandSpec } from "./types";

export type Hold = {
  /** Tail of the instrument in the figure frame (mm) and its angle above the horizontal. */
  tail: Pt;
  angle: number;
  /** Elbows in the figure frame. */
  elbowL: Pt;
  headTilt: number;
  turn: number;
};

export const HOLDS: Record<"seated" | "standing" | "theorbo" | "lute", Hold> = {
  seated: { tail: [-400, 40], angle: 32, elbowL: [345, -150], headTilt: -7, turn: 0.35 },
  standing: { tail: [-360, -120], angle: 30, elbowL: [370, -200], headTilt: -6, turn: 0.3 },
  lute: { tail: [-430, 30], angle: 22, elbowL: [380, -120], headTilt: -5, turn: 0.3 },
  theorbo: { tail: [-130, 120], angle: 64, elbowL: [330, -330], headTilt: 4, turn: -0.25 },
};

export type PlayerCtx = {
  pen: Pen;
  figure: Mat;
  posture: Posture;
  fig: FigureSpec;
  hold: Hold;
  inst: InstrumentSpec;
  g: Geometry;
  rh: RightHandSpec | null;
  lh: LeftHandSpec | null;
  pal: Palette;
  rng: Rng;
  chair: boolean;
  strap: boolean;
};

export function drawPlayer(c: PlayerCtx) {
  const { pen, figure, fig, hold, g, pal } = c;
  const inst = mul(figure, frame(hold.tail, hold.angle, 1));
  const px = (m: Mat, p: Pt) => apply(m, p);
  const rpose = c.rh ? rightHandPose(g, c.rh) : null;
  const lpose = c.lh ? leftHandPose(g, c.lh) : null;
  const s = Math.hypot(figure[0], figure[1]);
  const woman = fig.sex === "woman";

  pen.with(figure, () => {
    if (c.chair) drawChair(pen, pal);
    if (fig.cloak) cloak(pen, pal);
    drawLegs(pen, fig, c.posture, pal);
    drawTorso(pen, fig, pal, c.rng);
  });
  if (c.strap) strap(c, inst);
  const shR = px(figure, SKELETON.shoulderR), shL = px(figure, SKELETON.shoulderL);
  const elbowR = rpose?.elbow ? px(inst, rpose.elbow) : px(figure, [-300, -180]);
  pen.with(IDENTITY, () => {
    drawSleeve(pen, [shR, mix(shR, elbowR, 0.5), elbowR], [112 * s, 104 * s, 94 * s], pal, woman);
    if (lpose) {
      const wl = px(inst, lpose.wrist);
      // Turning a peg lifts the elbow out to the side, below and beyond the hand.
      const wf = apply(frame(hold.tail, hold.angle, 1), lpose.wrist);
      const el = px(figure, c.lh?.action === "turn-peg" ? [wf[0] + 110, wf[1] + 270] : hold.elbowL);
      drawSleeve(pen, [shL, mix(shL, el, 0.5), el], [112 * s, 102 * s, 92 * s], pal, woman);
      drawSleeve(pen, [el, mix(el, wl, 0.5), wl], [92 * s, 82 * s, 72 * s], pal, woman);
      drawCuff(pen, wl, el, 72 * s, pal);
    }
  });
  pen.with(mul(figure, frame(SKELETON.head, hold.headTilt, 1)), () => drawHead(pen, fig, pal, hold.turn));
  pen.with(inst, () => drawInstrument(pen, g, c.inst, pal, c.rng));
  if (rpose) {
    const wr = px(inst, rpose.wrist);
    pen.with(IDENTITY, () => {
      drawSleeve(pen, [elbowR, mix(elbowR, wr, 0.5), wr], [94 * s, 84 * s, 72 * s], pal, woman);
      drawCuff(pen, wr, elbowR, 72 * s, pal);
    });
    pen.with(inst, () => drawHand(pen, rpose, pal, "rightHand"));
  }
  if (lpose) pen.with(inst, () => drawHand(pen, lpose, pal, "leftHand"));
  return { inst };
}

/** A ribbon strap from the neck heel up over the left shoulder, and from the tail under the right arm. */
function strap(c: PlayerCtx, inst: Mat) {
  const { pen, figure, g, pal } = c;
  const s = Math.hypot(figure[0], figure[1]);
  const heel = apply(inst, [g.joinX + 8, -g.joinHalf - 4]);
  const tail = apply(inst, [4, -bodyHalf(g, 40) + 20]);
  const runs: [Pt, Pt, Pt, Pt][] = [
    [heel, apply(figure, [150, -380]), apply(figure, [110, -560]), apply(figure, [70, -610])],
    [tail, apply(figure, [-260, -200]), apply(figure, [-220, -300]), apply(figure, [-190, -360])],
  ];
  pen.with(IDENTITY, () => {
    for (const [a, b, c2, d] of runs) {
      pen.path([["M", a], ["C", b, c2, d]], { stroke: "#0a0604", sw: 34 * s });
      pen.path([["M", a], ["C", b, c2, d]], { stroke: pal.cloth2, sw: 30 * s });
      pen.path([["M", a], ["C", b, c2, d]], { stroke: pal.gold, sw: 4, dash: "14 10", op: 0.8 });
    }
  });
}

/** A cloak thrown over the left shoulder, hanging behind the figure to below the knee. */
function cloak(pen: Pen, pal: Palette) {
  pen.smooth([[-120, -590], [120, -600], [250, -560], [330, -300], [390, 100], [420, 520], [140, 560], [-200, 520], [-300, 200], [-260, -300]], {
    fill: pen.linear([100, -560], [360, 300], [[0, pal.cloth2], [1, pal.cloth2Dark]]),
    stroke: "#0a0604",
    sw: 2.4,
  });
}
