// The images part of `npm run bench` (alone: `npm run bench -- images`): times the real sharp
// pipeline (buildDerivatives in lib/images/process.ts) against libvips' own `vips dzsave` on a 24 MP
// photograph, and what a viewer waits for on a 100 MP one. Writes tests/bench/results/images.{json,md}.
// A measurement, not a test: nothing here fails on timing.
import { rmSync } from "node:fs";
import os from "node:os";
import { join } from "node:path";
import sharp from "sharp";
import { scaleFactorsFor, tileGrid } from "../../../lib/iiif/tiles";
import { stats, type Stats } from "../measure";
import { picture, IMAGES_DIR, type Picture, type PictureId } from "./generate";
import { printImagesSummary, writeImagesReports } from "./report";
import { child, compareTiles, dzsave, ensureTools, listTiles, type Run, type TileComparison } from "./tools";

const REPS = Number(process.env.BENCH_IMAGE_REPS ?? 5);
const BIG_REPS = Number(process.env.BENCH_IMAGE_BIG_REPS ?? 3);
const WARMUP = 1;
const WORK = join(IMAGES_DIR, "work");
const TILE = 512;
/** sharp's thread count in the children, as the app's worker would have it (1 on glibc unless MALLOC_ARENA_MAX is set). */
let sharpConcurrency: number | null = null;

export type Series = {
  ms: Stats;
  cpuMs: Stats;
  peakMb: Stats;
  /** For sharp's steps: the peak's anonymous and file-mapped parts, and the rise above the step's start. */
  peakAnonMb?: Stats;
  peakFileMb?: Stats;
  riseMb?: Stats;
  /** File-mapped pages added during the step (the shared libraries were mapped before it). */
  fileRiseMb?: Stats;
  runs: (Run & { beforeMb?: number; beforeFileMb?: number; processPeakMb?: number; peakAnonMb?: number; peakFileMb?: number })[];
};
export type Tiles = { count: number; megabytes: number };
export type SizeResult = {
  picture: Picture;
  pipeline: Series;
  dzsave: Series;
  /** buildDerivatives with the tiles' Huffman tables left unoptimised (child.ts, VARIANT_TILES). */
  variant: Series;
  phases: Record<string, Series>;
  firstView: { overview1024: Series; topLevels: Series; topLevelTiles: number; topLevelFactors: number[]; pathsInPyramid: boolean } | null;
  ratio: { p50: number; pairedMedian: number; cpu: number; tileStep: number; variant: number };
  /** The pipeline's peak above the Node process it ran in (which had loaded sharp and the app's modules). */
  pipelineWorkMb: number;
  tiles: { pipeline: Tiles; dzsave: Tiles; variant: Tiles; expected: number; pipelineMatchesTileGrid: boolean; pipelineVsDzsave: TileComparison };
};
export type ImagesReport = {
  benchmark: "images";
  date: string;
  machine: Record<string, unknown>;
  versions: { node: string; sharp: string; sharpLibvips: string; vipsCli: string; jpegInSharp: string };
  settings: Record<string, unknown>;
  sizes: Partial<Record<PictureId, SizeResult>>;
  runMs: number;
};

const phase = (name: string, t: number) => console.log(`bench: images: ${name} in ${((performance.now() - t) / 1000).toFixed(1)} s`);
const ratio = (a: number, b: number) => Math.round((a / b) * 100) / 100;
const median = (xs: number[]) => stats(xs).p50;
const tiles = (t: { count: number; bytes: number }): Tiles => ({ count: t.count, megabytes: Math.round(t.bytes / 1e4) / 100 });

function series(runs: Series["runs"]): Series {
  const out: Series = { ms: stats(runs.map((r) => r.ms)), cpuMs: stats(runs.map((r) => r.cpuMs)), peakMb: stats(runs.map((r) => r.peakMb)), runs };
  if (runs.every((r) => r.beforeMb !== undefined)) {
    out.peakAnonMb = stats(runs.map((r) => r.peakAnonMb!));
    out.peakFileMb = stats(runs.map((r) => r.peakFileMb!));
    out.riseMb = stats(runs.map((r) => r.peakMb - r.beforeMb!));
    out.fileRiseMb = stats(runs.map((r) => r.peakFileMb! - r.beforeFileMb!));
  }
  return out;
}

/** A child's step as a Run: time inside the process (Node's start and module loading left out). */
function stepRun(r: Awaited<ReturnType<typeof child>>, name: string): Series["runs"][number] {
  sharpConcurrency = r.sharpConcurrency;
  const s = r.steps[name];
  const m = s.memory;
  return { ms: s.ms, cpuMs: s.cpuMs, peakMb: m?.peakMb ?? r.processPeakMb, beforeMb: m?.beforeMb, beforeFileMb: m?.beforeFileMb, peakAnonMb: m?.peakAnonMb, peakFileMb: m?.peakFileMb, processPeakMb: r.processPeakMb, load1: r.load1 };
}

async function measureSize(p: Picture, reps: number): Promise<SizeResult> {
  const work = (name: string) => join(WORK, `${p.id}-${name}`);
  const runs = { pipeline: [] as Series["runs"], dzsave: [] as Series["runs"], variant: [] as Series["runs"], overview: [] as Series["runs"], top: [] as Series["runs"] };
  const phaseRuns: Record<string, Series["runs"]> = {};
  let tileSets: { pipeline: ReturnType<typeof listTiles>; dzsave: ReturnType<typeof listTiles>; variant: ReturnType<typeof listTiles> } | null = null;
  let top: { tiles: string[] } | null = null;
  const big = p.id === "100mp";
  for (let i = 0; i < WARMUP + reps; i++) {
    const timed = i >= WARMUP;
    const keep = (list: Series["runs"], r: Series["runs"][number]) => void (timed && list.push(r));
    const tasks: [string, () => Promise<void>][] = [
      ["pipeline", async () => keep(runs.pipeline, stepRun(await child("pipeline", p.path, work("pipeline")), "total"))],
      ["dzsave", async () => keep(runs.dzsave, await dzsave(p.path, work("dzsave")))],
      ["variant", async () => keep(runs.variant, stepRun(await child("variant", p.path, work("variant")), "total"))],
      [
        "phases",
        async () => {
          const r = await child("phases", p.path, work("phases"));
          if (timed) for (const name of Object.keys(r.steps)) (phaseRuns[name] ??= []).push(stepRun(r, name));
        },
      ],
    ];
    if (big)
      tasks.push([
        "first-view",
        async () => {
          const r = await child("first-view", p.path, work("first-view"));
          top = { tiles: r.tiles ?? [] };
          keep(runs.overview, stepRun(r, "overview1024"));
          keep(runs.top, stepRun(r, "topLevels"));
        },
      ]);
    // Alternate the order, so that neither tool always runs right after the other's disk writes.
    if (i % 2) tasks.reverse();
    const t = performance.now();
    for (const [, fn] of tasks) await fn();
    if (!tileSets) tileSets = { pipeline: listTiles(join(work("pipeline"), "tiles")), dzsave: listTiles(work("dzsave")), variant: listTiles(join(work("variant"), "tiles")) };
    console.log(`bench: images: ${p.id} ${timed ? `run ${i}/${reps}` : "warm-up"} in ${((performance.now() - t) / 1000).toFixed(1)} s (load ${os.loadavg()[0].toFixed(2)})`);
  }
  rmSync(WORK, { recursive: true, force: true });
  const pipeline = series(runs.pipeline);
  const dz = series(runs.dzsave);
  const variant = series(runs.variant);
  const phases = Object.fromEntries(Object.entries(phaseRuns).map(([k, v]) => [k, series(v)]));
  const expected = tileGrid(p.width, p.height, TILE, scaleFactorsFor(p.width, p.height, TILE)).map((t) => t.path);
  const sets = tileSets!;
  const pyramid = new Set(sets.pipeline.paths);
  const topTiles = (top as { tiles: string[] } | null)?.tiles ?? [];
  return {
    picture: p,
    pipeline,
    dzsave: dz,
    variant,
    phases,
    firstView: big
      ? {
          overview1024: series(runs.overview),
          topLevels: series(runs.top),
          topLevelTiles: topTiles.length,
          topLevelFactors: scaleFactorsFor(p.width, p.height, TILE).filter((s) => Math.max(Math.ceil(p.width / s), Math.ceil(p.height / s)) <= 2048),
          pathsInPyramid: topTiles.length > 0 && topTiles.every((t) => pyramid.has(t)),
        }
      : null,
    ratio: {
      p50: ratio(pipeline.ms.p50, dz.ms.p50),
      pairedMedian: median(runs.pipeline.map((r, k) => ratio(r.ms, runs.dzsave[k].ms))),
      cpu: ratio(pipeline.cpuMs.p50, dz.cpuMs.p50),
      tileStep: ratio(phases.tile.ms.p50, dz.ms.p50),
      variant: ratio(variant.ms.p50, dz.ms.p50),
    },
    pipelineWorkMb: pipeline.riseMb?.p50 ?? NaN,
    tiles: {
      pipeline: tiles(sets.pipeline),
      dzsave: tiles(sets.dzsave),
      variant: tiles(sets.variant),
      expected: expected.length,
      pipelineMatchesTileGrid: compareTiles(sets.pipeline.paths, expected, p.width, p.height).same,
      pipelineVsDzsave: compareTiles(sets.pipeline.paths, sets.dzsave.paths, p.width, p.height),
    },
  };
}

export async function runImagesBench(): Promise<ImagesReport> {
  const started = performance.now();
  const loadAverageAtStart = os.loadavg().map((l) => Math.round(l * 100) / 100);
  let t = performance.now();
  const { vipsCli } = ensureTools();
  rmSync(WORK, { recursive: true, force: true });
  const small = await picture("24mp");
  const large = await picture("100mp");
  phase(small.generatedMs === null && large.generatedMs === null ? "reused the test images" : "generated the test images", t);

  const sizes: ImagesReport["sizes"] = {};
  t = performance.now();
  sizes["24mp"] = await measureSize(small, REPS);
  phase("24 MP measured", t);
  t = performance.now();
  sizes["100mp"] = await measureSize(large, BIG_REPS);
  phase("100 MP measured", t);

  const report: ImagesReport = {
    benchmark: "images",
    date: new Date().toISOString(),
    machine: {
      platform: `${os.platform()} ${os.release()}`,
      arch: os.arch(),
      cpus: os.cpus().length,
      cpuModel: os.cpus()[0]?.model ?? "unknown",
      memoryGb: Math.round(os.totalmem() / 2 ** 30),
      loadAverageAtStart,
      loadAverageAtEnd: os.loadavg().map((l) => Math.round(l * 100) / 100),
      tmpdir: os.tmpdir(),
    },
    versions: { node: process.version, sharp: sharp.versions.sharp ?? "?", sharpLibvips: sharp.versions.vips, vipsCli, jpegInSharp: sharp.versions.mozjpeg ? `mozjpeg ${sharp.versions.mozjpeg}` : "?" },
    settings: {
      repetitions: { "24mp": REPS, "100mp": BIG_REPS },
      warmup: WARMUP,
      sharpConcurrency,
      tileSize: TILE,
      tileQuality: 85,
      dzsave: "vips dzsave IN OUT --layout iiif3 --tile-size 512 --overlap 0 --suffix .jpg[Q=85]",
      workDir: WORK,
    },
    sizes,
    runMs: Math.round(performance.now() - started),
  };
  writeImagesReports(report);
  printImagesSummary(report);
  return report;
}
