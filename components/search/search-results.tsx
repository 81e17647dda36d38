// Search results as a grid of region crops or as a table; each opens the region in the image viewer.
import Link from "next/link";
import { iiifBase } from "@/components/images/image-types";
import { AddToLightTable } from "@/components/light-table/add-to-light-table";
import { regionUrl } from "@/lib/iiif/fragments";
import type { RegionDocument } from "@/lib/search/documents";
import { formatKm } from "@/lib/search/near";
import { ResultKeys } from "./result-keys";

export const viewerHref = (hit: RegionDocument) => `/sources/${hit.sourceId}/images/${hit.imageId}?region=${hit.regionId}`;

function crop(hit: RegionDocument, size: number): string | null {
  const box = { x: Math.round(hit.box.x), y: Math.round(hit.box.y), w: Math.round(hit.box.w), h: Math.round(hit.box.h) };
  if (box.w < 1 || box.h < 1) return null;
  return regionUrl(iiifBase(hit.imageId), box, { width: size, height: size });
}

const titleOf = (hit: RegionDocument) => hit.label || hit.terms.slice(0, 3).join(", ") || `Region ${hit.regionId}`;
const whereWhen = (hit: RegionDocument) => [hit.datingWords ?? hit.dating, hit.place, hit.country].filter(Boolean).join(" · ");

type Hit = RegionDocument & { distanceKm?: number | null };

export function ResultGrid({ hits, proposed }: { hits: Hit[]; proposed: boolean }) {
  return (
    <ResultKeys>
      <ul className="grid grid-cols-2 gap-3 sm:grid-cols-3 lg:grid-cols-4" aria-label="Results (arrow keys move between them)">
        {hits.map((hit) => {
          const src = crop(hit, 240);
          return (
            <li key={hit.id} className="rounded border border-rule bg-card" data-testid="search-result" data-region={hit.regionId} data-country={hit.country ?? ""}>
              <Link href={viewerHref(hit)} data-result className="block p-2 no-underline focus-visible:outline-2 focus-visible:outline-accent">
                {src ? (
                  // eslint-disable-next-line @next/next/no-img-element
                  <img src={src} alt="" width={240} height={240} loading="lazy" className="mb-2 aspect-square w-full bg-paper-deep object-contain" />
                ) : null}
                <span className="block font-semibold">{titleOf(hit)}</span>
                <span className="block text-sm text-ink-soft">{hit.sourceTitle}</span>
                <span className="block text-xs text-ink-faint">{whereWhen(hit)}</span>
                {typeof hit.distanceKm === "number" && (
                  <span className="block text-xs text-ink-faint" data-testid="result-distance">
                    {formatKm(hit.distanceKm)} away
                  </span>
                )}
                {hit.copy === "working" && <span className="mt-1 inline-block rounded bg-paper-deep px-1 text-xs">{hit.state}, not yet vetted</span>}
              </Link>
              <AddToLightTable regionId={hit.regionId} proposed={proposed} showOpen={false} className="px-2 pb-2" />
            </li>
          );
        })}
      </ul>
    </ResultKeys>
  );
}

/** With `showDistance` (a search near a place), a column gives each hit's distance from that place. */
export function ResultTable({ hits, proposed, showDistance = false }: { hits: Hit[]; proposed: boolean; showDistance?: boolean }) {
  return (
    <ResultKeys className="overflow-x-auto">
      <table className="w-full text-sm">
        <caption className="sr-only">Results</caption>
        <thead>
          <tr className="border-b border-rule text-left">
            <th scope="col" className="py-1 pr-3">Region</th>
            <th scope="col" className="py-1 pr-3">Source</th>
            <th scope="col" className="py-1 pr-3">Date</th>
            <th scope="col" className="py-1 pr-3">Place</th>
            {showDistance && <th scope="col" className="py-1 pr-3 text-right">Distance</th>}
            <th scope="col" className="py-1 pr-3">Observed</th>
            <th scope="col" className="py-1 pr-3">State</th>
            <th scope="col" className="py-1"><span className="sr-only">Light table</span></th>
          </tr>
        </thead>
        <tbody>
          {hits.map((hit) => (
            <tr key={hit.id} className="border-b border-rule align-top" data-testid="search-result" data-region={hit.regionId} data-country={hit.country ?? ""}>
              <td className="py-1 pr-3">
                <Link href={viewerHref(hit)} data-result>{titleOf(hit)}</Link>
              </td>
              <td className="py-1 pr-3">{hit.sourceTitle}</td>
              <td className="py-1 pr-3">{hit.datingWords ?? hit.dating ?? "undated"}</td>
              <td className="py-1 pr-3">{[hit.place, hit.country].filter(Boolean).join(", ")}</td>
              {showDistance && (
                <td className="py-1 pr-3 text-right tabular-nums" data-testid="result-distance">
                  {hit.distanceKm === null || hit.distanceKm === undefined ? "—" : formatKm(hit.distanceKm)}
                </td>
              )}
              <td className="py-1 pr-3">{hit.terms.join(", ")}</td>
              <td className="py-1 pr-3">{hit.state}</td>
              <td className="py-1">
                <AddToLightTable regionId={hit.regionId} proposed={proposed} showOpen={false} />
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </ResultKeys>
  );
}
