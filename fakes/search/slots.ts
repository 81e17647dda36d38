// Dense numbers ("slots") for the documents of an index, so the filter and
// facet structures (columns.ts, bitset.ts) can use typed arrays indexed by
// document instead of maps keyed by id. A deleted document's slot is reused by
// a later one, which keeps the arrays as small as the index. Slots also keep
// each document's insertion rank (its ordinal), Meilisearch's final tie-break.

import { Bitset } from "./bitset.js";
import type { Doc } from "./fields.js";

export class Slots {
  /** Id → slot, in insertion order (a replaced document keeps its place, like the index's own map). */
  private readonly byId = new Map<string, number>();
  private readonly ids: (string | undefined)[] = [];
  private readonly docs: (Doc | undefined)[] = [];
  private readonly ordinals: number[] = [];
  private nextOrdinal = 0;
  private readonly free: number[] = [];
  private liveSet = new Bitset(0);
  private order: Int32Array | null = null;

  /** How many slots exist (live or free): the size of every per-slot array. */
  get capacity(): number {
    return this.ids.length;
  }

  get count(): number {
    return this.byId.size;
  }

  /** Records a document (new or replacing one with the same id); returns its slot. */
  put(id: string, doc: Doc): number {
    let slot = this.byId.get(id);
    if (slot === undefined) {
      slot = this.free.pop() ?? this.ids.length;
      this.byId.set(id, slot);
      this.ids[slot] = id;
      this.ordinals[slot] = this.nextOrdinal++;
      this.order = null;
    }
    this.docs[slot] = doc;
    return slot;
  }

  /** Forgets a document; returns the slot it had, or -1. */
  remove(id: string): number {
    const slot = this.byId.get(id);
    if (slot === undefined) return -1;
    this.byId.delete(id);
    this.ids[slot] = undefined;
    this.docs[slot] = undefined;
    this.free.push(slot);
    this.order = null;
    return slot;
  }

  slot(id: string): number | undefined {
    return this.byId.get(id);
  }

  doc(slot: number): Doc | undefined {
    return this.docs[slot];
  }

  id(slot: number): string | undefined {
    return this.ids[slot];
  }

  /** Insertion rank; a replaced document keeps its rank, a deleted and re-added one gets a new one. */
  ordinal(slot: number): number {
    return this.ordinals[slot]!;
  }

  /**
   * Live slots in insertion order (the placeholder-search order), only those `allowed` holds
   * when given. The full list is kept until the next add or delete: callers must not change it.
   */
  ordered(allowed: Bitset | null = null): Int32Array {
    if (!this.order) {
      this.order = Int32Array.from(this.byId.values());
      this.liveSet = new Bitset(this.capacity);
      for (const slot of this.order) this.liveSet.add(slot);
    }
    if (!allowed) return this.order;
    const out = new Int32Array(this.order.length);
    let n = 0;
    for (const slot of this.order) if (allowed.has(slot)) out[n++] = slot;
    return out.subarray(0, n);
  }

  /** Every live slot; callers get their own copy to combine. */
  live(): Bitset {
    this.ordered();
    return this.liveSet.resized(this.capacity);
  }
}
