// Timing and query plans. The SQL is captured from the pool that lib/sources/queries.ts really uses,
// so EXPLAIN and the "query alone" timings are of exactly what listSources sends.
import type mysql from "mysql2/promise";

export type Stats = { n: number; min: number; p50: number; p95: number; max: number; mean: number };

const round = (ms: number) => Math.round(ms * 100) / 100;

/** Nearest-rank percentiles, in milliseconds. */
export function stats(samples: number[]): Stats {
  const s = [...samples].sort((a, b) => a - b);
  const rank = (p: number) => s[Math.min(s.length - 1, Math.max(0, Math.ceil((p / 100) * s.length) - 1))];
  return {
    n: s.length,
    min: round(s[0]),
    p50: round(rank(50)),
    p95: round(rank(95)),
    max: round(s[s.length - 1]),
    mean: round(s.reduce((a, b) => a + b, 0) / s.length),
  };
}

/** `reps` timed runs after `warmup` untimed ones; slow statements stop early after `budgetMs` (at least 10 runs). */
export async function repeat(fn: () => Promise<unknown>, reps: number, warmup: number, budgetMs = 3_000): Promise<Stats> {
  for (let i = 0; i < warmup; i++) await fn();
  const samples: number[] = [];
  const started = performance.now();
  for (let i = 0; i < reps; i++) {
    const t = performance.now();
    await fn();
    samples.push(performance.now() - t);
    if (samples.length >= 10 && performance.now() - started > budgetMs) break;
  }
  return stats(samples);
}

export type Captured = { sql: string; values: unknown[] };
type QueryFn = (query: unknown, values?: unknown) => Promise<unknown>;

/** Wraps pool.query (what drizzle's mysql2 session calls) to record the statements a call sends. */
export function instrument(pool: mysql.Pool) {
  const target = pool as unknown as { query: QueryFn };
  const original: QueryFn = target.query.bind(pool);
  let log: Captured[] | null = null;
  target.query = (query, values) => {
    if (log) log.push({ sql: typeof query === "string" ? query : (query as { sql: string }).sql, values: (values as unknown[]) ?? [] });
    return original(query, values);
  };
  const HANDLER = "SHOW SESSION STATUS WHERE Variable_name LIKE 'Handler_read%' OR Variable_name LIKE 'Handler_icp%'";
  const status = async (conn: mysql.PoolConnection) => {
    const [rows] = (await conn.query(HANDLER)) as unknown as [{ Variable_name: string; Value: string }[]];
    return Object.fromEntries(rows.map((r) => [r.Variable_name, Number(r.Value)]));
  };
  return {
    /** Index and table rows the handler touched for one statement (Handler_read_* deltas, SHOW itself subtracted). */
    async handlerReads(q: Captured): Promise<Record<string, number>> {
      const conn = await pool.getConnection();
      try {
        const s0 = await status(conn);
        const s1 = await status(conn);
        await conn.query({ sql: q.sql, rowsAsArray: true }, q.values);
        const s2 = await status(conn);
        const out: Record<string, number> = {};
        for (const k of Object.keys(s2)) {
          const n = s2[k] - s1[k] - (s1[k] - s0[k]);
          if (n > 0) out[k.replace("Handler_read_", "").replace("Handler_", "")] = n;
        }
        return out;
      } finally {
        conn.release();
      }
    },
    async capture<T>(fn: () => Promise<T>): Promise<{ result: T; queries: Captured[] }> {
      log = [];
      try {
        const result = await fn();
        return { result, queries: log };
      } finally {
        log = null;
      }
    },
    /** Runs a captured statement on its own, rows as arrays like drizzle asks for. */
    run: (q: Captured, prefix = "") => original({ sql: `${prefix}${q.sql}`, rowsAsArray: !prefix }, q.values) as Promise<[unknown, unknown]>,
  };
}
export type Instrumented = ReturnType<typeof instrument>;

export type TablePlan = {
  table: string;
  access: string;
  key: string | null;
  keyParts: string[] | null;
  estimatedRows: number | null;
  /** r_loops × r_rows from ANALYZE: rows the engine actually read from this table. */
  rowsRead: number | null;
  filteredPct: number | null;
  indexOnly: boolean;
  indexCondition: boolean;
};
export type Plan = {
  tables: TablePlan[];
  filesort: boolean;
  temporary: boolean;
  analyzeMs: number | null;
  /** Handler_read_* and Handler_icp_* deltas: key = index dives, next/prev = index steps, rnd_next =
   * table-scan rows, icp_attempts = index entries checked by index condition pushdown. */
  handlerReads: Record<string, number>;
  explain: Record<string, unknown>[];
};

function walk(node: unknown, found: { tables: TablePlan[]; filesort: boolean; temporary: boolean }) {
  if (Array.isArray(node)) return node.forEach((n) => walk(n, found));
  if (!node || typeof node !== "object") return;
  for (const [key, value] of Object.entries(node as Record<string, unknown>)) {
    if (key === "filesort") found.filesort = true;
    if (key === "temporary_table") found.temporary = true;
    if (key === "table" && value && typeof value === "object" && "table_name" in value) {
      const t = value as Record<string, unknown>;
      const num = (k: string) => (typeof t[k] === "number" ? (t[k] as number) : null);
      const loops = num("r_loops");
      const rows = num("r_rows");
      found.tables.push({
        table: String(t.table_name),
        access: String(t.access_type),
        key: (t.key as string) ?? null,
        keyParts: (t.used_key_parts as string[]) ?? null,
        estimatedRows: num("rows"),
        rowsRead: loops !== null && rows !== null ? Math.round(loops * rows) : null,
        filteredPct: num("r_filtered"),
        indexOnly: t.using_index === true,
        indexCondition: "index_condition" in t,
      });
    }
    walk(value, found);
  }
}

/** EXPLAIN (the optimizer's choice) and ANALYZE FORMAT=JSON (what running it actually read). */
export async function explain(db: Instrumented, q: Captured): Promise<Plan> {
  const [explainRows] = (await db.run(q, "EXPLAIN ")) as [Record<string, unknown>[], unknown];
  const [analyzeRows] = (await db.run(q, "ANALYZE FORMAT=JSON ")) as [Record<string, string>[], unknown];
  const json = JSON.parse(Object.values(analyzeRows[0])[0]) as { query_block?: { r_total_time_ms?: number } };
  const found = { tables: [] as TablePlan[], filesort: false, temporary: false };
  walk(json, found);
  const handlerReads = await db.handlerReads(q);
  return { ...found, analyzeMs: json.query_block?.r_total_time_ms ?? null, handlerReads, explain: explainRows };
}

/** One line per table: "sources: range sources_title, read 26 (index only)". */
export function planInWords(plan: Plan): string {
  const parts = plan.tables.map((t) => {
    const extra = [t.indexOnly && "index only", t.indexCondition && "ICP"].filter(Boolean).join(", ");
    return `${t.table}: ${t.access}${t.key ? ` ${t.key}` : ""}, read ${t.rowsRead ?? "?"}${extra ? ` (${extra})` : ""}`;
  });
  if (plan.filesort) parts.push("filesort");
  if (plan.temporary) parts.push("temporary table");
  return `${parts.join("; ")} [examined ${handlerTotal(plan)}]`;
}

/** Rows and index entries the engine looked at: every handler read, plus entries ICP checked and rejected
 * (those never reach Handler_read_next). Joined tables' primary-key dives are included. */
export function handlerTotal(plan: Plan): number {
  const { icp_attempts = 0, icp_match = 0, ...reads } = plan.handlerReads;
  return Object.values(reads).reduce((a, b) => a + b, 0) + (icp_attempts - icp_match);
}
