// The source page's evidence summary: the stringing check over the regions the reader may see, and the
// open-standard documents to take the evidence elsewhere. Server component: it only renders.
import { StringingReportPanel } from "@/components/regions/stringing-report";
import type { StringingReport } from "@/lib/stringing";

type Props = { sourceId: number; regionCount: number; stringing: StringingReport; hasImages: boolean };

export function SourceEvidence({ sourceId, regionCount, stringing, hasImages }: Props) {
  return (
    <section aria-labelledby="evidence-heading" className="mb-8">
      <h2 id="evidence-heading" className="mb-2 text-2xl">Evidence</h2>
      <p className="mb-3 text-ink-soft">
        {regionCount === 0
          ? "No marked evidence on this source that you can see yet."
          : `${regionCount} marked ${regionCount === 1 ? "region" : "regions"} on the photographs of this source. Open a photograph to see them.`}
      </p>
      {stringing.status !== "empty" && <StringingReportPanel report={stringing} headingId="stringing-heading" />}
      {hasImages && (
        <p className="mt-3 text-sm text-ink-soft">
          For other tools: the <a href={`/iiif/3/manifests/${sourceId}`}>IIIF Presentation manifest</a> of this source, with its photographs and
          their marked regions as W3C Web Annotations.
        </p>
      )}
      <p className="mt-3 max-w-prose text-sm text-ink-faint">
        A picture is not a photograph of a performance: painters copied, simplified and allegorised. Playing advice drawn from it is no substitute
        for a teacher, or, where playing hurts, for a health professional.
      </p>
    </section>
  );
}
