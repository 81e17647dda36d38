// Evaluates a parsed filter against one document, with Meilisearch's semantics:
// an array field matches when any element matches, strings compare
// case-insensitively, numbers numerically (numeric strings count as numbers too),
// and `!=` / NOT also keep documents that lack the field.

import { leafValuesAt, rawValuesAt, isPlainObject } from "./fields.js";
import { foldFacet, parseNumber, type FilterNode, type FilterValue } from "./filter.js";

export type Leaf = string | number | boolean;

const leafNumber = (v: Leaf): number | null =>
  typeof v === "number" ? v : typeof v === "string" ? parseNumber(v) : null;
const leafString = (v: Leaf): string | null =>
  typeof v === "string" ? foldFacet(v) : typeof v === "boolean" ? String(v) : null;

/** Whether one leaf value satisfies `= target` (the filter index asks this once per distinct value). */
export function equals(v: Leaf, target: FilterValue): boolean {
  if (target.num !== null && typeof v === "number") return v === target.num;
  const s = leafString(v);
  if (s !== null && s === target.folded) return true;
  const n = leafNumber(v);
  return n !== null && target.num !== null && n === target.num;
}

/** Whether one leaf value satisfies `op target`. */
export function compare(v: Leaf, op: ">" | ">=" | "<" | "<=", target: FilterValue): boolean {
  let cmp: number;
  if (target.num !== null) {
    const n = leafNumber(v);
    if (n === null) return false;
    cmp = n - target.num;
  } else {
    // Non-numeric bound: lexicographic comparison of the stored facet strings.
    const s = leafString(v);
    if (s === null) return false;
    cmp = s < target.folded ? -1 : s > target.folded ? 1 : 0;
  }
  return op === ">" ? cmp > 0 : op === ">=" ? cmp >= 0 : op === "<" ? cmp < 0 : cmp <= 0;
}

export const isEmptyValue = (v: unknown): boolean =>
  v === "" || (Array.isArray(v) && v.length === 0) || (isPlainObject(v) && Object.keys(v).length === 0);

function geoPoint(doc: unknown): [number, number] | null {
  const geo = isPlainObject(doc) ? doc._geo : undefined;
  if (!isPlainObject(geo)) return null;
  const lat = typeof geo.lat === "number" ? geo.lat : parseNumber(String(geo.lat));
  const lng = typeof geo.lng === "number" ? geo.lng : parseNumber(String(geo.lng));
  return lat === null || lng === null ? null : [lat, lng];
}

/** Great-circle distance in metres, as `_geoRadius` uses. */
export function haversine([lat1, lng1]: [number, number], [lat2, lng2]: [number, number]): number {
  const rad = Math.PI / 180;
  const a =
    Math.sin(((lat2 - lat1) * rad) / 2) ** 2 +
    Math.cos(lat1 * rad) * Math.cos(lat2 * rad) * Math.sin(((lng2 - lng1) * rad) / 2) ** 2;
  return 2 * 6_371_008.8 * Math.asin(Math.sqrt(a));
}

export function matchesFilter(node: FilterNode, doc: unknown): boolean {
  switch (node.type) {
    case "all":
      return true;
    case "and":
      return node.children.every((c) => matchesFilter(c, doc));
    case "or":
      return node.children.some((c) => matchesFilter(c, doc));
    case "not":
      return !matchesFilter(node.child, doc);
    case "exists":
      return rawValuesAt(doc, node.attr.name).length > 0;
    case "null":
      return rawValuesAt(doc, node.attr.name).some((v) => v === null);
    case "empty":
      return rawValuesAt(doc, node.attr.name).some(isEmptyValue);
    case "compare": {
      const leaves = leafValuesAt(doc, node.attr.name);
      const { op, value } = node;
      if (op === "=") return leaves.some((v) => equals(v, value));
      if (op === "!=") return !leaves.some((v) => equals(v, value));
      return leaves.some((v) => compare(v, op, value));
    }
    case "range":
      return leafValuesAt(doc, node.attr.name).some(
        (v) => compare(v, ">=", node.from) && compare(v, "<=", node.to),
      );
    case "in": {
      const leaves = leafValuesAt(doc, node.attr.name);
      return leaves.some((v) => node.values.some((t) => equals(v, t)));
    }
    case "geoRadius": {
      const p = geoPoint(doc);
      return p !== null && haversine(p, [node.lat, node.lng]) <= node.radius;
    }
    case "geoBoundingBox": {
      const p = geoPoint(doc);
      if (!p) return false;
      const [topLat, rightLng] = node.top;
      const [bottomLat, leftLng] = node.bottom;
      const inLat = p[0] <= topLat && p[0] >= bottomLat;
      // The box may cross the antimeridian when left > right.
      const inLng = leftLng <= rightLng ? p[1] >= leftLng && p[1] <= rightLng : p[1] >= leftLng || p[1] <= rightLng;
      return inLat && inLng;
    }
  }
}
