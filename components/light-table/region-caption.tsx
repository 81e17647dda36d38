// The caption under a crop: where the region comes from (source, attribution, date, place, holding
// collection), what was observed in it, and how far it has been reviewed. Renders only; the words are
// made on the server.
import Link from "next/link";
import { reviewWords, type LightTableItem } from "@/lib/light-table/types";

export function RegionCaption({ item }: { item: LightTableItem }) {
  const { source } = item;
  const vetted = item.state === "vetted";
  const holding = [source.collection, source.accessionNumber].filter(Boolean).join(", ");
  return (
    <figcaption className="mt-2 space-y-1 text-sm">
      <p className="font-serif text-lg leading-snug text-ink">
        <Link href={`/sources/${source.id}`}>{source.title}</Link>
      </p>
      <p className="text-ink-soft">{source.attribution}</p>
      <p className="text-ink-soft">
        {source.dating ?? "Not dated"}
        {source.datingEdtf && source.dating && <span className="ml-1 font-mono text-xs text-ink-faint">({source.datingEdtf})</span>}
        {" · "}
        {source.place ?? "place of making not known"}
      </p>
      <p className="text-ink-soft">{holding || "Holding collection not recorded"}</p>
      <p className="text-ink-faint">
        {item.label ? `“${item.label}”, ` : ""}region {item.regionId}, marked by {item.authorName} ·{" "}
        <Link href={`/sources/${source.id}/images/${item.imageId}`} className="print:no-underline">
          photograph
        </Link>
      </p>
      {item.observations.length > 0 ? (
        <ul aria-label="Observations" className="list-disc space-y-0.5 pl-5 text-ink">
          {item.observations.map((o, i) => (
            <li key={i}>{o}</li>
          ))}
        </ul>
      ) : (
        <p className="text-ink-faint">No observations recorded.</p>
      )}
      <p
        data-testid="review-state"
        className={`inline-block rounded border px-2 py-0.5 text-xs font-semibold ${vetted ? "border-accent text-accent-deep" : "border-warn bg-warn-wash text-warn"}`}
      >
        {reviewWords(item)}
      </p>
    </figcaption>
  );
}
