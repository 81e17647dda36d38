// Writes the results (JSON for machines, Markdown for people) and prints the summary table.
import { mkdirSync, renameSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { ROOT } from "./database";
import { handlerTotal, planInWords } from "./measure";
import type { CaseResult, Report } from "./run";

const RESULTS = join(ROOT, "tests/bench/results");

function atomicWrite(file: string, text: string) {
  writeFileSync(`${file}.tmp`, text);
  renameSync(`${file}.tmp`, file);
}

const filters = (q: Record<string, string | number>) =>
  Object.entries(q)
    .filter(([k]) => k !== "after" && k !== "before")
    .map(([k, v]) => `${k}=${v}`)
    .join(" ") || "–";

function timingRows(cases: CaseResult[]): string[][] {
  return cases.map((c) => [
    c.id, c.who, `${filters(c.query)}${cursorNote(c.query)}`, c.total.toLocaleString("en"),
    String(c.full.p50), String(c.full.p95), String(c.full.max), String(c.full.n), String(c.rowsAlone.p50), String(c.countAlone.p50),
    String(handlerTotal(c.plans.rows)), String(handlerTotal(c.plans.count)),
  ]);
}
const TIMING_HEAD = ["case", "who", "filters / sort", "total", "p50", "p95", "max", "runs", "page SQL p50", "COUNT p50", "page examined", "COUNT examined"];
const cursorNote = (q: Record<string, string | number>) => (q.after ? " after=…" : q.before ? " before=…" : "");

function table(head: string[], rows: string[][]): string {
  const line = (cells: string[]) => `| ${cells.map((c) => c.replace(/\|/g, "\\|")).join(" | ")} |`;
  return [line(head), line(head.map(() => "---")), ...rows.map(line)].join("\n");
}

function markdown(r: Report): string {
  const m = r.machine;
  const deep = r.walks.flatMap((w) => [w.deepest, w.previous]);
  const out = [
    "# Sources list benchmark",
    "",
    `${r.date} · ${m.cpus} × ${m.cpuModel}, ${m.memoryGb} GB, ${m.platform}, Node ${m.node}, MariaDB ${m.mariadb} (buffer pool 256M), load at start ${(m.loadAverageAtStart as number[]).join(" / ")}.`,
    `Rows: ${Object.entries(r.rows).map(([k, v]) => `${v.toLocaleString("en")} ${k}`).join(", ")}. ${r.generatedMs === null ? "Data reused from an earlier run." : `Generated in ${(r.generatedMs / 1000).toFixed(1)} s.`} Whole run ${(r.runMs / 1000).toFixed(0)} s.`,
    "",
    `Milliseconds over ${r.settings.repetitions} runs after ${r.settings.warmup} warm-up runs (fewer, at least 10, where a statement would take more than 3 s in all), page size 25. "p50/p95/max" time the whole \`listSources()\` call (page query and COUNT run in parallel on the pool); "page SQL" and "COUNT" time each statement alone through the same driver. "examined" counts the rows and index entries MariaDB looked at (Handler_read_* plus entries rejected by index condition pushdown; the joins' primary-key lookups included). The machine is shared: compare runs by "examined" first, by milliseconds second.`,
    "",
    "## First pages",
    "",
    table(TIMING_HEAD, timingRows(r.cases)),
    "",
    "## Deep pages (keyset cursors)",
    "",
    table(
      ["walk", "hops", "whole walk (s)", "first 20 hops p50", "last 20 hops p50", "last 20 p95", "distinct ids"],
      r.walks.map((w) => [w.id, String(w.hops), (w.walkMs / 1000).toFixed(1), String(w.firstHops.p50), String(w.lastHops.p50), String(w.lastHops.p95), w.distinctIds.toLocaleString("en")]),
    ),
    "",
    "The deepest page fetched again with its `after` cursor, and the page before it through its `previous` (`before`) cursor:",
    "",
    table(TIMING_HEAD, timingRows(deep)),
    "",
    `Putting the datings of one page into words (\`readDating\` for each row, inside listSources): p50 ${r.wordsPerPage.p50} ms, p95 ${r.wordsPerPage.p95} ms.`,
    "",
    "## Plans",
    "",
    "From `ANALYZE FORMAT=JSON` of the exact statements listSources sent: access type, index, rows actually read per table (ICP = index condition pushdown), and the session's Handler_read_* total for the statement (index dives and steps plus table-scan rows). Full EXPLAIN output is in the JSON.",
    "",
    table(["case", "page query", "COUNT"], [...r.cases, ...deep].map((c) => [c.id, planInWords(c.plans.rows), planInWords(c.plans.count)])),
    "",
  ];
  if (r.experiments.length) {
    out.push("## Candidate indexes (created in the bench database only, then dropped)", "");
    for (const e of r.experiments) {
      out.push(`### ${e.id}: ${e.change}`, "", "```sql", ...e.ddl.map((d) => `${d};`), "```", "", `Building it took ${(e.createMs / 1000).toFixed(1)} s.`, "");
      out.push(
        table(
          ["case", "p50 before → after", "page SQL p50", "page reads", "COUNT p50", "COUNT reads", "plan after: page / COUNT"],
          e.compared.map((c) => [
            `${c.case}: ${c.label}`,
            `${c.before.full.p50} → ${c.after.full.p50}`,
            `${c.before.rows.p50} → ${c.after.rows.p50}`,
            `${c.before.rowsReads} → ${c.after.rowsReads}`,
            `${c.before.count.p50} → ${c.after.count.p50}`,
            `${c.before.countReads} → ${c.after.countReads}`,
            `${c.after.rowsPlan} / ${c.after.countPlan}`,
          ]),
        ),
        "",
      );
    }
  }
  return out.join("\n");
}

export function writeReports(r: Report) {
  mkdirSync(RESULTS, { recursive: true });
  atomicWrite(join(RESULTS, "sources-list.json"), `${JSON.stringify(r, null, 2)}\n`);
  atomicWrite(join(RESULTS, "sources-list.md"), `${markdown(r)}\n`);
}

export function printSummary(r: Report) {
  const rows = timingRows([...r.cases, ...r.walks.flatMap((w) => [w.deepest, w.previous])]);
  const widths = TIMING_HEAD.map((h, i) => Math.max(h.length, ...rows.map((row) => row[i].length)));
  const line = (cells: string[]) => cells.map((c, i) => (i >= 3 ? c.padStart(widths[i]) : c.padEnd(widths[i]))).join("  ");
  console.log(`\nsources list, ${r.rows.sources.toLocaleString("en")} sources, ms (${r.settings.repetitions} runs):`);
  console.log(line(TIMING_HEAD));
  rows.forEach((row) => console.log(line(row)));
  for (const e of r.experiments) {
    console.log(`\ncandidate ${e.id}: ${e.change}`);
    for (const c of e.compared)
      console.log(`  ${c.case.padEnd(26)} p50 ${c.before.full.p50} → ${c.after.full.p50} ms; page reads ${c.before.rowsReads} → ${c.after.rowsReads}; COUNT ${c.before.count.p50} → ${c.after.count.p50} ms`);
  }
  console.log(`\nwalks (200 hops): ${r.walks.map((w) => `${w.id} first 20 hops p50 ${w.firstHops.p50} ms, last 20 p50 ${w.lastHops.p50} ms`).join("; ")}`);
  console.log(`datings in words per page: p50 ${r.wordsPerPage.p50} ms`);
  console.log(`\nresults in tests/bench/results/sources-list.{json,md} (run took ${(r.runMs / 1000).toFixed(0)} s)`);
}
