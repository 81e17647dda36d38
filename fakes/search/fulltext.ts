// The minisearch side of an index, kept in sync lazily: writes only record
// changed ids; the next search applies them incrementally (discard + add), or
// rebuilds when many indexed documents were replaced or deleted. `warm()` does
// either in chunks off the hot path so a bulk load of 100k documents does not
// freeze the server on the first search.

import MiniSearch from "minisearch";
import { rawValuesAt, textOf, type Doc } from "./fields.js";
import { tokenize } from "./text.js";

const ID_FIELD = "\u0000id";
const CHUNK = 2000;
/** Above this share of replaced or deleted documents a rebuild is cheaper than discard + add. */
const REBUILD_RATIO = 0.3;

export interface FullTextSource {
  docs: Map<string, Doc>;
  primaryKey(): string;
  /** Searchable fields in order; minisearch needs them fixed, so a change means a rebuild. */
  fields(): string[];
  /** Insertion rank of a document: the order a rebuild adds documents in. */
  ordinal(id: string): number;
}

export class FullTextIndex {
  private ms: MiniSearch<Doc> | null = null;
  private msFields: string[] = [];
  private pending = new Set<string>();
  /** Ids changed while a background build runs (the build works on a snapshot). */
  private buildChanges: Set<string> | null = null;
  private building: Promise<void> | null = null;
  private generation = 0;
  private closed = false;
  /**
   * True while the index holds exactly what a rebuild would: no document ever discarded, every
   * document added in insertion order; `lastOrdinal` is the rank of the last one added.
   */
  private appendOnly = false;
  private lastOrdinal = -1;
  /** Every indexed word (never shrinks until a rebuild), for prefix-with-typo expansion. */
  vocabulary = new Set<string>();
  private memoSize = -1;
  private readonly memoCache = new Map<string, string[]>();

  constructor(private readonly source: FullTextSource) {}

  changed(id: string): void {
    this.pending.add(id);
    this.buildChanges?.add(id);
  }

  private needsRebuild(fields: string[]): boolean {
    const same = fields.length === this.msFields.length && fields.every((f, i) => f === this.msFields[i]);
    return !this.ms || !same || (this.pending.size > this.source.docs.size * REBUILD_RATIO && !this.onlyAppends());
  }

  /**
   * Whether adding the pending documents one by one ends exactly where a rebuild would (same
   * minisearch state, same vocabulary order): they are all new, come after everything indexed,
   * in insertion order, onto an index nothing was ever discarded from. A bulk load in batches
   * is then indexed once instead of rebuilt after each of its first batches.
   */
  private onlyAppends(): boolean {
    if (!this.appendOnly) return false;
    let last = this.lastOrdinal;
    for (const id of this.pending) {
      if (this.ms!.has(id)) return false;
      if (!this.source.docs.has(id)) continue;
      const ordinal = this.source.ordinal(id);
      if (ordinal <= last) return false;
      last = ordinal;
    }
    return true;
  }

  /** Records a fresh index over `docs` (in insertion order). */
  private rebuilt(ms: MiniSearch<Doc>, vocabulary: Set<string>, fields: string[], docs: Doc[]): void {
    this.ms = ms;
    this.vocabulary = vocabulary;
    this.msFields = fields;
    this.appendOnly = true;
    const last = docs[docs.length - 1];
    this.lastOrdinal = last ? this.source.ordinal(String(last[this.source.primaryKey()])) : -1;
  }

  /** Caches a vocabulary-derived result until the vocabulary changes. */
  memo(key: string, compute: () => string[]): string[] {
    if (this.memoSize !== this.vocabulary.size) this.memoCache.clear(), (this.memoSize = this.vocabulary.size);
    let v = this.memoCache.get(key);
    if (!v) this.memoCache.set(key, (v = compute()));
    return v;
  }

  private create(fields: string[], vocabulary: Set<string>): MiniSearch<Doc> {
    const { source } = this;
    return new MiniSearch<Doc>({
      fields: fields.length ? fields : ["\u0000none"],
      idField: ID_FIELD,
      extractField(doc, field) {
        if (field === ID_FIELD) return String(doc[source.primaryKey()]);
        const v = doc[field];
        // Fast path for plain top-level fields, the common case.
        if (typeof v === "string") return v;
        if (typeof v === "number") return String(v);
        return rawValuesAt(doc, field).map(textOf).join(" \n ");
      },
      // Called with a field name while indexing (record the words), without one for queries.
      tokenize(text, fieldName) {
        const terms = tokenize(text);
        if (fieldName !== undefined) for (const t of terms) vocabulary.add(t);
        return terms;
      },
      processTerm: (term) => term || null,
    });
  }

  /** The index, brought up to date synchronously. */
  sync(): MiniSearch<Doc> {
    if (this.building) {
      // Supersede the background build: its snapshot is older than what we build now.
      this.generation++;
      this.buildChanges = null;
    }
    const fields = this.source.fields();
    if (this.needsRebuild(fields)) {
      const vocabulary = new Set<string>();
      const ms = this.create(fields, vocabulary);
      const docs = [...this.source.docs.values()];
      ms.addAll(docs);
      this.rebuilt(ms, vocabulary, fields, docs);
      this.pending.clear();
    } else this.applyPending(Infinity);
    return this.ms!;
  }

  /** Applies up to `max` pending changes to the live index (discard + add). */
  private applyPending(max: number): void {
    const ms = this.ms!;
    let n = 0;
    for (const id of this.pending) {
      if (n++ >= max) return;
      this.pending.delete(id);
      if (ms.has(id)) ms.discard(id), (this.appendOnly = false);
      const doc = this.source.docs.get(id);
      if (!doc) continue;
      ms.add(doc);
      const ordinal = this.source.ordinal(id);
      if (ordinal <= this.lastOrdinal) this.appendOnly = false;
      else this.lastOrdinal = ordinal;
    }
  }

  /** Catches up in the background; resolves when the index is current. */
  async warm(): Promise<void> {
    for (;;) {
      if (this.closed) return;
      if (this.building) {
        await this.building;
        continue;
      }
      const fields = this.source.fields();
      if (this.needsRebuild(fields)) {
        this.building = this.build(fields).finally(() => (this.building = null));
        continue;
      }
      if (this.pending.size === 0) return;
      // In chunks, like a rebuild, so a large batch of new documents does not stall the server.
      this.applyPending(CHUNK);
      await new Promise((r) => setImmediate(r));
    }
  }

  private async build(fields: string[]): Promise<void> {
    const gen = ++this.generation;
    const snapshot = [...this.source.docs.values()];
    this.buildChanges = new Set();
    const vocabulary = new Set<string>();
    const ms = this.create(fields, vocabulary);
    for (let i = 0; i < snapshot.length; i += CHUNK) {
      ms.addAll(snapshot.slice(i, i + CHUNK));
      await new Promise((r) => setImmediate(r));
      if (gen !== this.generation) return;
    }
    this.rebuilt(ms, vocabulary, fields, snapshot);
    this.pending = this.buildChanges;
    this.buildChanges = null;
  }

  /** Stops a background build (used on shutdown). */
  cancel(): void {
    this.closed = true;
    this.generation++;
    this.buildChanges = null;
  }
}
