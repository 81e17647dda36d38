"use client";

// The stringing check of the whole source (GET /api/sources/:id/stringing) under the regions panel: the
// counts on this photograph meet those on the source's other photographs there. Fetched again whenever
// a region changes (the list's cache writes mark it stale), with proposed work when the panel shows it.
import { useQuery } from "@tanstack/react-query";
import { api } from "@/lib/client/api";
import type { StringingReport } from "@/lib/stringing";
import { StringingReportPanel } from "./stringing-report";

export const stringingKey = (sourceId: number, proposed: boolean) => ["stringing", sourceId, proposed ? "with-proposed" : "shown"] as const;

export function SourceStringing({ sourceId, proposed }: { sourceId: number; proposed: boolean }) {
  const query = useQuery({
    queryKey: stringingKey(sourceId, proposed),
    queryFn: () => api<StringingReport>(`/api/sources/${sourceId}/stringing${proposed ? "?proposed=1" : ""}`),
    refetchOnWindowFocus: false,
  });
  if (!query.data || query.data.status === "empty") return null;
  return (
    <div className="border-t border-rule pt-3">
      <p className="mb-2 text-xs text-ink-faint">For the whole source, all its photographs together.</p>
      <StringingReportPanel report={query.data} headingId="photograph-stringing-heading" />
    </div>
  );
}
