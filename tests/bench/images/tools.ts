// The outside programs the image benchmark runs: Debian's vips CLI (the reference), GNU time (its
// peak memory), and our own child process (tests/bench/images/child.ts) for the sharp side.
import { spawn, spawnSync } from "node:child_process";
import { existsSync, readdirSync, readFileSync, rmSync } from "node:fs";
import { loadavg } from "node:os";
import { join, relative } from "node:path";
import { ROOT } from "../database";
import type { ChildResult } from "./child";

const CHILD = join(ROOT, "tests/bench/images/child.ts");
const TIME = "/usr/bin/time";
const TIMEOUT_MS = 180_000;

const works = (cmd: string, args: string[]) => spawnSync(cmd, args, { encoding: "utf8" }).status === 0;

function aptInstall(pkg: string) {
  const install = () => spawnSync("apt-get", ["install", "-y", "--no-install-recommends", pkg], { stdio: "inherit", env: { ...process.env, DEBIAN_FRONTEND: "noninteractive" } }).status === 0;
  console.log(`bench: installing ${pkg} with apt-get`);
  if (install()) return;
  spawnSync("apt-get", ["update"], { stdio: "inherit" });
  if (!install()) throw new Error(`could not install ${pkg}: run apt-get install ${pkg} by hand (as root)`);
}

/** The vips CLI (package libvips-tools) and GNU time, installed with apt-get when missing. */
export function ensureTools(): { vipsCli: string } {
  if (!works("vips", ["--version"])) aptInstall("libvips-tools");
  if (!existsSync(TIME)) aptInstall("time");
  return { vipsCli: spawnSync("vips", ["--version"], { encoding: "utf8" }).stdout.trim().replace(/^vips-/, "") };
}

export type Run = { ms: number; cpuMs: number; peakMb: number; load1: number };

/** `vips dzsave` as the reference: wall time measured here, CPU and peak RSS from GNU time. */
export async function dzsave(input: string, out: string): Promise<Run> {
  rmSync(out, { recursive: true, force: true });
  const stats = `${out}.time`;
  // libvips 8.14 defaults iiif3 to 256 px tiles and no overlap; both given, to match sharp's call.
  const args = ["-f", "%U %S %M", "-o", stats, "vips", "dzsave", input, out, "--layout", "iiif3", "--tile-size", "512", "--overlap", "0", "--suffix", ".jpg[Q=85]"];
  const load1 = loadavg()[0];
  const t = performance.now();
  await run(TIME, args);
  const ms = performance.now() - t;
  const [user, sys, maxKb] = readFileSync(stats, "utf8").trim().split("\n").at(-1)!.split(/\s+/).map(Number);
  rmSync(stats, { force: true });
  return { ms: Math.round(ms), cpuMs: Math.round((user + sys) * 1000), peakMb: Math.round(maxKb / 102.4) / 10, load1: round2(load1) };
}

/** One task of child.ts in a fresh Node process (tsx as the loader), its RESULT line parsed. */
export async function child(task: string, input: string, work: string, env: Record<string, string> = {}): Promise<ChildResult & { wallMs: number; load1: number }> {
  rmSync(work, { recursive: true, force: true });
  const load1 = loadavg()[0];
  const t = performance.now();
  const stdout = await run(process.execPath, ["--import", "tsx", CHILD, task, input, work], env);
  const line = stdout.split("\n").find((l) => l.startsWith("RESULT "));
  if (!line) throw new Error(`child ${task} printed no result:\n${stdout}`);
  return { ...(JSON.parse(line.slice(7)) as ChildResult), wallMs: Math.round(performance.now() - t), load1: round2(load1) };
}

function run(cmd: string, args: string[], env: Record<string, string> = {}): Promise<string> {
  return new Promise((resolve, reject) => {
    const p = spawn(cmd, args, { cwd: ROOT, env: { ...process.env, ...env }, stdio: ["ignore", "pipe", "pipe"] });
    let out = "";
    let err = "";
    p.stdout.on("data", (d) => (out += d));
    p.stderr.on("data", (d) => (err += d));
    const timer = setTimeout(() => p.kill("SIGKILL"), TIMEOUT_MS);
    p.on("error", reject);
    p.on("close", (code, signal) => {
      clearTimeout(timer);
      if (code === 0) resolve(out);
      else reject(new Error(`${cmd} ${args.slice(0, 4).join(" ")} … exited with ${code ?? signal}:\n${err.slice(-2000)}`));
    });
  });
}

const round2 = (n: number) => Math.round(n * 100) / 100;

export type TileSet = { count: number; bytes: number; paths: string[] };

/** Every tile file under a pyramid directory (info.json and libvips' properties file left out). */
export function listTiles(dir: string): TileSet {
  const paths: string[] = [];
  let bytes = 0;
  const walk = (d: string) => {
    for (const e of readdirSync(d, { withFileTypes: true })) {
      const p = join(d, e.name);
      if (e.isDirectory()) walk(p);
      else if (e.name.endsWith(".jpg")) {
        paths.push(relative(dir, p));
        bytes += readFileSync(p).length;
      }
    }
  };
  walk(dir);
  return { count: paths.length, bytes, paths: paths.sort() };
}

export type TileComparison = { same: boolean; onlyInFirst: string[]; onlyInSecond: string[]; wholeImageNames: [string | null, string | null] };

/** Path sets compared; the tile holding the whole image may be named `full` (the canonical form,
 * libvips ≥ 8.15) or `0,0,W,H` (8.14): that one difference is reported but not counted. */
export function compareTiles(a: string[], b: string[], width: number, height: number): TileComparison {
  const whole = `0,0,${width},${height}/`;
  const norm = (p: string) => (p.startsWith(whole) ? `full/${p.slice(whole.length)}` : p);
  const wholeName = (list: string[]) => list.find((p) => p.startsWith("full/") || p.startsWith(whole))?.split("/")[0] ?? null;
  const A = new Set(a.map(norm));
  const B = new Set(b.map(norm));
  const onlyInFirst = [...A].filter((p) => !B.has(p));
  const onlyInSecond = [...B].filter((p) => !A.has(p));
  return { same: onlyInFirst.length === 0 && onlyInSecond.length === 0, onlyInFirst: onlyInFirst.slice(0, 20), onlyInSecond: onlyInSecond.slice(0, 20), wholeImageNames: [wholeName(a), wholeName(b)] };
}
