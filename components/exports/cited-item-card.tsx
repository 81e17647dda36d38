// One item as a dossier page and the print pages (of a dossier, of a search) show it: the crop of a region
// (from the IIIF image service) or the source's first photograph, its caption, the owner's note if any,
// and a suggested citation.
import Link from "next/link";
import type { ReactNode } from "react";
import { iiifBase, thumbnailUrl } from "@/components/images/image-types";
import { AddToLightTable } from "@/components/light-table/add-to-light-table";
import { citeItem } from "@/lib/exports/citation";
import type { CitedItem } from "@/lib/exports/cited-items";
import { regionUrl } from "@/lib/iiif/fragments";
import { observationSentence, STATE_WORDS } from "@/lib/regions/types";
import { OBJECT_TYPE_LABELS } from "@/lib/sources/vocab";

/** How the item is named in controls: "region 34 of “Lute Player”". */
export function itemLabel(item: CitedItem): string {
  return item.kind === "region" ? `region ${item.region.id}${item.region.label ? ` “${item.region.label}”` : ""} of “${item.source.title}”` : `“${item.source.title}”`;
}

function Picture({ item, size }: { item: CitedItem; size: number }) {
  const href = item.kind === "region" ? `/sources/${item.source.id}/images/${item.region.imageId}?region=${item.region.id}` : `/sources/${item.source.id}`;
  const src =
    item.kind === "region"
      ? regionUrl(iiifBase(item.region.imageId), item.region.box, { width: size, height: size })
      : item.source.imageId
        ? thumbnailUrl(item.source.imageId)
        : null;
  const alt = item.kind === "region" ? `Detail: ${item.region.label ?? `region ${item.region.id}`} of ${item.source.title}` : `Photograph of ${item.source.title}`;
  return (
    <Link href={href} className="flex shrink-0 items-center justify-center overflow-hidden rounded border border-rule bg-paper-deep p-1 print:border-0" style={{ width: size / 2, height: size / 2 }}>
      {src ? <img src={src} alt={alt} loading="lazy" className="max-h-full max-w-full object-contain" /> : <span className="p-2 text-center text-xs text-ink-faint">No photograph yet</span>}
    </Link>
  );
}

type CardProps = {
  item: CitedItem;
  baseUrl: string;
  accessed: string;
  size?: number;
  controls?: ReactNode;
  /** Offer "Add to light table" on a region (the dossier page; not on paper). */
  gather?: boolean;
};

export function CitedItemCard({ item, baseUrl, accessed, size = 400, controls, gather = false }: CardProps) {
  const s = item.source;
  const citation = citeItem(item, { baseUrl, accessed });
  const region = item.kind === "region" ? item.region : null;
  return (
    <article className="flex flex-col gap-4 sm:flex-row print:flex-row">
      <Picture item={item} size={size} />
      <div className="min-w-0 grow text-sm">
        <p className="text-xs uppercase tracking-wider text-ink-faint">
          {region ? `Region ${region.id}` : "Source"} · {OBJECT_TYPE_LABELS[s.objectType]}
          {region && region.state !== "vetted" && <span className="ml-1 text-warn">· {STATE_WORDS[region.state]}, not yet vetted</span>}
        </p>
        <h3 className="font-serif text-lg font-semibold leading-snug">
          {region?.label && <span>{region.label}, in </span>}
          <Link href={`/sources/${s.id}`}>
            <cite className="not-italic">{s.title}</cite>
          </Link>
        </h3>
        <dl className="mt-1 grid grid-cols-[8rem_1fr] gap-x-2 gap-y-0.5">
          {citation.attribution && <Row label="Attribution">{citation.attribution}</Row>}
          <Row label="Date">{citation.dateInWords ?? <span className="text-ink-faint">Not dated</span>}</Row>
          {s.place && <Row label="Place">{s.place}</Row>}
          {s.collectionName && (
            <Row label="Collection">
              {[s.collectionName, s.collectionCity].filter(Boolean).join(", ")}
              {s.accessionNumber && <span className="ml-1 font-mono text-xs">{s.accessionNumber}</span>}
            </Row>
          )}
        </dl>
        {region && region.observations.length > 0 && (
          <ul className="mt-2 list-disc pl-5" aria-label="Observations">
            {region.observations.map((o) => (
              <li key={o.id}>
                {observationSentence(o)}
                {o.note && <span className="text-ink-soft"> — {o.note}</span>}
              </li>
            ))}
          </ul>
        )}
        {item.note && (
          <blockquote className="mt-2 whitespace-pre-line border-l-2 border-accent pl-3 text-ink" aria-label="Note">
            {item.note}
          </blockquote>
        )}
        <p className="mt-2 text-xs text-ink-soft">
          <span className="font-semibold">Cite as: </span>
          {citation.segments.map((seg, n) => (seg.italic ? <i key={n}>{seg.text}</i> : <span key={n}>{seg.text}</span>))}
        </p>
        {gather && region && <AddToLightTable regionId={region.id} proposed={region.state !== "vetted"} showOpen={false} className="mt-2" />}
        {controls}
      </div>
    </article>
  );
}

function Row({ label, children }: { label: string; children: ReactNode }) {
  return (
    <>
      <dt className="text-ink-faint">{label}</dt>
      <dd>{children}</dd>
    </>
  );
}
