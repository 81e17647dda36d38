// Facet distribution and stats from the columns (columns.ts): the numbers
// computeFacets in format.ts gives by re-reading every matched document (it
// stays as the reference the unit tests compare with), counted instead per
// facet group over the matched slots, with values folded once per distinct value.

import type { DocColumns } from "./doc-columns.js";
import { facetLabel, MANY, type Column } from "./columns.js";
import { facetOrder, type FacetEntry, type FacetResult } from "./format.js";
import { topK } from "./ranking.js";
import type { IndexSettings } from "./settings.js";

/** How many slots of `slots` hold each group (a slot counts once per group, as format.ts counts a document once per key). */
function countGroups(column: Column, slots: ArrayLike<number>): Int32Array {
  const counts = new Int32Array(column.groupCount);
  const { single, many, manyGroups, atomGroup } = column;
  for (let i = 0; i < slots.length; i++) {
    const slot = slots[i]!;
    const a = single[slot]!;
    if (a >= 0) counts[atomGroup[a]!]!++;
    else if (a === MANY) {
      const groups = manyGroups[slot];
      if (groups) for (const g of groups) counts[g]!++;
      else for (const atom of many[slot]!) counts[atomGroup[atom]!]!++;
    }
  }
  return counts;
}

/** The label format.ts would show for a group whose atoms read differently: the first one met in hit order. */
function firstLabel(column: Column, group: number, slots: ArrayLike<number>): string {
  for (let i = 0; i < slots.length; i++) {
    const atoms = column.atomsOf(slots[i]!);
    for (let j = 0; j < atoms.length; j++) if (column.atomGroup[atoms[j]!] === group) return facetLabel(column.atoms[atoms[j]!]!);
  }
  return column.label(group);
}

/** Facets of the documents in `slots` (hit order); `dropEmpty` leaves out facets no matched document has. */
export function countFacets(settings: IndexSettings, facets: string[], slots: ArrayLike<number>, index: DocColumns, dropEmpty: boolean): FacetResult {
  const facetDistribution: FacetResult["facetDistribution"] = {};
  const facetStats: FacetResult["facetStats"] = {};
  const { maxValuesPerFacet, sortFacetValuesBy } = settings.faceting;
  for (const facet of facets) {
    const column = index.column(facet);
    const counts = countGroups(column, slots);
    const entries: FacetEntry[] = [];
    let min = Infinity;
    let max = -Infinity;
    for (let g = 0; g < counts.length; g++) {
      if (counts[g] === 0) continue;
      const num = column.groupNum[g]!;
      // Numbers order by value, so their label (String(num)) is only written for the values shown.
      entries.push([num !== null ? "" : column.mixed.has(g) ? firstLabel(column, g, slots) : column.label(g), counts[g]!, num]);
      if (num !== null) (min = Math.min(min, num)), (max = Math.max(max, num));
    }
    if (dropEmpty && entries.length === 0) continue;
    const cmp = facetOrder(sortFacetValuesBy[facet] ?? sortFacetValuesBy["*"] ?? "alpha");
    // Values unique to a document (ids) can number in the 100,000s; only the shown ones need ordering.
    const shown = maxValuesPerFacet * 8 < entries.length ? topK(entries, cmp, maxValuesPerFacet) : entries.sort(cmp).slice(0, maxValuesPerFacet);
    facetDistribution[facet] = Object.fromEntries(shown.map(([label, count, num]) => [num !== null ? String(num) : label, count]));
    if (min !== Infinity) facetStats[facet] = { min, max };
  }
  return { facetDistribution, facetStats };
}
