// Filters answered from the columns (columns.ts) instead of testing every
// document: each condition is decided once per distinct value with the plain
// evaluator's leaf tests (filter-eval.ts), so the slots found are exactly the
// documents matchesFilter accepts (tests/unit/search-fake-index.test.ts checks
// this on random documents and filters). Geo conditions read whole `_geo`
// objects, which columns do not keep: they are tested per document, and only
// over what the other conditions of an AND have left.

import { Bitset } from "./bitset.js";
import { HAS_EMPTY, HAS_NULL, HAS_VALUE } from "./columns.js";
import type { DocColumns } from "./doc-columns.js";
import { compare, equals, matchesFilter } from "./filter-eval.js";
import type { FilterNode } from "./filter.js";

/** The live slots whose documents match `node`. */
export function filterSlots(node: FilterNode, index: DocColumns): Bitset {
  return evaluate(node, index, index.slots.live(), null);
}

const perDocument = (node: FilterNode): boolean =>
  node.type === "geoRadius" || node.type === "geoBoundingBox" || (node.type === "not" && perDocument(node.child)) || ((node.type === "and" || node.type === "or") && node.children.some(perDocument));

/** Matches of `node` among `within` (every live slot when null); the result is a new set. */
function evaluate(node: FilterNode, index: DocColumns, live: Bitset, within: Bitset | null): Bitset {
  const restrict = (found: Bitset) => found.and(within ?? live);
  switch (node.type) {
    case "all":
      return (within ?? live).clone();
    case "and": {
      // Column conditions first: per-document ones then only see what is left.
      const children = [...node.children].sort((a, b) => Number(perDocument(a)) - Number(perDocument(b)));
      let acc = within;
      for (const child of children) acc = evaluate(child, index, live, acc);
      return acc ?? live.clone();
    }
    case "or": {
      const out = new Bitset(live.size);
      for (const child of node.children) out.or(evaluate(child, index, live, within));
      return out;
    }
    case "not":
      return (within ?? live).clone().andNot(evaluate(node.child, index, live, within));
    case "exists":
    case "null":
    case "empty": {
      const flag = node.type === "exists" ? HAS_VALUE : node.type === "null" ? HAS_NULL : HAS_EMPTY;
      return restrict(index.column(node.attr.name).flagged(flag, live.size));
    }
    case "compare": {
      const column = index.column(node.attr.name);
      const { op, value } = node;
      if (op === "=" || op === "!=") {
        const equal = column.select(column.matching((v) => equals(v, value)), live.size);
        return op === "=" ? restrict(equal) : (within ?? live).clone().andNot(equal);
      }
      return restrict(column.select(column.matching((v) => compare(v, op, value)), live.size));
    }
    case "range": {
      const column = index.column(node.attr.name);
      return restrict(column.select(column.matching((v) => compare(v, ">=", node.from) && compare(v, "<=", node.to)), live.size));
    }
    case "in": {
      const column = index.column(node.attr.name);
      return restrict(column.select(column.matching((v) => node.values.some((t) => equals(v, t))), live.size));
    }
    case "geoRadius":
    case "geoBoundingBox": {
      const out = new Bitset(live.size);
      const scope = within ?? live;
      const words = scope.words;
      for (let w = 0; w < words.length; w++) {
        for (let bits = words[w]!; bits !== 0; bits &= bits - 1) {
          const slot = (w << 5) | (31 - Math.clz32(bits & -bits));
          if (matchesFilter(node, index.slots.doc(slot))) out.add(slot);
        }
      }
      return out;
    }
  }
}
