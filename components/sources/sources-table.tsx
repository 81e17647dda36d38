"use client";

import { keepPreviousData, useQuery } from "@tanstack/react-query";
import { getCoreRowModel, useReactTable, type ColumnDef } from "@tanstack/react-table";
import Link from "next/link";
import { usePathname, useRouter, useSearchParams } from "next/navigation";
import { useEffect, useMemo, useRef } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { ServerTable } from "@/components/ui/server-table";
import { api } from "@/lib/client/api";
import { attributionInWords, OBJECT_TYPE_LABELS, type AttributionQualifier, type ObjectType } from "@/lib/sources/vocab";
import { SourcesFilters, type FilterOptions } from "./sources-filters";

type Row = {
  id: number;
  title: string;
  objectType: ObjectType;
  artist: string | null;
  attributionQualifier: AttributionQualifier;
  datingEdtf: string | null;
  datingWords: string | null;
  collectionName: string | null;
  accessionNumber: string | null;
  placeName: string | null;
  countryCode: string | null;
  state: "draft" | "published";
};
type Page = { sources: Row[]; total: number; next: string | null; previous: string | null };

const SORTS: Record<string, string> = { title: "title", datingWords: "dating" };
export const FILTER_KEYS = ["q", "objectType", "collection", "country", "from", "to", "creator", "state", "deleted"] as const;

export function SourcesTable({ options }: { options: FilterOptions }) {
  const router = useRouter();
  const pathname = usePathname();
  const params = useSearchParams();
  const sort = params.get("sort") ?? "title";
  const dir = params.get("dir") ?? "asc";

  // The address holds the whole view (filters, sort, page), so it can be shared and bookmarked.
  // A change builds on the address last asked for, not on the one shown: until a replace lands, the
  // shown one lacks it, and a second change made meanwhile (a country, then a year) would drop the first.
  const asked = useRef<string | null>(null);
  useEffect(() => {
    if (asked.current === params.toString()) asked.current = null;
  }, [params]);
  const setParams = (patch: Record<string, string | null>, keepPage = false) => {
    const next = new URLSearchParams(asked.current ?? params.toString());
    if (!keepPage) {
      next.delete("after");
      next.delete("before");
    }
    for (const [k, v] of Object.entries(patch)) {
      if (v === null || v === "") next.delete(k);
      else next.set(k, v);
    }
    asked.current = next.toString();
    router.replace(`${pathname}${next.size ? `?${next}` : ""}`, { scroll: false });
  };

  const apiQuery = new URLSearchParams();
  for (const key of [...FILTER_KEYS, "sort", "dir", "after", "before"]) {
    const v = params.get(key);
    if (v) apiQuery.set(key, v);
  }
  const query = useQuery({
    queryKey: ["sources", apiQuery.toString()],
    queryFn: () => api<Page>(`/api/sources?${apiQuery}`),
    placeholderData: keepPreviousData,
  });

  const columns = useMemo<ColumnDef<Row>[]>(
    () => [
      {
        accessorKey: "title",
        header: "Title",
        cell: ({ row }) => (
          <div>
            <Link href={`/sources/${row.original.id}`} className="font-serif text-base font-semibold">
              {row.original.title}
            </Link>
            {row.original.state === "draft" && <span className="ml-2 rounded bg-paper-deep px-1.5 py-0.5 text-xs uppercase tracking-wider text-ink-soft">draft</span>}
            <div className="text-ink-soft">{attributionInWords(row.original.attributionQualifier, row.original.artist)}</div>
          </div>
        ),
      },
      { accessorKey: "objectType", header: "Object", cell: (c) => OBJECT_TYPE_LABELS[c.getValue<ObjectType>()] },
      {
        accessorKey: "datingWords",
        header: "Date",
        cell: ({ row }) =>
          row.original.datingEdtf ? (
            <div>
              <div>{row.original.datingWords}</div>
              <div className="font-mono text-xs text-ink-faint">{row.original.datingEdtf}</div>
            </div>
          ) : (
            <span className="text-ink-faint">undated</span>
          ),
      },
      {
        accessorKey: "collectionName",
        header: "Collection",
        cell: ({ row }) => (
          <div>
            <div>{row.original.collectionName ?? "—"}</div>
            {row.original.accessionNumber && <div className="font-mono text-xs text-ink-faint">{row.original.accessionNumber}</div>}
          </div>
        ),
      },
      {
        accessorKey: "placeName",
        header: "Place",
        cell: ({ row }) => (row.original.placeName ? `${row.original.placeName}${row.original.countryCode ? ` (${row.original.countryCode})` : ""}` : "—"),
      },
    ],
    [],
  );

  const table = useReactTable({ data: query.data?.sources ?? [], columns, getCoreRowModel: getCoreRowModel(), manualSorting: true, manualPagination: true });
  const data = query.data;

  return (
    <section aria-labelledby="sources-heading">
      <h2 id="sources-heading" className="sr-only">
        Sources
      </h2>
      <SourcesFilters options={options} values={Object.fromEntries(FILTER_KEYS.map((k) => [k, params.get(k) ?? ""]))} onChange={setParams} />
      <div aria-live="polite" className="my-3 text-sm text-ink-soft">
        {query.error ? <Notice tone="warn">{query.error.message}</Notice> : data ? `${data.total} source${data.total === 1 ? "" : "s"}` : "Fetching sources…"}
      </div>
      <ServerTable
        table={table}
        sortKeyOf={(id) => SORTS[id]}
        sort={sort}
        dir={dir}
        onSort={(key, d) => setParams({ sort: key, dir: d })}
        empty={data && data.sources.length === 0 ? "No source matches these filters." : null}
        minWidth="760px"
        cellClass="align-top"
      />
      <nav aria-label="Pages" className="mt-3 flex justify-end gap-2">
        <Button type="button" variant="quiet" disabled={!data?.previous} onClick={() => data?.previous && setParams({ before: data.previous, after: null }, true)}>
          Previous
        </Button>
        <Button type="button" variant="quiet" disabled={!data?.next} onClick={() => data?.next && setParams({ after: data.next, before: null }, true)}>
          Next
        </Button>
      </nav>
    </section>
  );
}
