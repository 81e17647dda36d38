// The per-index companion of the document map for filters and facets: slot
// numbers (slots.ts), one column per attribute a query has used (columns.ts)
// and each document's field paths (what `facets: ["*"]` lists). Writes only
// note the changed slots; the next query brings the columns up to date, or
// drops them after many replacements or deletions (whose old values would
// linger in them) so they are rebuilt in one pass. `warm()` does that work
// when the server is idle, so the first search after a load does not pay for it.

import { Column } from "./columns.js";
import type { Doc } from "./fields.js";
import { Shapes } from "./shapes.js";
import { Slots } from "./slots.js";

/** Above this share of replaced or deleted documents, columns are rebuilt rather than patched. */
const REBUILD_RATIO = 0.3;
/** Distinct field-path lists kept; beyond that (documents of many shapes) the cache starts over. */
const MAX_SHAPES = 10_000;
/** Documents whose field paths one background step reads. */
const SHAPE_CHUNK = 10_000;

export class DocColumns {
  readonly slots = new Slots();
  private readonly columns = new Map<string, Column>();
  private readonly pending = new Set<number>();
  /** Pending changes that replaced or deleted a document (new documents leave nothing stale). */
  private stale = 0;
  /** Slot → its document's field-path list in `shapes` (-1: not read yet). */
  private shapeOf = new Int32Array(0);
  private shapes = new Shapes();
  /** Attributes that had a column: `warm()` rebuilds them. */
  private readonly used = new Set<string>();
  private closed = false;

  put(id: string, doc: Doc): void {
    const replacing = this.slots.slot(id) !== undefined;
    const slot = this.slots.put(id, doc);
    if (this.columns.size) {
      this.pending.add(slot);
      if (replacing) this.stale++;
    }
    if (slot < this.shapeOf.length) this.shapeOf[slot] = -1;
  }

  remove(id: string): void {
    const slot = this.slots.remove(id);
    if (slot < 0) return;
    if (this.columns.size) {
      this.pending.add(slot);
      this.stale++;
    }
    this.shapeOf[slot] = -1;
  }

  /** The column of one attribute path, current with every write so far. */
  column(path: string): Column {
    this.sync();
    let column = this.columns.get(path);
    if (!column) {
      column = new Column(path);
      for (const slot of this.slots.ordered()) column.set(slot, this.slots.doc(slot));
      this.columns.set(path, column);
      this.used.add(path);
    }
    return column;
  }

  /**
   * Reads missing field paths, then builds the columns of every attribute used so far or
   * `filterable` among those paths, in the background: a piece per tick.
   */
  async warm(filterable: (path: string) => boolean): Promise<void> {
    const tick = () => new Promise((r) => setImmediate(r));
    for (let from = 0; ; from += SHAPE_CHUNK) {
      if (this.closed) return;
      const order = this.slots.ordered();
      if (from >= order.length) break;
      this.fieldPaths(order.subarray(from, from + SHAPE_CHUNK));
      await tick();
    }
    const paths = new Set(this.used);
    for (const path of this.fieldPaths(this.slots.ordered())) if (filterable(path)) paths.add(path);
    for (const path of paths) {
      if (this.closed) return;
      this.column(path);
      await tick();
    }
  }

  /** Stops a background warm-up (used on shutdown). */
  cancel(): void {
    this.closed = true;
  }

  private sync(): void {
    if (this.pending.size === 0) return;
    if (this.stale > this.slots.count * REBUILD_RATIO) this.columns.clear();
    else for (const column of this.columns.values()) for (const slot of this.pending) column.set(slot, this.slots.doc(slot));
    this.pending.clear();
    this.stale = 0;
  }

  /** Field paths of the given slots' documents, in first-seen order (as fieldPaths over each would give). */
  fieldPaths(slots: ArrayLike<number>): Set<string> {
    if (this.shapeOf.length < this.slots.capacity) {
      const grown = new Int32Array(Math.max(this.slots.capacity, this.shapeOf.length * 2)).fill(-1);
      grown.set(this.shapeOf);
      this.shapeOf = grown;
    }
    if (this.shapes.lists.length > MAX_SHAPES) {
      this.shapeOf.fill(-1);
      this.shapes = new Shapes();
    }
    const out = new Set<string>();
    const seen = new Set<number>();
    for (let i = 0; i < slots.length; i++) {
      const slot = slots[i]!;
      let shape = this.shapeOf[slot]!;
      if (shape < 0) shape = this.shapeOf[slot] = this.shapes.of(this.slots.doc(slot)!);
      if (seen.has(shape)) continue;
      seen.add(shape);
      for (const p of this.shapes.lists[shape]!) out.add(p);
    }
    return out;
  }
}
