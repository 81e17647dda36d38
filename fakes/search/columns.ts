// One attribute of every document, kept for filtering and faceting so a query
// does not re-read and re-fold each document. Each distinct leaf value at the
// attribute (an "atom": the string, number or boolean exactly as stored) gets a
// small number and each document slot lists its atoms. A filter condition is
// then decided once per distinct value, with the plain evaluator's own leaf
// tests (filter-eval.ts), and read off the slots; facets count groups of atoms
// that share a facet key (`n:1640`, `s:sevilla`), as format.ts counts them.

import { Bitset } from "./bitset.js";
import { isEmptyValue, type Leaf } from "./filter-eval.js";
import { foldFacet } from "./filter.js";
import { rawValuesAt, type Doc } from "./fields.js";

/** `single[slot]` holds the slot's only atom, NONE, or MANY (its atoms are in `many`). */
export const NONE = -1;
export const MANY = -2;
/** Per-slot flags, from the raw values at the attribute: EXISTS, IS NULL and IS EMPTY. */
export const HAS_VALUE = 1;
export const HAS_NULL = 2;
export const HAS_EMPTY = 4;

export const facetLabel = (v: Leaf): string => (typeof v === "string" ? v.trim() : String(v));

/** Scalar leaves under a raw value, in document order (as leafValuesAt flattens them). */
function pushLeaves(v: unknown, out: Leaf[]): void {
  if (Array.isArray(v)) for (const item of v) pushLeaves(item, out);
  else if (typeof v === "string" || typeof v === "number" || typeof v === "boolean") out.push(v);
}

export class Column {
  // Atom numbers by type; Map keys compare by SameValueZero, so 0 and -0 share one, as their facet key does.
  private readonly strings = new Map<string, number>();
  private readonly numbers = new Map<number, number>();
  private readonly booleans = new Map<boolean, number>();
  /** Atom → its value. Atoms are never forgotten while the column lives; a rebuild starts afresh. */
  readonly atoms: Leaf[] = [];
  /** Atom → its facet group. */
  readonly atomGroup: number[] = [];
  // Facet groups, as format.ts keys them: numbers by value (`n:${v}`: 0 and -0 share one), strings
  // and booleans by folded text. Parallel arrays, as ids can give 100,000 groups of one document each.
  private readonly numberGroups = new Map<number, number>();
  private readonly textGroups = new Map<string, number>();
  /** Group → its number (numeric groups sort by it and feed facetStats), or null. */
  readonly groupNum: (number | null)[] = [];
  /** Group → the label of its first atom (numbers: null, their label is String(num)). */
  readonly groupText: (string | null)[] = [];
  /** Groups whose atoms read differently ("Köln" / "köln"): the label shown is the first met in hit order. */
  readonly mixed = new Set<number>();
  single = new Int32Array(0);
  // For MANY slots: the atoms in first-occurrence order, and (only where two of them share a group)
  // the groups without repeats, what facets count. Plain arrays: V8 keeps small integer arrays
  // compact, where 100k small typed arrays weigh on the GC.
  readonly many: (number[] | undefined)[] = [];
  readonly manyGroups: (number[] | undefined)[] = [];
  private flags = new Uint8Array(0);
  private readonly leaves: Leaf[] = [];

  /** A path without dots reads one own property; others go through rawValuesAt. */
  private readonly plain: boolean;

  constructor(readonly path: string) {
    this.plain = !path.includes(".");
  }

  get capacity(): number {
    return this.single.length;
  }

  private grow(min: number): void {
    if (min <= this.single.length) return;
    const size = Math.max(min, this.single.length * 2, 1024);
    const single = new Int32Array(size).fill(NONE);
    single.set(this.single);
    const flags = new Uint8Array(size);
    flags.set(this.flags);
    this.single = single;
    this.flags = flags;
  }

  private atom(v: Leaf): number {
    const ids: Map<Leaf, number> = typeof v === "string" ? this.strings : typeof v === "number" ? this.numbers : this.booleans;
    let id = ids.get(v);
    if (id !== undefined) return id;
    id = this.atoms.push(v) - 1;
    ids.set(v, id);
    this.atomGroup.push(this.group(v));
    return id;
  }

  private group(v: Leaf): number {
    if (typeof v === "number") {
      let group = this.numberGroups.get(v);
      if (group === undefined) {
        group = this.groupNum.push(v) - 1;
        this.groupText.push(null);
        this.numberGroups.set(v, group);
      }
      return group;
    }
    const key = foldFacet(String(v));
    const label = facetLabel(v);
    let group = this.textGroups.get(key);
    if (group === undefined) {
      group = this.groupNum.push(null) - 1;
      this.groupText.push(label);
      this.textGroups.set(key, group);
    } else if (this.groupText[group] !== label) this.mixed.add(group);
    return group;
  }

  get groupCount(): number {
    return this.groupNum.length;
  }

  /** The label of a group as format.ts shows it (for a mixed group: its first atom's). */
  label(group: number): string {
    return this.groupText[group] ?? String(this.groupNum[group]);
  }

  /** (Re)reads one slot's document; undefined empties the slot. */
  set(slot: number, doc: Doc | undefined): void {
    this.grow(slot + 1);
    if (this.single[slot] === MANY) this.many[slot] = this.manyGroups[slot] = undefined;
    this.single[slot] = NONE;
    this.flags[slot] = 0;
    if (!doc) return;
    let raws: unknown[];
    if (this.plain) {
      if (!Object.hasOwn(doc, this.path)) return;
      const v = doc[this.path];
      // The common case, one scalar: no arrays to build.
      if (typeof v === "string" || typeof v === "number" || typeof v === "boolean") {
        this.flags[slot] = v === "" ? HAS_VALUE | HAS_EMPTY : HAS_VALUE;
        this.single[slot] = this.atom(v);
        return;
      }
      raws = [v];
    } else raws = rawValuesAt(doc, this.path);
    if (raws.length === 0) return;
    let flags = HAS_VALUE;
    const leaves = this.leaves;
    leaves.length = 0;
    for (const raw of raws) {
      if (raw === null) flags |= HAS_NULL;
      if (isEmptyValue(raw)) flags |= HAS_EMPTY;
      pushLeaves(raw, leaves);
    }
    this.flags[slot] = flags;
    if (leaves.length === 0) return;
    const first = this.atom(leaves[0]!);
    let list: number[] | null = null;
    for (let i = 1; i < leaves.length; i++) {
      const a = this.atom(leaves[i]!);
      if (a === first || list?.includes(a)) continue;
      (list ??= [first]).push(a);
    }
    if (list) {
      this.single[slot] = MANY;
      this.many[slot] = list;
      const groups: number[] = [];
      for (const a of list) if (!groups.includes(this.atomGroup[a]!)) groups.push(this.atomGroup[a]!);
      if (groups.length < list.length) this.manyGroups[slot] = groups;
    } else this.single[slot] = first;
  }

  /** Atoms of one slot, in first-occurrence order. */
  atomsOf(slot: number): ArrayLike<number> {
    const a = this.single[slot] ?? NONE;
    return a >= 0 ? [a] : a === MANY ? this.many[slot]! : [];
  }

  /** Marks the atoms whose value passes `test` (one call per distinct value). */
  matching(test: (v: Leaf) => boolean): Uint8Array {
    const out = new Uint8Array(this.atoms.length);
    for (let i = 0; i < out.length; i++) if (test(this.atoms[i]!)) out[i] = 1;
    return out;
  }

  /** Slots holding at least one marked atom. */
  select(marked: Uint8Array, size: number): Bitset {
    const out = new Bitset(size);
    if (!marked.includes(1)) return out;
    const single = this.single;
    const n = Math.min(size, single.length);
    for (let s = 0; s < n; s++) {
      const a = single[s]!;
      if (a >= 0) {
        if (marked[a]) out.add(s);
      } else if (a === MANY) {
        for (const m of this.many[s]!) {
          if (marked[m]) {
            out.add(s);
            break;
          }
        }
      }
    }
    return out;
  }

  /** Slots whose flags include `flag`. */
  flagged(flag: number, size: number): Bitset {
    const out = new Bitset(size);
    const n = Math.min(size, this.flags.length);
    for (let s = 0; s < n; s++) if (this.flags[s]! & flag) out.add(s);
    return out;
  }
}
