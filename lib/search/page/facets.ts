// Facet counts from the search service → labelled groups for the page (pure). Aspect facets are named
// by their keys in the index; the vocabulary gives their labels, in the vocabulary's own order.
import { OBJECT_TYPE_LABELS, type ObjectType } from "@/lib/sources/vocab";
import type { AspectView } from "@/lib/vocabulary/types";
import type { FacetCounts, SearchAnswer } from "@/lib/search/query";
import { facetParam, listValues } from "./url";
import { centuryLabel, CONFIDENCE_LABELS, STATE_LABELS } from "./words";

export type FacetGroup = { param: string; title: string; values: { value: string; label: string; count: number }[] };

export function facetGroups(
  facets: FacetCounts,
  labels: SearchAnswer<unknown>["labels"],
  vocabulary: AspectView[],
  countryName: (code: string) => string,
  params: URLSearchParams,
): FacetGroup[] {
  const group = (facet: string, title: string, label: (v: string) => string, order: "count" | "value" = "count"): FacetGroup | null => {
    const param = facetParam(facet);
    const counts = facets[facet] ?? {};
    if (!param) return null;
    // A chosen value stays listed (to switch it off) even when the narrowed search no longer counts it.
    const chosen = listValues(params, param).filter((v) => !(v in counts));
    const values = [...Object.entries(counts).map(([value, count]) => ({ value, label: label(value), count })), ...chosen.map((value) => ({ value, label: label(value), count: 0 }))];
    if (!values.length) return null;
    values.sort(order === "value" ? (a, b) => Number(a.value) - Number(b.value) : (a, b) => b.count - a.count || a.label.localeCompare(b.label));
    return { param, title, values };
  };
  const aspectGroups = vocabulary.flatMap((a) => {
    const facet = a.kind === "count" ? `n_${a.key}` : `t_${a.key}`;
    const terms = new Map(a.terms.map((t) => [t.key, t.label]));
    const g = group(facet, a.label, (v) => terms.get(v) ?? v.replaceAll("_", " "), a.kind === "count" ? "value" : "count");
    return g ? [g] : [];
  });
  const fixed = [
    group("objectType", "Object type", (v) => OBJECT_TYPE_LABELS[v as ObjectType] ?? v),
    group("country", "Country", countryName),
    group("collectionId", "Collection", (v) => labels.collectionId[v] ?? `Collection ${v}`),
    group("century", "Century", (v) => centuryLabel(Number(v)), "value"),
    group("decade", "Decade", (v) => `${v}s`, "value"),
    group("confidence", "Confidence", (v) => CONFIDENCE_LABELS[v] ?? v),
    group("state", "Review state", (v) => STATE_LABELS[v] ?? v),
  ];
  return [...aspectGroups, ...fixed.filter((g): g is FacetGroup => g !== null)];
}
