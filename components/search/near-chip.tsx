// The active distance filter as a chip above the results, with a link that removes it (and the sort by
// distance, which means nothing without a place).
import Link from "next/link";
import { originName, type NearOrigin } from "@/lib/search/near";
import { withParams } from "@/lib/search/page/url";

export function NearChip({ near, params }: { near: NearOrigin; params: URLSearchParams }) {
  const text = `within ${near.km} km of ${originName(near.place)}`;
  const removed = withParams(params, { near: null, km: null, ...(params.get("sort") === "distance" ? { sort: null } : {}) });
  return (
    <p className="flex flex-wrap gap-2 text-sm">
      <span data-testid="near-chip" className="inline-flex items-center gap-1 rounded-full border border-accent bg-accent-wash py-0.5 pl-3 pr-1 text-accent-deep">
        <span>{text.charAt(0).toUpperCase() + text.slice(1)}</span>
        <Link href={removed} aria-label={`Remove the filter ${text}`} className="rounded-full px-1.5 text-base leading-none no-underline hover:bg-card">
          ×
        </Link>
      </span>
    </p>
  );
}
