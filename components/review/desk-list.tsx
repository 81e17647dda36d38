import Link from "next/link";
import { observationSentence } from "@/lib/regions/types";
import type { DeskEntry } from "@/lib/review/desk-schema";
import { RegionCrop } from "./region-crop";

const day = (iso: string) => iso.slice(0, 10);

/** The proposed regions of one desk page, each with its crop, its source, its author and what it records. */
export function DeskList({ entries, filters }: { entries: DeskEntry[]; filters: string }) {
  return (
    <ol aria-label="Proposed regions, longest waiting first" className="flex flex-col gap-3">
      {entries.map((e) => {
        const href = `/review/${e.regionId}${filters ? `?${filters}` : ""}`;
        const shown = e.observations.slice(0, 4);
        return (
          <li key={e.regionId} className="flex flex-wrap gap-4 rounded border border-rule bg-card p-3">
            <Link href={href} className="shrink-0" tabIndex={-1} aria-hidden="true">
              <RegionCrop imageId={e.imageId} area={e.box} shape={e.shape} size={140} alt="" />
            </Link>
            <div className="min-w-0 flex-1">
              <h2 className="text-xl">
                <Link href={href}>
                  Region {e.regionId}
                  {e.label ? `: ${e.label}` : ""}
                </Link>
              </h2>
              <p className="text-sm text-ink-soft">
                on <span className="font-serif text-base text-ink">“{e.sourceTitle}”</span> · by {e.authorName} · proposed {day(e.proposedAt)} · version {e.versionNumber}
              </p>
              <p className="mt-1 flex flex-wrap gap-2 text-xs uppercase tracking-wider">
                <span className="rounded bg-paper-deep px-1.5 py-0.5">{e.reviewedBefore ? "revised after review" : "first review"}</span>
                {e.own && <span className="rounded bg-warn-wash px-1.5 py-0.5 text-warn">yours: another editor reviews it</span>}
              </p>
              {shown.length > 0 && (
                <ul className="mt-2 text-sm">
                  {shown.map((o) => (
                    <li key={o.id}>{observationSentence(o)}</li>
                  ))}
                  {e.observations.length > shown.length && <li className="text-ink-faint">and {e.observations.length - shown.length} more</li>}
                </ul>
              )}
            </div>
          </li>
        );
      })}
    </ol>
  );
}
