// The search page's plain controls: the date range (a GET form, so it works without scripts), sort and
// view links, and the pager. Every one of them only changes the address.
import Link from "next/link";
import { withParams } from "@/lib/search/page/url";

function Hidden({ params, skip }: { params: URLSearchParams; skip: string[] }) {
  return (
    <>
      {[...params].filter(([k]) => !skip.includes(k)).map(([k, v], i) => (
        <input key={`${k}-${i}`} type="hidden" name={k} value={v} />
      ))}
    </>
  );
}

export function DateFilter({ params }: { params: URLSearchParams }) {
  const from = params.get("from") ?? "";
  const to = params.get("to") ?? "";
  return (
    <form action="/search" className="space-y-2" aria-labelledby="date-filter-title">
      <h3 id="date-filter-title" className="text-sm font-semibold uppercase tracking-wide text-ink-soft">Made between</h3>
      <Hidden params={params} skip={["from", "to", "page", "decade", "century"]} />
      <div className="flex items-end gap-2">
        <label className="text-sm">
          From year
          <input name="from" defaultValue={from} inputMode="numeric" placeholder="1620" className="block w-20 rounded border border-rule bg-card px-2 py-1" />
        </label>
        <label className="text-sm">
          To year
          <input name="to" defaultValue={to} inputMode="numeric" placeholder="1700" className="block w-20 rounded border border-rule bg-card px-2 py-1" />
        </label>
        <button type="submit" className="rounded border border-rule bg-card px-3 py-1 text-sm font-semibold hover:bg-paper-deep">Apply dates</button>
      </div>
      <p className="text-xs text-ink-faint">A work counts when its dating overlaps these years; undated works are left out.</p>
      {(from || to) && (
        <Link href={withParams(params, { from: null, to: null })} className="text-sm">
          Any date
        </Link>
      )}
    </form>
  );
}

export function SortAndView<S extends string>({ params, sort, view, labels }: { params: URLSearchParams; sort: S; view: "grid" | "table"; labels: Record<S, string> }) {
  return (
    <div className="flex flex-wrap items-center gap-4 text-sm">
      <p className="flex flex-wrap gap-2" aria-label="Sort by">
        <span className="text-ink-soft">Sort:</span>
        {(Object.keys(labels) as S[]).map((s) =>
          s === sort ? (
            <strong key={s} aria-current="true">{labels[s]}</strong>
          ) : (
            <Link key={s} href={withParams(params, { sort: s === "relevance" ? null : s })}>{labels[s]}</Link>
          ),
        )}
      </p>
      <p className="flex gap-2" aria-label="Show as">
        {(["grid", "table"] as const).map((v) =>
          v === view ? (
            <strong key={v} aria-current="true">{v === "grid" ? "Pictures" : "Table"}</strong>
          ) : (
            <Link key={v} href={withParams(params, { view: v === "grid" ? null : v, page: params.get("page") })}>{v === "grid" ? "Pictures" : "Table"}</Link>
          ),
        )}
      </p>
    </div>
  );
}

export function Pager({ params, page, totalPages }: { params: URLSearchParams; page: number; totalPages: number }) {
  if (totalPages <= 1) return null;
  return (
    <nav aria-label="Pages of results" className="flex items-center gap-3 text-sm">
      {page > 1 && <Link href={withParams(params, { page: String(page - 1) })} rel="prev">Previous</Link>}
      <span>Page {page} of {totalPages}</span>
      {page < totalPages && <Link href={withParams(params, { page: String(page + 1) })} rel="next">Next</Link>}
    </nav>
  );
}
