// Writes the image benchmark's results (JSON for machines, Markdown for people) and prints a summary.
import { mkdirSync, renameSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { ROOT } from "../database";
import type { ImagesReport, Series, SizeResult } from "./run";

const RESULTS = join(ROOT, "tests/bench/results");
const TARGET = 1.5;

function atomicWrite(file: string, text: string) {
  writeFileSync(`${file}.tmp`, text);
  renameSync(`${file}.tmp`, file);
}

function table(head: string[], rows: string[][]): string {
  const line = (cells: string[]) => `| ${cells.map((c) => c.replace(/\|/g, "\\|")).join(" | ")} |`;
  return [line(head), line(head.map(() => "---")), ...rows.map(line)].join("\n");
}

const s = (ms: number) => (ms / 1000).toFixed(2);
const mb = (n: number) => n.toFixed(0);
const split = (x: Series) => (x.peakAnonMb && x.peakFileMb ? `${mb(x.peakAnonMb.p50)} / ${mb(x.peakFileMb.p50)}` : "–");
const row = (name: string, x: Series, extra: string[] = []) => [
  name, s(x.ms.p50), s(x.ms.min), s(x.ms.max), String(x.ms.n), s(x.cpuMs.p50), mb(x.peakMb.p50), split(x), x.riseMb ? mb(x.riseMb.p50) : "–", ...extra,
];
const HEAD = ["what", "p50 s", "min s", "max s", "runs", "CPU p50 s", "peak RSS MB", "anon / file-mapped MB", "rise MB"];
const verdict = (r: number) => (r <= TARGET ? `within the target of ≤ ${TARGET}` : `above the target of ≤ ${TARGET}`);

function sizeSection(r: SizeResult): string[] {
  const p = r.picture;
  const ph = r.phases;
  const phaseSum = ["decode", "tile", "thumbnail", "preview"].reduce((a, k) => a + (ph[k]?.ms.p50 ?? 0), 0);
  const cmp = r.tiles.pipelineVsDzsave;
  const out = [
    `## ${p.id.toUpperCase()}: ${p.width} × ${p.height} (${((p.width * p.height) / 1e6).toFixed(1)} MP), JPEG q90, ${(p.bytes / 1e6).toFixed(1)} MB`,
    "",
    table(
      [...HEAD, "tiles", "tiles MB"],
      [
        row("buildDerivatives (the pipeline)", r.pipeline, [String(r.tiles.pipeline.count), r.tiles.pipeline.megabytes.toFixed(1)]),
        row("  its tiling step alone", ph.tile, ["", ""]),
        row("vips dzsave (8.14 CLI)", r.dzsave, [String(r.tiles.dzsave.count), r.tiles.dzsave.megabytes.toFixed(1)]),
        row("variant: tiles without optimiseCoding", r.variant, [String(r.tiles.variant.count), r.tiles.variant.megabytes.toFixed(1)]),
      ],
    ),
    "",
    `**Ratio pipeline ÷ vips dzsave: ${r.ratio.p50}** (p50 ÷ p50; ${verdict(r.ratio.p50)}). Median of the paired runs' ratios ${r.ratio.pairedMedian}; CPU time ${r.ratio.cpu}; the tiling step alone ÷ dzsave ${r.ratio.tileStep}; the variant ÷ dzsave ${r.ratio.variant}.`,
    "",
    `**Peak memory of the pipeline: ${mb(r.pipeline.peakMb.p50)} MB** RSS (max ${mb(r.pipeline.peakMb.max)}), ${mb(r.pipelineWorkMb)} MB above the Node process it ran in (sharp and the app's modules loaded); at the peaks about ${r.pipeline.peakAnonMb ? mb(r.pipeline.peakAnonMb.p50) : "?"} MB anonymous and ${r.pipeline.peakFileMb ? mb(r.pipeline.peakFileMb.p50) : "?"} MB file-mapped, ${r.pipeline.fileRiseMb ? mb(r.pipeline.fileRiseMb.p50) : "?"} MB of that mapped during the work (libvips maps the ${((p.width * p.height * 3) / 1e6).toFixed(0)} MB \`normalised.v\` file: page cache, which the kernel can reclaim). vips dzsave: ${mb(r.dzsave.peakMb.p50)} MB for the whole process.`,
    "",
    "The pipeline's steps, each timed on its own in one process (the same calls and options as buildDerivatives). Peak = VmHWM, reset before each step, so it includes what earlier steps left resident; \"rise\" is the peak minus the RSS at the step's start; the anonymous / file-mapped split is sampled every 10 ms:",
    "",
    table(HEAD, Object.entries(ph).map(([k, v]) => row(k === "tileVariant" ? "tile, without optimiseCoding" : k, v))),
    "",
    `Sum of decode, tile, thumbnail and preview p50: ${s(phaseSum)} s (buildDerivatives p50 ${s(r.pipeline.ms.p50)} s).`,
    "",
    `Tiles: the pipeline wrote ${r.tiles.pipeline.count}, dzsave ${r.tiles.dzsave.count}, the IIIF grid of lib/iiif/tiles.ts expects ${r.tiles.expected}; the pipeline's paths ${r.tiles.pipelineMatchesTileGrid ? "are exactly" : "are NOT"} that grid. Pipeline and dzsave: ${cmp.same ? "the same paths" : `different paths (only the pipeline: ${cmp.onlyInFirst.slice(0, 3).join(", ")}…; only dzsave: ${cmp.onlyInSecond.slice(0, 3).join(", ")}…)`}${cmp.wholeImageNames[0] !== cmp.wholeImageNames[1] ? `, except that the tile holding the whole image is \`${cmp.wholeImageNames[0]}/…\` from sharp (libvips ≥ 8.15 writes the canonical \`full\`) and \`${cmp.wholeImageNames[1]}/…\` from libvips 8.14` : ""}.`,
    "",
  ];
  if (r.firstView) {
    const f = r.firstView;
    out.push(
      "### What a viewer waits for",
      "",
      "Tiles exist only once the whole pyramid is written (and then uploaded, which is not timed here), so the first tile a viewer can show comes after buildDerivatives has finished. Producing only what it shows first, each on its own from the original JPEG:",
      "",
      table(HEAD, [
        row("buildDerivatives (first tile today, before upload)", r.pipeline),
        row("a 1024 px overview (resize, shrink-on-load)", f.overview1024),
        row(`the top levels (scale factors ${f.topLevelFactors.join(", ")}: ${f.topLevelTiles} tiles)`, f.topLevels),
      ]),
      "",
      `**Wait for the first tile of a 100 MP image: ${s(r.pipeline.ms.p50)} s** (p50) of sharp work before the upload starts; the overview alone takes ${s(f.overview1024.ms.p50)} s and the top levels ${s(f.topLevels.ms.p50)} s. The top-level tiles were written at the pyramid's own paths (${f.pathsInPyramid ? "all of them are in the full pyramid" : "NOT all found in the full pyramid"}).`,
      "",
    );
  }
  return out;
}

function markdown(r: ImagesReport): string {
  const m = r.machine;
  const v = r.versions;
  return [
    "# Image pipeline benchmark",
    "",
    `${r.date} · ${m.cpus} × ${m.cpuModel}, ${m.memoryGb} GB, ${m.platform}, Node ${v.node} · sharp ${v.sharp} with libvips ${v.sharpLibvips} (${v.jpegInSharp}), vips CLI ${v.vipsCli} (Debian libvips-tools) · sharp concurrency ${r.settings.sharpConcurrency} · load at start ${(m.loadAverageAtStart as number[]).join(" / ")}, at end ${(m.loadAverageAtEnd as number[]).join(" / ")} · whole run ${(r.runMs / 1000).toFixed(0)} s.`,
    "",
    `Seconds over ${JSON.stringify(r.settings.repetitions).replace(/"/g, "")} runs after ${r.settings.warmup} warm-up run; each run of each tool is a fresh process, and the order of the tools alternates from one run to the next. sharp's times are measured inside its process (Node's start and module loading left out); dzsave's are wall time of the whole \`${r.settings.dzsave}\` process, its CPU and peak RSS from GNU time. The pipeline's peak RSS is VmHWM of its Node process. The machine is shared with other developers: compare runs by the CPU column and the ratio first, by the seconds second.`,
    "",
    ...Object.values(r.sizes).flatMap((x) => sizeSection(x!)),
  ].join("\n");
}

export function writeImagesReports(r: ImagesReport) {
  mkdirSync(RESULTS, { recursive: true });
  atomicWrite(join(RESULTS, "images.json"), `${JSON.stringify(r, null, 2)}\n`);
  atomicWrite(join(RESULTS, "images.md"), `${markdown(r)}\n`);
}

export function printImagesSummary(r: ImagesReport) {
  console.log(`\nimages: sharp ${r.versions.sharp} (libvips ${r.versions.sharpLibvips}, concurrency ${r.settings.sharpConcurrency}) vs vips CLI ${r.versions.vipsCli}; load ${(r.machine.loadAverageAtStart as number[])[0]} → ${(r.machine.loadAverageAtEnd as number[])[0]}`);
  for (const x of Object.values(r.sizes)) {
    if (!x) continue;
    const p = x.picture;
    console.log(
      `${p.id.padEnd(5)} pipeline p50 ${s(x.pipeline.ms.p50)} s (min ${s(x.pipeline.ms.min)}, max ${s(x.pipeline.ms.max)}), tiling alone ${s(x.phases.tile.ms.p50)} s, dzsave p50 ${s(x.dzsave.ms.p50)} s (min ${s(x.dzsave.ms.min)}, max ${s(x.dzsave.ms.max)})` +
        ` → ratio ${x.ratio.p50} (paired ${x.ratio.pairedMedian}, CPU ${x.ratio.cpu}; target ≤ ${TARGET}); without optimiseCoding ${s(x.variant.ms.p50)} s → ratio ${x.ratio.variant}`,
    );
    console.log(`      peak RSS pipeline ${mb(x.pipeline.peakMb.p50)} MB (${mb(x.pipelineWorkMb)} MB above Node, ${x.pipeline.fileRiseMb ? mb(x.pipeline.fileRiseMb.p50) : "?"} MB of that the mmapped .v file), dzsave ${mb(x.dzsave.peakMb.p50)} MB; tiles ${x.tiles.pipeline.count} / ${x.tiles.dzsave.count}, same paths: ${x.tiles.pipelineVsDzsave.same}`);
    if (x.firstView)
      console.log(`      first tile after ${s(x.pipeline.ms.p50)} s (whole pyramid); alone: 1024 px overview ${s(x.firstView.overview1024.ms.p50)} s, top levels (${x.firstView.topLevelTiles} tiles) ${s(x.firstView.topLevels.ms.p50)} s, peak ${mb(x.firstView.topLevels.peakMb.p50)} MB`);
  }
  console.log(`results in tests/bench/results/images.{json,md} (images part took ${(r.runMs / 1000).toFixed(0)} s)`);
}
