import type { Metadata } from "next";
import Link from "next/link";
import { CitedItemCard } from "@/components/exports/cited-item-card";
import { PrintButton } from "@/components/exports/print-button";
import { EmptyState } from "@/components/ui/empty-state";
import { currentActor } from "@/lib/auth/session";
import { countryName } from "@/lib/catalogue/countries";
import { appUrl } from "@/lib/config";
import { AppError } from "@/lib/errors";
import { accessedOn } from "@/lib/exports/citation";
import { exportSearch } from "@/lib/search/export";
import { exportHref, searchHref, toUrlParams, type RawParams } from "@/lib/search/page/url";
import { searchInWords } from "@/lib/search/page/words";
import { labelsFor, resolveNear } from "@/lib/search/query";
import { exportParamsToQuery, PRINT_LIMIT, searchExportSchema } from "@/lib/search/schemas";
import { listVocabulary } from "@/lib/vocabulary/queries";

export const metadata: Metadata = { title: "Search results (for printing)" };

const count = (n: number) => `${n.toLocaleString("en")} ${n === 1 ? "region" : "regions"}`;

// A search's regions laid out for paper, in the search's order, as a dossier prints: larger crops, one
// region never split across pages, no controls; the site's header and the links here are left out of
// the print (Tailwind's print: variants). The heading says the search in words, so that the paper
// tells what was asked.
export default async function SearchPrintPage({ searchParams }: { searchParams: Promise<RawParams> }) {
  const actor = await currentActor();
  const params = toUrlParams(await searchParams);
  const back = new URLSearchParams(params);
  back.delete("limit");
  const links = (
    <p className="mb-4 flex flex-wrap items-center gap-4 text-sm print:hidden">
      <Link href={searchHref(back)}>Back to the search</Link>
      <a href={exportHref(params, "csv")} download>
        Download as CSV
      </a>
      <PrintButton />
    </p>
  );
  const parsed = searchExportSchema(PRINT_LIMIT).safeParse(exportParamsToQuery(params));
  const refusal = (message: string) => (
    <article className="mx-auto max-w-4xl">
      {links}
      <p role="alert" className="text-warn">
        {message} <Link href="/search">Start again</Link>.
      </p>
    </article>
  );
  if (!parsed.success) return refusal(`This search cannot be read: ${parsed.error.issues.map((i) => `${i.path.join(".")}: ${i.message}`).join("; ")}.`);
  const { limit, ...query } = parsed.data;
  let found, vocabulary, labels, near;
  try {
    [found, vocabulary, labels, near] = await Promise.all([exportSearch(actor, query, limit), listVocabulary(actor), labelsFor({}, query), resolveNear(query)]);
  } catch (error) {
    if (error instanceof AppError) return refusal(error.message);
    throw error;
  }
  const words = searchInWords(query, { vocabulary, labels, near, countryName: (code) => countryName(code) ?? code });
  const accessed = accessedOn(new Date());
  return (
    <article className="mx-auto max-w-4xl print:max-w-none print:text-[11pt]">
      {links}
      <header className="mb-6 border-b border-rule pb-3">
        <h1 className="text-3xl print:text-2xl">
          {words.title}
          {words.filters.length > 0 && <span className="mt-1 block text-lg text-ink-soft">{words.filters.join("; ")}</span>}
        </h1>
        <p className="text-sm text-ink-soft">
          A search of Cordarium · {count(found.items.length)} · {words.order} · exported {accessed}
        </p>
        {found.truncated && (
          <p className="mt-2 text-sm" data-testid="truncated">
            The search matches {count(found.total)}; this list holds the first {found.items.length.toLocaleString("en")}, in the search’s order.
          </p>
        )}
      </header>
      {found.items.length === 0 ? (
        <EmptyState title="Nothing matches this search" />
      ) : (
        <ol className="grid gap-6 print:block">
          {found.items.map((item, n) => (
            <li key={item.region.id} className="break-inside-avoid border-b border-rule pb-4 print:mb-4" data-testid="printed-region" data-region={item.region.id}>
              <p className="mb-1 font-mono text-xs text-ink-faint">{n + 1}</p>
              <CitedItemCard item={item} baseUrl={appUrl()} accessed={accessed} size={600} />
            </li>
          ))}
        </ol>
      )}
    </article>
  );
}
