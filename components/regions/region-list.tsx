"use client";

// Every region of the photograph, in reading order: a crop of it from the IIIF service, its label,
// its observations and its review state. Choosing one selects it on the photograph as well.
import { iiifBase } from "@/components/images/image-types";
import { regionUrl } from "@/lib/iiif/fragments";
import { observationSentence } from "@/lib/regions/types";
import { RegionStateBadge } from "./region-state-badge";
import { describeShape } from "./region-shapes";
import { describeObservation, type Vocabulary } from "./use-vocabulary";
import type { RegionDraft } from "./use-region-workspace";

type Props = {
  imageId: number;
  drafts: RegionDraft[];
  selectedId: number | null;
  vocabulary: Vocabulary;
  /** The viewer's own regions are theirs to edit; others' are shown with their author's name. */
  viewerIsAuthor(d: RegionDraft): boolean;
  onSelect(id: number): void;
};

/** What a region is called in lists: its label, else its place in the list. */
export const regionName = (d: RegionDraft, index: number) => d.label || `Region ${index + 1}`;

export function RegionList({ imageId, drafts, selectedId, vocabulary, viewerIsAuthor, onSelect }: Props) {
  return (
    <ol aria-label="Regions" className="grid gap-2">
      {drafts.map((d, i) => {
        const selected = d.view.id === selectedId;
        // Edits not saved yet change the outline before the stored box: crop from the stored one.
        const crop = regionUrl(iiifBase(imageId), d.view.box, { width: 160, height: 160 });
        const sentences = d.edited ? d.observations.map((o) => describeObservation(o, vocabulary)) : d.view.observations.map(observationSentence);
        return (
          <li key={d.view.id} data-testid="region-item" data-region-id={d.view.id}>
            <button
              type="button"
              aria-pressed={selected}
              onClick={() => onSelect(d.view.id)}
              className={`flex w-full gap-3 rounded border p-2 text-left text-sm hover:bg-paper-deep ${selected ? "border-accent bg-accent-wash" : "border-rule bg-card"}`}
            >
              <img src={crop} alt="" width={64} height={64} loading="lazy" className="h-16 w-16 shrink-0 rounded-sm bg-paper-deep object-contain" />
              <span className="grid min-w-0 flex-1 content-start gap-1">
                <span className="flex flex-wrap items-center gap-2">
                  <span className="font-semibold text-ink">{regionName(d, i)}</span>
                  <RegionStateBadge state={d.view.state} unreviewed={!viewerIsAuthor(d)} />
                  {d.view.pendingRevision && <span className="text-xs text-ink-faint">a revision is under review</span>}
                </span>
                {sentences.length > 0 ? (
                  <span className="grid gap-0.5 text-ink-soft">
                    {sentences.map((s, k) => (
                      <span key={k} data-testid="region-observation">
                        {s}
                      </span>
                    ))}
                  </span>
                ) : (
                  <span className="text-ink-faint">No observations yet</span>
                )}
                <span className="text-xs text-ink-faint">
                  <span data-testid="region-shape">{describeShape(d.shape)}</span>
                  {viewerIsAuthor(d) ? "" : ` · by ${d.view.authorName}`}
                </span>
              </span>
            </button>
          </li>
        );
      })}
    </ol>
  );
}
