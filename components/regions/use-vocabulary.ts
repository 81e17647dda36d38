"use client";

// The controlled vocabulary of observations (GET /api/vocabulary): aspects grouped by section, each
// with its kind and, for term lists, its terms. Read once per page; it changes only by editors' hands.
import { useQuery } from "@tanstack/react-query";
import { useMemo } from "react";
import { api } from "@/lib/client/api";
import type { ObservationInput } from "@/lib/regions/types";
import { ASPECT_SECTIONS, SECTION_LABELS } from "@/lib/vocabulary/kinds";
import type { AspectView, TermView, VocabularyList } from "@/lib/vocabulary/types";

export type VocabularyAspect = AspectView;
export type VocabularyTerm = TermView;

export function useVocabulary() {
  const query = useQuery({
    queryKey: ["vocabulary"],
    queryFn: () => api<VocabularyList>("/api/vocabulary").then((v) => v.aspects),
    staleTime: Infinity,
    refetchOnWindowFocus: false,
  });
  const aspects = useMemo(() => query.data ?? [], [query.data]);
  const byId = useMemo(() => new Map(aspects.map((a) => [a.id, a])), [aspects]);
  // Grouped under the vocabulary's own headings, in its order.
  const sections = useMemo(
    () =>
      ASPECT_SECTIONS.map((section) => ({ section, label: SECTION_LABELS[section], aspects: aspects.filter((a) => a.section === section).sort((x, y) => x.position - y.position) })).filter(
        (g) => g.aspects.length > 0,
      ),
    [aspects],
  );
  return { aspects, byId, sections, loading: query.isPending, error: query.error };
}

export type Vocabulary = ReturnType<typeof useVocabulary>;

/** "Right-hand technique: strumming (probable)", from an observation being edited and the vocabulary. */
export function describeObservation(o: ObservationInput, vocabulary: Pick<Vocabulary, "byId">): string {
  const aspect = vocabulary.byId.get(o.aspectId);
  if (!aspect) return `An observation (${o.confidence})`;
  const value =
    aspect.kind === "terms" ? (aspect.terms.find((t) => t.id === o.termId)?.label ?? "not chosen yet") : aspect.kind === "count" ? (o.count ?? "no number yet") : o.text || "not written yet";
  return `${aspect.label}: ${value} (${o.confidence})`;
}
