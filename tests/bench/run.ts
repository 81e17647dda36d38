// `npm run bench`: times listSources (lib/sources/queries.ts) over 100,000 invented sources in a MariaDB
// of its own, records the query plans, and writes tests/bench/results/sources-list.{json,md}; then the
// image pipeline against vips dzsave (tests/bench/images/, results in images.{json,md}).
// `npm run bench -- sources` or `npm run bench -- images` runs one part only; `npm run bench -- search`
// (against a running test stack, tests/bench/search/) runs only when named.
// A measurement, not a test: nothing here fails on timing.
import { register } from "node:module";
import os from "node:os";
import mysql from "mysql2/promise";
import type { Actor } from "../../lib/auth/policy";
import { readDating } from "../../lib/dating";
import { ACTORS, CASES, WALKS, type ListCase, type WalkCase, type Who } from "./cases";
import { BENCH_URL, startDatabase } from "./database";
import { CANDIDATES, resetCandidates, runExperiment, type ExperimentResult } from "./experiments";
import { seed } from "./generate";
import { explain, instrument, repeat, stats, type Captured, type Instrumented, type Plan, type Stats } from "./measure";
import { printSummary, writeReports } from "./report";

const REPS = Number(process.env.BENCH_REPS ?? 30);
const EXPERIMENT_REPS = Math.max(5, Math.round(REPS / 2));
const WARMUP = 3;
const started = performance.now();
let interrupted = false;

// lib/sources/queries.ts starts with import "server-only", which throws outside a React Server
// Components bundle. The package exports an empty module under the "react-server" condition; this
// hook gives the same empty module to everything the bench imports after this point.
const serverOnlyHook = `export async function resolve(specifier, context, next) {
  if (specifier === "server-only") return { url: "data:text/javascript,export {}", shortCircuit: true };
  return next(specifier, context);
}`;
register(`data:text/javascript,${encodeURIComponent(serverOnlyHook)}`);

// The search part talks to a running stack: it reads the shell's settings before they are replaced below.
const shellEnv = { ...process.env };

// The app's configuration, pointed at the bench database whatever the shell says; the other services
// are never contacted by the list query, but lib/config.ts requires their settings.
Object.assign(process.env, {
  CORDARIUM_ENV: "development",
  DATABASE_URL: BENCH_URL,
  DATABASE_POOL_SIZE: "4",
  S3_BUCKET: "cordarium-bench",
  S3_ACCESS_KEY_ID: "unused",
  S3_SECRET_ACCESS_KEY: "unused",
  MEILI_HOST: "http://127.0.0.1:1",
  SMTP_URL: "smtp://127.0.0.1:1",
  NEXTAUTH_SECRET: "bench-secret-not-used-for-anything",
});

export type CaseResult = {
  id: string;
  label: string;
  who: Who;
  query: Record<string, string | number>;
  total: number;
  returned: number;
  full: Stats;
  rowsAlone: Stats;
  countAlone: Stats;
  plans: { rows: Plan; count: Plan };
  sql: { rows: Captured; count: Captured };
};
export type WalkResult = {
  id: string;
  label: string;
  hops: number;
  distinctIds: number;
  walkMs: number;
  firstHops: Stats;
  lastHops: Stats;
  /** The deepest page fetched again with its `after` cursor, and the page before it with `before`. */
  deepest: CaseResult;
  previous: CaseResult;
};

type Lib = {
  listSources: (actor: Actor | null, q: never) => Promise<{ sources: { id: number; datingEdtf: string | null }[]; total: number; next: string | null; previous: string | null }>;
  parse: (input: unknown) => never;
};

async function measureCase(lib: Lib, db: Instrumented, c: ListCase, reps = REPS): Promise<CaseResult> {
  const query = lib.parse(c.query);
  const call = () => lib.listSources(ACTORS[c.who], query);
  const { result, queries } = await db.capture(call);
  const count = queries.find((q) => /^select count\(/i.test(q.sql));
  const rows = queries.find((q) => q !== count);
  if (!count || !rows) throw new Error(`listSources sent ${queries.length} statements; expected the page and the count`);
  const full = await repeat(call, reps, WARMUP);
  const rowsAlone = await repeat(() => db.run(rows), reps, WARMUP);
  const countAlone = await repeat(() => db.run(count), reps, WARMUP);
  const plans = { rows: await explain(db, rows), count: await explain(db, count) };
  return { id: c.id, label: c.label, who: c.who, query: c.query, total: result.total, returned: result.sources.length, full, rowsAlone, countAlone, plans, sql: { rows, count } };
}

async function walk(lib: Lib, db: Instrumented, w: WalkCase): Promise<WalkResult> {
  const actor = ACTORS[w.who];
  const ids = new Set<number>();
  let page = await lib.listSources(actor, lib.parse(w.query));
  page.sources.forEach((s) => ids.add(s.id));
  const hopMs: number[] = [];
  let cursor = page.next;
  let last = cursor;
  const t0 = performance.now();
  for (let hop = 0; hop < w.hops && cursor; hop++) {
    last = cursor;
    const t = performance.now();
    page = await lib.listSources(actor, lib.parse({ ...w.query, after: cursor }));
    hopMs.push(performance.now() - t);
    page.sources.forEach((s) => ids.add(s.id));
    cursor = page.next;
  }
  const walkMs = performance.now() - t0;
  const depth = hopMs.length + 1;
  const deepest = await measureCase(lib, db, { ...w, id: `${w.id}:deepest`, label: `page ${depth}, ${w.label}`, query: { ...w.query, after: last! } });
  const previous = await measureCase(lib, db, {
    ...w,
    id: `${w.id}:previous`,
    label: `page ${depth - 1} via “previous”, ${w.label}`,
    query: { ...w.query, before: page.previous! },
  });
  const tail = Math.min(20, hopMs.length);
  return { id: w.id, label: w.label, hops: hopMs.length, distinctIds: ids.size, walkMs: Math.round(walkMs), firstHops: stats(hopMs.slice(0, tail)), lastHops: stats(hopMs.slice(-tail)), deepest, previous };
}

/** The JavaScript part of a page: listSources reads each row's EDTF again to put the dating in words. */
async function wordsCost(lib: Lib): Promise<Stats> {
  const page = await lib.listSources(null, lib.parse({}));
  const edtf = page.sources.map((s) => s.datingEdtf).filter((e): e is string => e !== null);
  return repeat(async () => edtf.forEach((e) => readDating(e)), REPS, WARMUP);
}

const phase = (name: string, t: number) => console.log(`bench: ${name} in ${((performance.now() - t) / 1000).toFixed(1)} s`);

async function main() {
  let t = performance.now();
  const database = await startDatabase();
  phase("database ready", t);
  const stopOnSignal = (signal: NodeJS.Signals) => {
    interrupted = true;
    console.error(`bench: ${signal}, stopping the database`);
    void database.stop().finally(() => process.exit(130));
  };
  process.once("SIGINT", stopOnSignal);
  process.once("SIGTERM", stopOnSignal);

  let closeDb: (() => Promise<void>) | null = null;
  try {
    t = performance.now();
    const conn = await mysql.createConnection({ uri: BENCH_URL, timezone: "Z" });
    let seeded;
    try {
      await resetCandidates(conn);
      seeded = await seed(conn);
    } finally {
      await conn.end();
    }
    phase(seeded.generatedMs === null ? "reused the seeded data" : "generated the data", t);

    const queries = await import("../../lib/sources/queries");
    const schemas = await import("../../lib/sources/schemas");
    const client = await import("../../db/client");
    closeDb = client.closeDb;
    const lib: Lib = { listSources: queries.listSources as Lib["listSources"], parse: (q) => schemas.sourceListQuerySchema.parse(q) as never };
    const db = instrument(client.pool());

    t = performance.now();
    const cases: CaseResult[] = [];
    for (const c of CASES) {
      cases.push(await measureCase(lib, db, c));
      console.log(`bench: ${c.id.padEnd(20)} p50 ${cases.at(-1)!.full.p50} ms`);
    }
    const walks: WalkResult[] = [];
    for (const w of WALKS) {
      walks.push(await walk(lib, db, w));
      console.log(`bench: ${w.id.padEnd(20)} last hops p50 ${walks.at(-1)!.lastHops.p50} ms`);
    }
    const words = await wordsCost(lib);
    phase("measured", t);

    t = performance.now();
    const experiments: ExperimentResult[] = [];
    if (process.env.BENCH_EXPERIMENTS !== "0") {
      const baseline = [...cases, ...walks.flatMap((w) => [w.deepest, w.previous])];
      const ddl = await mysql.createConnection({ uri: BENCH_URL, timezone: "Z" });
      try {
        for (const candidate of CANDIDATES) {
          experiments.push(await runExperiment(candidate, { conn: ddl, measure: (c) => measureCase(lib, db, c, EXPERIMENT_REPS), baseline }));
          console.log(`bench: candidate ${candidate.id} measured`);
        }
      } finally {
        await ddl.end();
      }
      phase("candidates measured", t);
    }

    const report: Report = {
      benchmark: "sources-list",
      date: new Date().toISOString(),
      machine: {
        platform: `${os.platform()} ${os.release()}`,
        arch: os.arch(),
        cpus: os.cpus().length,
        cpuModel: os.cpus()[0]?.model ?? "unknown",
        memoryGb: Math.round(os.totalmem() / 2 ** 30),
        loadAverageAtStart: os.loadavg().map((l) => Math.round(l * 100) / 100),
        node: process.version,
        mariadb: database.version,
      },
      settings: { repetitions: REPS, experimentRepetitions: EXPERIMENT_REPS, warmup: WARMUP, pageSize: 25, innodbBufferPool: "256M", connectionPool: 4 },
      rows: seeded.counts,
      generatedMs: seeded.generatedMs === null ? null : Math.round(seeded.generatedMs),
      cases,
      walks,
      wordsPerPage: words,
      experiments,
      runMs: Math.round(performance.now() - started),
    };
    writeReports(report);
    printSummary(report);
  } finally {
    await closeDb?.();
    t = performance.now();
    await database.stop();
    phase("database stopped", t);
  }
}

export type Report = {
  benchmark: string;
  date: string;
  machine: Record<string, unknown>;
  settings: Record<string, unknown>;
  rows: Record<string, number>;
  generatedMs: number | null;
  cases: CaseResult[];
  walks: WalkResult[];
  wordsPerPage: Stats;
  experiments: ExperimentResult[];
  runMs: number;
};

const PARTS = ["sources", "images", "search"] as const;
const asked = process.argv.slice(2);
const unknown = asked.filter((a) => !(PARTS as readonly string[]).includes(a));
if (unknown.length) {
  console.error(`bench: unknown part ${unknown.join(", ")}; use ${PARTS.join(", ")} (or nothing, for sources and images)`);
  process.exit(2);
}
// Search needs a running stack, so it runs only when named.
const wanted = (part: (typeof PARTS)[number]) => (asked.length === 0 && part !== "search") || asked.includes(part);

async function parts() {
  if (wanted("sources")) await main();
  if (wanted("images") && !process.exitCode) await (await import("./images/run")).runImagesBench();
  if (wanted("search") && !process.exitCode) await (await import("./search/run")).runSearchBench(shellEnv);
}

parts().catch((error: unknown) => {
  // After Ctrl-C the statements in flight fail with "connection lost": that is the interruption, not news.
  if (!interrupted) console.error(error);
  process.exitCode = 1;
});
