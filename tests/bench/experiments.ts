// What-if indexes: each is created in the bench database only, the cases it should help are measured
// again with it, and it is dropped. The schema in db/schema/ is never touched; the numbers say whether
// a migration is worth writing.
import type mysql from "mysql2/promise";
import type { ListCase } from "./cases";
import { handlerTotal, planInWords, type Stats } from "./measure";
import type { CaseResult } from "./run";

const PREFIX = "bench_";

export type Candidate = {
  id: string;
  change: string;
  /** Existing indexes made invisible to the optimizer (ALTER INDEX … IGNORED), as if dropped. */
  ignore: string[];
  indexes: { name: string; columns: string }[];
  /** Ids of baseline results to measure again: list cases, or walk pages such as "walk-title:deepest". */
  cases: string[];
};

// The sort keys lead with deleted_at so that "not deleted" is an equality; but then the optimizer takes
// `deleted_at IS NULL` as a ref over ~all rows: descending keyset pages scan from the top of it (cost
// grows with depth) and the date-overlap COUNT reads the whole index plus a row lookup each.
const SORT_KEYS = {
  ignore: ["sources_title", "sources_dating", "sources_created"],
  indexes: [
    { name: "title", columns: "title, id" },
    { name: "dating", columns: "dating_search_earliest, id" },
    { name: "created", columns: "created_at, id" },
  ],
};
// Filter keys that also hold the visibility columns, so that their COUNTs never touch the rows.
const FILTER_KEYS = {
  ignore: ["sources_country", "sources_type"],
  indexes: [
    { name: "country", columns: "country_code, state, deleted_at" },
    { name: "type", columns: "object_type, state, deleted_at" },
  ],
};

const ALL_CASES = [
  "title", "title-editor", "title-contributor", "dating-desc", "created-desc-editor", "country-it", "country-dk", "type-painting",
  "type-tile", "dates", "dates-editor", "combined", "combined-dating", "collection", "text", "deleted-admin",
  "walk-title:deepest", "walk-title:previous", "walk-dating-desc:deepest", "walk-dating-desc:previous", "walk-country-it:deepest", "walk-country-it:previous",
];

export const CANDIDATES: Candidate[] = [
  {
    id: "sort-and-filter-keys",
    change:
      "sort keys without the deleted_at prefix: (title, id), (dating_search_earliest, id), (created_at, id) instead of sources_title, sources_dating, sources_created; and filter keys (country_code, state, deleted_at), (object_type, state, deleted_at) instead of sources_country, sources_type",
    ignore: [...SORT_KEYS.ignore, ...FILTER_KEYS.ignore],
    indexes: [...SORT_KEYS.indexes, ...FILTER_KEYS.indexes],
    cases: ALL_CASES,
  },
  {
    id: "sort-keys-only",
    change: "only the sort-key half of sort-and-filter-keys (sources_country and sources_type kept)",
    ...SORT_KEYS,
    cases: ["country-it", "type-painting", "dates", "walk-dating-desc:deepest"],
  },
  {
    id: "plus-deleted-key",
    change: "sort-and-filter-keys plus (deleted_at), to win back the admin's list of deleted sources",
    ignore: [...SORT_KEYS.ignore, ...FILTER_KEYS.ignore],
    indexes: [...SORT_KEYS.indexes, ...FILTER_KEYS.indexes, { name: "deleted", columns: "deleted_at" }],
    cases: ["deleted-admin", "title", "combined", "walk-dating-desc:deepest"],
  },
  {
    id: "plus-visible-key",
    change: "sort-and-filter-keys plus (state, deleted_at), for the visitor's unfiltered COUNT",
    ignore: [...SORT_KEYS.ignore, ...FILTER_KEYS.ignore],
    indexes: [...SORT_KEYS.indexes, ...FILTER_KEYS.indexes, { name: "visible", columns: "state, deleted_at" }],
    cases: ["title", "title-contributor", "combined", "dates"],
  },
];

type Side = { full: Stats; rows: Stats; count: Stats; rowsPlan: string; countPlan: string; rowsReads: number; countReads: number };
type Compared = { case: string; label: string; before: Side; after: Side };
export type ExperimentResult = { id: string; change: string; ddl: string[]; createMs: number; compared: Compared[] };

type Context = { conn: mysql.Connection; measure: (c: ListCase) => Promise<CaseResult>; baseline: CaseResult[] };

const side = (r: CaseResult): Side => ({
  full: r.full,
  rows: r.rowsAlone,
  count: r.countAlone,
  rowsPlan: planInWords(r.plans.rows),
  countPlan: planInWords(r.plans.count),
  rowsReads: handlerTotal(r.plans.rows),
  countReads: handlerTotal(r.plans.count),
});

/** Puts the real schema back: drops candidate indexes and un-ignores indexes an interrupted run left ignored. */
export async function resetCandidates(conn: mysql.Connection) {
  const [rows] = (await conn.query(
    "SELECT DISTINCT index_name AS name, ignored FROM information_schema.statistics WHERE table_schema = DATABASE() AND table_name = 'sources' AND (index_name LIKE ? OR ignored = 'YES')",
    [`${PREFIX}%`],
  )) as unknown as [{ name: string; ignored: string }[]];
  if (!rows.length) return;
  const changes = rows.map((r) => (r.name.startsWith(PREFIX) ? `DROP INDEX \`${r.name}\`` : `ALTER INDEX \`${r.name}\` NOT IGNORED`));
  await conn.query(`ALTER TABLE sources ${changes.join(", ")}`);
  await conn.query("ANALYZE TABLE sources");
}

export async function runExperiment(c: Candidate, ctx: Context): Promise<ExperimentResult> {
  const ddl = [
    ...c.indexes.map((i) => `CREATE INDEX ${PREFIX}${i.name} ON sources (${i.columns})`),
    ...(c.ignore.length ? [`ALTER TABLE sources ${c.ignore.map((name) => `ALTER INDEX ${name} IGNORED`).join(", ")}`] : []),
  ];
  const compared: Compared[] = [];
  let createMs = 0;
  try {
    const t = performance.now();
    for (const statement of ddl) await ctx.conn.query(statement);
    await ctx.conn.query("ANALYZE TABLE sources");
    createMs = Math.round(performance.now() - t);
    for (const id of c.cases) {
      const before = ctx.baseline.find((x) => x.id === id);
      if (!before) throw new Error(`candidate ${c.id} names an unknown case ${id}`);
      const again = await ctx.measure({ id, label: before.label, who: before.who, query: before.query });
      compared.push({ case: id, label: `${before.label} (${before.who})`, before: side(before), after: side(again) });
    }
  } finally {
    await resetCandidates(ctx.conn);
  }
  return { id: c.id, change: c.change, ddl, createMs, compared };
}
