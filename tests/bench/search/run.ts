// The search part of `npm run bench` (`npm run bench -- search`, only when asked): indexes 100,000
// invented region documents into a running test stack's search service (start one with
// docker-free-scripts/lib.sh: use_profile test; start_services; run_migrations; …; start_app), hits
// GET /api/search on loopback with autocannon for a few query shapes, one request at a time and then
// several at once, and sets each answer's latency beside the search service's own processingTimeMs for
// the same query: one at a time the ratio is what the app adds (session, parsing, the visibility filter,
// labels, JSON); several at once it also holds the wait for the single-threaded fake. Then times the
// decade chart and the place summary over 100,000 results. The bench documents are deleted at the end.
// Writes tests/bench/results/search.{json,md}. A measurement, not a test: nothing here fails on timing.
import { writeFileSync } from "node:fs";
import os from "node:os";
import autocannon from "autocannon";
import { requestFilters } from "../../../lib/search/filters";
import { searchHistogram, searchPlaces } from "../../../lib/search/page/charts";
import type { ChartHit } from "../../../lib/search/query";
import { searchParamsToQuery, searchQuerySchema } from "../../../lib/search/schemas";
import { regionVisibilityFilter } from "../../../lib/search/visibility";
import { stats, type Stats } from "../measure";
import { BENCH_FIRST_ID, benchDocuments } from "./generate";

const COUNT = Number(process.env.BENCH_SEARCH_DOCS ?? 100_000);
// A fixed number of requests per shape, not a duration, so a slow service lengthens the run instead of thinning the sample.
const REQUESTS = Number(process.env.BENCH_SEARCH_REQUESTS ?? 24);
const CONNECTIONS = 4;
// One request at a time as well: then nothing waits at the single-threaded fake, and the ratio is the app's own overhead.
const ALONE_REQUESTS = Number(process.env.BENCH_SEARCH_ALONE_REQUESTS ?? 12);
const DIRECT_REPS = Number(process.env.BENCH_SEARCH_DIRECT_REPS ?? 8);
const SORTS: Record<string, string[]> = { relevance: [], date: ["dateFrom:asc"], date_desc: ["dateTo:desc"], recent: ["updatedAt:desc"] };

const SHAPES = [
  { id: "browse", label: "No words, no filter (facet counts over everything)", query: "" },
  { id: "words", label: "Words", query: "q=serenade" },
  { id: "facets-dates", label: "Technique + instrument + dates 1620–1700", query: "t_right_hand_technique=strumming&t_instrument_type=five_course_guitar&from=1620&to=1700" },
  { id: "country-sorted-page", label: "Country, sorted by date, page 3", query: "country=IT&sort=date&page=3" },
];

type Env = Record<string, string | undefined>;
type AppStats = Stats & { requestsPerSecond: number; errors: number; statuses: Record<string, number> };
type ShapeResult = {
  id: string;
  label: string;
  query: string;
  total: number;
  app: AppStats;
  /** The same requests one at a time. */
  alone: AppStats;
  serviceProcessingMs: Stats;
  serviceRoundTripMs: Stats;
  ratioP50: number | null;
  ratioAloneP50: number | null;
};

async function meili(env: Env, path: string, init: { method?: string; body?: unknown } = {}) {
  const res = await fetch(`${env.MEILI_HOST}${path}`, {
    method: init.method ?? (init.body === undefined ? "GET" : "POST"),
    headers: { authorization: `Bearer ${env.MEILI_API_KEY}`, "content-type": "application/json" },
    body: init.body === undefined ? undefined : JSON.stringify(init.body),
  });
  if (!res.ok) throw new Error(`${path}: ${res.status} ${await res.text()}`);
  return res.json() as Promise<Record<string, unknown>>;
}

async function waitTask(env: Env, task: { taskUid?: number }) {
  for (;;) {
    const t = await meili(env, `/tasks/${task.taskUid}`);
    if (t.status === "succeeded") return;
    if (t.status === "failed" || t.status === "canceled") throw new Error(`task ${task.taskUid} ${t.status}: ${JSON.stringify(t.error)}`);
    await new Promise((r) => setTimeout(r, 200));
  }
}

async function underLoad(url: string, connections = CONNECTIONS, amount = REQUESTS): Promise<AppStats> {
  const samples: number[] = [];
  const statuses: Record<string, number> = {};
  const instance = autocannon({ url, connections, amount, timeout: 300 });
  // Every answer's time counts, refusals too (a 503 after the client's 5 s timeout is what a reader waits).
  instance.on("response", (_client: unknown, status: number, _bytes: number, ms: number) => {
    samples.push(ms);
    statuses[status] = (statuses[status] ?? 0) + 1;
  });
  const result = await instance;
  return { ...stats(samples.length ? samples : [Number.NaN]), requestsPerSecond: Math.round(result.requests.average * 10) / 10, errors: result.errors, statuses };
}

export async function runSearchBench(env: Env) {
  const app = env.TEST_APP_URL;
  if (!app || !env.MEILI_HOST || !env.MEILI_API_KEY) {
    console.error("bench search: needs a running test stack: TEST_APP_URL, MEILI_HOST and MEILI_API_KEY (source docker-free-scripts/lib.sh; use_profile test).");
    process.exitCode = 2;
    return;
  }
  const uid = `${env.SEARCH_INDEX_PREFIX ?? "cordarium_"}regions`;
  const started = performance.now();
  // Other work on the machine moves every figure here; the 1-minute load average says how much there was.
  const loadAtStart = os.loadavg()[0]!;
  console.log(`search bench: generating ${COUNT} documents`);
  const docs = benchDocuments(COUNT);
  const indexStart = performance.now();
  for (let i = 0; i < docs.length; i += 10_000) {
    await waitTask(env, (await meili(env, `/indexes/${uid}/documents`, { body: docs.slice(i, i + 10_000) })) as { taskUid: number });
    console.log(`  indexed ${Math.min(i + 10_000, docs.length)}`);
  }
  const indexMs = Math.round(performance.now() - indexStart);
  const shapes: ShapeResult[] = [];
  try {
    for (const shape of SHAPES) {
      const q = searchQuerySchema.parse(searchParamsToQuery(new URLSearchParams(shape.query)));
      // The same search the app sends for a visitor (lib/search/query.ts).
      const body = { q: q.q || null, filter: [...regionVisibilityFilter(null, { proposed: false }), ...requestFilters(q)], facets: ["*"], sort: SORTS[q.sort], page: q.page, hitsPerPage: q.perPage };
      const processing: number[] = [];
      const roundTrip: number[] = [];
      let total = 0;
      for (let i = 0; i < DIRECT_REPS; i++) {
        const t0 = performance.now();
        const answer = await meili(env, `/indexes/${uid}/search`, { body });
        roundTrip.push(performance.now() - t0);
        processing.push(Number(answer.processingTimeMs));
        total = Number(answer.totalHits ?? 0);
      }
      const url = `${app}/api/search${shape.query ? `?${shape.query}` : ""}`;
      const alone = await underLoad(url, 1, ALONE_REQUESTS);
      const load = await underLoad(url);
      const service = stats(processing);
      const ratio = (appMs: number) => (service.p50 > 0 ? Math.round((appMs / service.p50) * 10) / 10 : null);
      shapes.push({ ...shape, total, app: load, alone, serviceProcessingMs: service, serviceRoundTripMs: stats(roundTrip), ratioP50: ratio(load.p50), ratioAloneP50: ratio(alone.p50) });
      console.log(`  ${shape.id}: app p50 ${load.p50} ms p95 ${load.p95} ms (one at a time p50 ${alone.p50} ms); service ${service.p50} ms`);
    }
  } finally {
    await waitTask(env, (await meili(env, `/indexes/${uid}/documents/delete`, { body: { filter: `regionId >= ${BENCH_FIRST_ID}` } })) as { taskUid: number });
  }
  // The charts over every generated hit, as the page computes them over its (at most 5,000) hits.
  const hits = docs.map((d) => d as unknown as ChartHit);
  const histogramMs: number[] = [];
  const placesMs: number[] = [];
  for (let i = 0; i < 7; i++) {
    let t0 = performance.now();
    searchHistogram(hits, "right_hand_technique");
    histogramMs.push(performance.now() - t0);
    t0 = performance.now();
    searchPlaces(hits);
    placesMs.push(performance.now() - t0);
  }
  const result = {
    when: new Date().toISOString(),
    machine: { cpus: os.cpus().length, cpu: os.cpus()[0]?.model, node: process.version, loadAverage: { start: round1(loadAtStart), end: round1(os.loadavg()[0]!) } },
    documents: docs.length,
    indexMs,
    load: { connections: CONNECTIONS, requests: REQUESTS, aloneRequests: ALONE_REQUESTS, caller: "visitor (no session)" },
    shapes,
    charts: { hits: hits.length, decadeHistogramMs: stats(histogramMs.slice(2)), placeSummaryMs: stats(placesMs.slice(2)) },
    runMs: Math.round(performance.now() - started),
  };
  writeFileSync("tests/bench/results/search.json", `${JSON.stringify(result, null, 2)}\n`);
  writeFileSync("tests/bench/results/search.md", report(result));
  console.log("wrote tests/bench/results/search.{json,md}");
}

/** What the figures mean, from what this run saw: the timeout sentence says whether any answer was refused. */
function note({ documents, shapes, machine }: { documents: number; shapes: ShapeResult[]; machine: { cpus: number } }): string {
  const answers = shapes.flatMap((s) => [...Object.entries(s.app.statuses), ...Object.entries(s.alone.statuses)]);
  const total = answers.reduce((n, [, count]) => n + count, 0);
  const refused = answers.filter(([status]) => status !== "200").reduce((n, [, count]) => n + count, 0);
  const service = shapes.map((s) => s.serviceProcessingMs.p50);
  return [
    `Read with care: the search service here is the JavaScript fake (fakes/search), one thread. It answers filters and facets from a column per attribute (fakes/search/columns.ts); at ${documents.toLocaleString("en")} documents these shapes took ${Math.min(...service)}–${Math.max(...service)} ms of its processing time (p50), and a real Meilisearch answers them faster still.`,
    `One at a time, nothing waits at the fake: that ratio is what the app adds (session, parsing, the visibility filter, labels, JSON, the loopback hop). Under load the requests arrive ${CONNECTIONS} at a time and wait for one another at the fake, with the fake, the app and autocannon sharing ${machine.cpus} cores, so that ratio also holds the wait.`,
    refused
      ? `${refused} of ${total} answers were not 200: the app's search client gives up after 5 s (lib/search/client.ts) and answers 503, and those times are that timeout, not the app's work.`
      : `All ${total} answers were 200: none reached the app's 5 s search timeout (lib/search/client.ts).`,
    "Compare runs on the same machine, at a like load average, only.",
  ].join(" ");
}

const round1 = (n: number) => Math.round(n * 10) / 10;

function report(r: { when: string; machine: { cpus: number; cpu?: string; node: string; loadAverage: { start: number; end: number } }; documents: number; indexMs: number; shapes: ShapeResult[]; charts: { hits: number; decadeHistogramMs: Stats; placeSummaryMs: Stats } }): string {
  const rows = r.shapes.map(
    (s) =>
      `| ${s.label} | ${s.total} | ${s.serviceProcessingMs.p50} | ${s.serviceRoundTripMs.p50} | ${s.alone.p50} | ${s.alone.p95} | ${s.ratioAloneP50 ?? "–"} | ${s.app.p50} | ${s.app.p95} | ${s.app.requestsPerSecond} | ${s.ratioP50 ?? "–"} | ${Object.entries(s.app.statuses).map(([k, v]) => `${v}× ${k}`).join(", ")} |`,
  );
  return [
    "# Search bench",
    "",
    `${r.when}, ${r.machine.cpus} CPUs (${r.machine.cpu ?? "?"}), Node ${r.machine.node}, load average ${r.machine.loadAverage.start} at the start and ${r.machine.loadAverage.end} at the end. ${r.documents} region documents indexed into the search fake in ${r.indexMs} ms.`,
    `GET /api/search as a visitor per shape (autocannon, loopback): ${ALONE_REQUESTS} requests one at a time, then ${REQUESTS} over ${CONNECTIONS} connections. "Service" is the search service answering the same`,
    "search directly: its own processingTimeMs and the round trip from this process. Ratio = app p50 / service processingTimeMs p50.",
    "",
    note(r),
    "",
    `| Query | Hits | Service processingTimeMs p50 | Service round trip p50 ms | App p50 ms, one at a time | App p95 ms, one at a time | Ratio, one at a time | App p50 ms, ${CONNECTIONS} at a time | App p95 ms, ${CONNECTIONS} at a time | Req/s | Ratio, ${CONNECTIONS} at a time | Answers, ${CONNECTIONS} at a time |`,
    "|---|---:|---:|---:|---:|---:|---:|---:|---:|---:|---:|---|",
    ...rows,
    "",
    `Charts over ${r.charts.hits} hits (in process): decade histogram stacked by right-hand technique p50 ${r.charts.decadeHistogramMs.p50} ms (p95 ${r.charts.decadeHistogramMs.p95}); place summary p50 ${r.charts.placeSummaryMs.p50} ms. The search page charts at most 5,000 hits.`,
    "",
  ].join("\n");
}
