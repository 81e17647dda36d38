"use client";

// The controlled vocabulary of observations (GET /api/vocabulary): aspects grouped by section, each
// with its kind and, for term lists, its terms. Read once per page; it changes only by editors' hands.
import { useQuery } from "@tanstack/react-query";
import { useMemo } from "react";
import { api } from "@/lib/client/api";
import type { ObservationInput } from "@/lib/regions/types";

export type VocabularyTerm = { id: number; key: string; label: string; description: string | null; position: number; deprecated: boolean };
export type VocabularyAspect = {
  id: number;
  key: string;
  label: string;
  description: string | null;
  kind: "terms" | "count" | "text";
  section: string;
  position: number;
  deprecated: boolean;
  terms: VocabularyTerm[];
};

/** The headings of the aspect picker, in the order a describer works: the instrument, then the player. */
export const SECTION_WORDS: Record<string, string> = {
  instrument: "The instrument",
  player: "The player",
  context: "Setting and ensemble",
  reliability: "The picture as evidence",
};

export function useVocabulary() {
  const query = useQuery({
    queryKey: ["vocabulary"],
    queryFn: () => api<{ aspects: VocabularyAspect[] }>("/api/vocabulary").then((v) => v.aspects),
    staleTime: Infinity,
    refetchOnWindowFocus: false,
  });
  const aspects = useMemo(() => query.data ?? [], [query.data]);
  const byId = useMemo(() => new Map(aspects.map((a) => [a.id, a])), [aspects]);
  const sections = useMemo(() => {
    const groups = new Map<string, VocabularyAspect[]>();
    for (const a of [...aspects].sort((x, y) => x.position - y.position)) groups.set(a.section, [...(groups.get(a.section) ?? []), a]);
    const known = Object.keys(SECTION_WORDS);
    return [...groups.entries()].sort(([a], [b]) => (known.indexOf(a) + 1 || 99) - (known.indexOf(b) + 1 || 99));
  }, [aspects]);
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
