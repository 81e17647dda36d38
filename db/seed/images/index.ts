// Invented demo pictures for the seed: `tsx db/seed/images/index.ts .data/demo-images/` renders all
// scenes as NN-slug.jpg and prints the time each took.
import { mkdir, writeFile } from "node:fs/promises";
import path from "node:path";
import { drawScene, renderScene, sceneEvidence } from "./draw";
import { DEMO_SCENES } from "./scenes";

export { DEMO_SCENES, drawScene, renderScene, sceneEvidence };
export type { Evidence, Rect, SceneParams, SceneSpec } from "./types";

export async function renderAll(dir: string, log: (line: string) => void = console.log) {
  await mkdir(dir, { recursive: true });
  const files: string[] = [];
  for (const [i, scene] of DEMO_SCENES.entries()) {
    const started = performance.now();
    const { jpeg, width, height } = await renderScene(scene);
    const file = path.join(dir, `${String(i + 1).padStart(2, "0")}-${scene.slug}.jpg`);
    await writeFile(file, jpeg);
    files.push(file);
    log(`${file}  ${width}×${height}  ${(jpeg.length / 1e6).toFixed(1)} MB  ${((performance.now() - started) / 1000).toFixed(2)} s`);
  }
  return files;
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const dir = process.argv[2];
  if (!dir) {
    console.error("usage: tsx db/seed/images/index.ts <output folder>");
    process.exit(1);
  }
  await renderAll(dir);
}
