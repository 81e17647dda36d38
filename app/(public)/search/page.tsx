import type { Metadata } from "next";
import Link from "next/link";
import { FacetPanel } from "@/components/search/facet-panel";
import { NearChip } from "@/components/search/near-chip";
import { NearFilter } from "@/components/search/near-filter";
import { SearchBox } from "@/components/search/search-box";
import { SearchCharts } from "@/components/search/search-charts";
import { ResultGrid, ResultTable } from "@/components/search/search-results";
import { OpenLightTableLink } from "@/components/light-table/add-to-light-table";
import { EmptyState } from "@/components/ui/empty-state";
import { PageTitle } from "@/components/ui/page-title";
import { can } from "@/lib/auth/policy";
import { currentActor } from "@/lib/auth/session";
import { countryName } from "@/lib/catalogue/countries";
import { lightTableHref, MAX_REGIONS } from "@/lib/light-table/links";
import { boxAround } from "@/lib/charts/projection";
import { worldMap } from "@/lib/charts/world-map";
import { ValidationError } from "@/lib/errors";
import type { RegionDocument } from "@/lib/search/documents";
import { nearKm, originName } from "@/lib/search/near";
import { CHART_LIMIT, searchHistogram, searchPlaces } from "@/lib/search/page/charts";
import { facetGroups } from "@/lib/search/page/facets";
import { exportHref, toUrlParams, withParams, type RawParams } from "@/lib/search/page/url";
import { SORT_LABELS } from "@/lib/search/page/words";
import { SearchUnavailableError, searchArchive, searchChartHits } from "@/lib/search/query";
import { EXPORT_LIMIT, PRINT_LIMIT, searchParamsToQuery, searchQuerySchema } from "@/lib/search/schemas";
import { listVocabulary } from "@/lib/vocabulary/queries";
import { DateFilter, Pager, SortAndView } from "./controls";

export const metadata: Metadata = { title: "Search the evidence" };

export default async function SearchPage({ searchParams }: { searchParams: Promise<RawParams> }) {
  const actor = await currentActor();
  const params = toUrlParams(await searchParams);
  params.delete("scope");
  const view = params.get("view") === "table" ? "table" : "grid";
  const stack = params.get("stack") || null;
  const parsed = searchQuerySchema.safeParse(searchParamsToQuery(params));
  const title = (
    <>
      <PageTitle title="Search the evidence" lead="Every vetted region of the archive: what it shows, where and when it was made. Narrow by the facets, the dates or the charts; the address keeps the whole search, so it can be shared." />
      <div className="mb-6">
        <SearchBox initial={params.get("q") ?? ""} />
      </div>
    </>
  );
  if (!parsed.success) {
    return (
      <>
        {title}
        <p role="alert" className="text-warn">This search cannot be read: {parsed.error.issues.map((i) => `${i.path.join(".")}: ${i.message}`).join("; ")}. <Link href="/search">Start again</Link>.</p>
      </>
    );
  }
  const query = parsed.data;
  const name = (code: string) => countryName(code) ?? code;
  let answer, chartHits, vocabulary;
  try {
    [answer, chartHits, vocabulary] = await Promise.all([
      searchArchive(actor, query),
      searchChartHits(actor, { ...query, page: 1 }, { limit: CHART_LIMIT, stackAspect: stack }),
      listVocabulary(actor),
    ]);
  } catch (error) {
    if (error instanceof SearchUnavailableError || error instanceof ValidationError) {
      return (
        <>
          {title}
          <p role="alert" className="text-warn">{error.message}</p>
        </>
      );
    }
    throw error;
  }
  const hits = answer.hits as (RegionDocument & { distanceKm?: number | null })[];
  const near = answer.near;
  // Sorting by distance is offered only while a place is chosen.
  const sortLabels = Object.fromEntries(Object.entries(SORT_LABELS).filter(([key]) => key !== "distance" || near)) as Record<string, string>;
  const groups = facetGroups(answer.facetDistribution, answer.labels, vocabulary, name, params);
  const stackOptions = vocabulary
    .filter((a) => a.kind === "terms" && !a.deprecated)
    .map((a) => ({ key: a.key, label: a.label, terms: Object.fromEntries(a.terms.map((t) => [t.key, t.label])) }));
  const mayPropose = can(actor, "archive.read_proposed");
  const places = searchPlaces(chartHits.hits);

  return (
    <>
      {title}
      <div className="grid gap-6 lg:grid-cols-[16rem_1fr]">
        <aside className="space-y-6">
          <DateFilter params={params} />
          <NearFilter key={`${near?.place.id ?? ""}-${near?.km ?? ""}`} place={near?.place ?? null} km={nearKm(query)} />
          {mayPropose && (
            <p className="text-sm">
              <Link href={withParams(params, { proposed: query.proposed ? null : "1" })} role="checkbox" aria-checked={query.proposed}>
                {query.proposed ? "☑" : "☐"} Include proposed work
              </Link>
            </p>
          )}
          <FacetPanel groups={groups} params={params} />
        </aside>
        <div className="min-w-0 space-y-6">
          <section aria-labelledby="results-title" className="space-y-3">
            <div className="flex flex-wrap items-baseline justify-between gap-2">
              <h2 id="results-title" className="text-xl" data-testid="result-total">
                {answer.total} {answer.total === 1 ? "region" : "regions"}
              </h2>
              <SortAndView params={params} sort={query.sort} view={view} labels={sortLabels} />
            </div>
            {near && <NearChip near={near} params={params} />}
            {hits.length === 0 ? (
              <EmptyState title="Nothing matches this search">Remove a filter or try other words.</EmptyState>
            ) : view === "table" ? (
              <ResultTable hits={hits} proposed={query.proposed} showDistance={near !== null} />
            ) : (
              <ResultGrid hits={hits} proposed={query.proposed} />
            )}
            {hits.length > 0 && (
              <p className="flex flex-wrap gap-4 text-sm">
                <Link href={lightTableHref(hits.map((h) => h.regionId).slice(0, MAX_REGIONS), { proposed: query.proposed })} className="font-semibold">
                  Open these on the light table
                </Link>
                <OpenLightTableLink proposed={query.proposed} label="Open the regions you gathered" />
              </p>
            )}
            {hits.length > 0 && <ExportLinks params={params} total={answer.total} />}
            <Pager params={params} page={answer.page} totalPages={answer.totalPages} />
          </section>
          {answer.total > 0 && (
            <SearchCharts
              histogram={searchHistogram(chartHits.hits, stack, { from: query.from, to: query.to })}
              places={places}
              // Zoomed to where the evidence is, so that small countries are large enough to click.
              map={worldMap({ width: 960, height: 500, focus: boxAround(places.places) })}
              params={params}
              stack={stack}
              stackOptions={stackOptions}
              charted={chartHits.hits.length}
              total={answer.total}
              countryName={name}
              origin={near ? { name: originName(near.place), latitude: near.place.latitude, longitude: near.place.longitude, km: near.km } : undefined}
            />
          )}
        </div>
      </div>
    </>
  );
}

const many = (n: number) => n.toLocaleString("en");

/** Every page of these results, not only the one shown, as CSV and as a list for paper; each says its cap. */
function ExportLinks({ params, total }: { params: URLSearchParams; total: number }) {
  return (
    <div className="text-sm">
      <p className="flex flex-wrap gap-4">
        <a href={exportHref(params, "csv")} download>
          Download these results as CSV
        </a>
        <Link href={exportHref(params, "print")}>Printable list</Link>
      </p>
      {total > EXPORT_LIMIT ? (
        <p className="text-xs text-ink-faint" data-testid="export-cap">
          The CSV holds the first {many(EXPORT_LIMIT)} of these {many(total)} regions and the printable list the first {many(PRINT_LIMIT)}, in the order shown.
        </p>
      ) : total > PRINT_LIMIT ? (
        <p className="text-xs text-ink-faint" data-testid="export-cap">
          The CSV holds all {many(total)} regions; the printable list the first {many(PRINT_LIMIT)}, in the order shown.
        </p>
      ) : null}
    </div>
  );
}
