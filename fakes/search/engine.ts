// The index engine, without HTTP: indexes with their documents (insertion
// ordered), settings, filters and search over a lazily synced minisearch index
// (see fulltext.ts).

import type MiniSearch from "minisearch";
import { DocColumns } from "./doc-columns.js";
import { bad, indexAlreadyExists, indexNotFound, invalidIndexUid } from "./errors.js";
import { patternMatches, pickFields, type Doc } from "./fields.js";
import { FullTextIndex } from "./fulltext.js";
import { filterAttributes, FilterSyntaxError, parseFilter, spanSuffix, type FilterNode } from "./filter.js";
import { filterSlots } from "./filter-index.js";
import { documentId, inferPrimaryKey } from "./payload.js";
import { runSearch, type SearchParams, type SearchResult } from "./search.js";
import { applySettings, defaultSettings, filterablePatterns, type IndexSettings, type SettingsPatch } from "./settings.js";

const UID_RE = /^[a-zA-Z0-9_-]{1,400}$/;

export function assertIndexUid(uid: unknown): asserts uid is string {
  if (typeof uid !== "string" || !UID_RE.test(uid)) throw invalidIndexUid(uid);
}

export interface IndexMeta {
  uid: string;
  primaryKey: string | null;
  createdAt: string;
  updatedAt: string;
}

export interface BrowseQuery {
  offset?: number;
  limit?: number;
  fields?: string[];
  filter?: string | unknown[];
  ids?: string[];
}

export interface IndexSnapshot extends IndexMeta {
  settings: Partial<IndexSettings>;
  documents: Doc[];
}

export type JournalOp =
  | { t: "meta"; meta: IndexMeta; settings: Partial<IndexSettings> }
  | { t: "put"; doc: Doc }
  | { t: "del"; id: string };

export class SearchIndex {
  primaryKey: string | null;
  createdAt: string;
  updatedAt: string;
  settings: IndexSettings = defaultSettings();
  readonly docs = new Map<string, Doc>();
  /** Slots, columns and field paths of the same documents, for filters and facets. */
  readonly columns = new DocColumns();
  /** Top-level fields in first-seen order: the searchable fields when searchableAttributes is ["*"]. */
  private readonly topFields: string[] = [];
  private readonly topFieldSet = new Set<string>();
  readonly text = new FullTextIndex({
    docs: this.docs,
    primaryKey: () => this.primaryKey ?? "id",
    fields: () => this.searchFields(),
    ordinal: (id) => this.ordinal(id),
  });
  private statsCache: { fieldDistribution: Record<string, number>; bytes: number } | null = null;

  constructor(
    public uid: string,
    primaryKey: string | null = null,
    now = new Date().toISOString(),
  ) {
    this.primaryKey = primaryKey;
    this.createdAt = now;
    this.updatedAt = now;
  }

  /** Ids changed since the last save (written to the index's journal), or everything. */
  readonly unsaved = new Set<string>();
  unsavedAll = true;

  /** Rebuilds a persisted index, keeping document order (the placeholder-search order). */
  static restore(data: IndexSnapshot): SearchIndex {
    const index = new SearchIndex(data.uid, data.primaryKey, data.createdAt);
    index.updatedAt = data.updatedAt;
    index.settings = { ...defaultSettings(), ...data.settings };
    for (const doc of data.documents) index.replay({ t: "put", doc });
    index.markSaved();
    return index;
  }

  /** Applies one journal entry while loading from disk. */
  replay(op: JournalOp): void {
    if (op.t === "meta") {
      Object.assign(this, { primaryKey: op.meta.primaryKey, createdAt: op.meta.createdAt, updatedAt: op.meta.updatedAt });
      this.settings = { ...defaultSettings(), ...op.settings };
    } else if (op.t === "put") this.put(String(op.doc[this.primaryKey ?? "id"]), op.doc);
    else if (this.docs.delete(op.id)) this.text.changed(op.id), this.columns.remove(op.id);
  }

  markSaved(): void {
    this.unsaved.clear();
    this.unsavedAll = false;
  }

  meta(): IndexMeta {
    return { uid: this.uid, primaryKey: this.primaryKey, createdAt: this.createdAt, updatedAt: this.updatedAt };
  }

  private touch(): void {
    this.updatedAt = new Date().toISOString();
    this.statsCache = null;
  }

  /** Insertion rank of a document, Meilisearch's final tie-break. */
  ordinal(id: string): number {
    const slot = this.columns.slots.slot(id);
    return slot === undefined ? Number.MAX_SAFE_INTEGER : this.columns.slots.ordinal(slot);
  }

  private put(id: string, doc: Doc): void {
    for (const key of Object.keys(doc)) {
      if (!this.topFieldSet.has(key)) this.topFieldSet.add(key), this.topFields.push(key);
    }
    this.docs.set(id, doc);
    this.columns.put(id, doc);
    this.text.changed(id);
    this.unsaved.add(id);
  }

  /** Add-or-replace (`replace`) or add-or-update (merge top-level fields). All-or-nothing. */
  addDocuments(docs: Doc[], opts: { replace: boolean; primaryKey?: string | null; skipCreation?: boolean }): number {
    if (this.primaryKey && opts.primaryKey && opts.primaryKey !== this.primaryKey)
      throw bad("index_primary_key_already_exists", `Index \`${this.uid}\`: Index already has a primary key: \`${this.primaryKey}\`.`);
    if (docs.length === 0) return 0;
    const pk = this.primaryKey ?? opts.primaryKey ?? inferPrimaryKey(docs[0]);
    const ids = docs.map((d) => documentId(d, pk));
    this.primaryKey = pk;
    let indexed = 0;
    docs.forEach((doc, i) => {
      const id = ids[i]!;
      const existing = this.docs.get(id);
      if (!existing && opts.skipCreation) return;
      this.put(id, opts.replace || !existing ? doc : { ...existing, ...doc });
      indexed++;
    });
    this.touch();
    return indexed;
  }

  deleteIds(ids: string[]): number {
    let n = 0;
    for (const id of ids) {
      if (this.docs.delete(id)) n++, this.text.changed(id), this.columns.remove(id), this.unsaved.add(id);
    }
    if (n) this.touch();
    return n;
  }

  deleteWhere(filter: FilterNode): number {
    const { slots } = this.columns;
    const matched = filterSlots(filter, this.columns);
    const ids: string[] = [];
    for (const slot of slots.ordered()) if (matched.has(slot)) ids.push(slots.id(slot)!);
    return this.deleteIds(ids);
  }

  clear(): number {
    const n = this.docs.size;
    this.deleteIds([...this.docs.keys()]);
    this.unsavedAll = true;
    return n;
  }

  updateSettings(patch: SettingsPatch): void {
    this.settings = applySettings(this.settings, patch);
    this.touch();
  }

  /** Parses a filter and checks its attributes are filterable; errors use `code`. */
  compileFilter(filter: unknown, code: string): FilterNode {
    if (filter === undefined || filter === null) return { type: "all" };
    let node: FilterNode;
    try {
      node = parseFilter(filter as string | unknown[]);
    } catch (err) {
      if (err instanceof FilterSyntaxError) throw bad(code, err.message);
      throw err;
    }
    const patterns = filterablePatterns(this.settings);
    for (const attr of filterAttributes(node)) {
      if (patterns.some((p) => patternMatches(p, attr.name))) continue;
      const available = patterns.length
        ? `Available filterable attribute patterns are: ${patterns.map((p) => `\`${p}\``).join(", ")}.`
        : "This index does not have configured filterable attributes.";
      throw bad(code, `Index \`${this.uid}\`: Attribute \`${attr.name}\` is not filterable. ${available}\n${spanSuffix(attr)}`);
    }
    return node;
  }

  /** Fields given to minisearch, in searchableAttributes order (their boosts follow it). */
  searchFields(): string[] {
    const s = this.settings.searchableAttributes;
    return s.includes("*") ? [...this.topFields] : s;
  }

  /** The full-text index, brought up to date with pending writes. */
  fullText(): MiniSearch<Doc> {
    return this.text.sync();
  }

  /** Background catch-up after writes: the full-text index, then the filter and facet columns. */
  async warm(): Promise<void> {
    await this.text.warm();
    await this.columns.warm((path) => filterablePatterns(this.settings).some((p) => patternMatches(p, path)));
  }

  search(params: SearchParams): SearchResult {
    return runSearch(this, params);
  }

  /** Documents as GET /documents returns them (displayedAttributes applied). */
  display(doc: Doc, fields?: string[]): Doc {
    let out = pickFields(doc, this.settings.displayedAttributes);
    if (fields && fields.length) out = pickFields(out, fields);
    return out;
  }

  browse(q: BrowseQuery): { results: Doc[]; offset: number; limit: number; total: number } {
    const offset = q.offset ?? 0;
    const limit = q.limit ?? 20;
    const filter = this.compileFilter(q.filter, "invalid_document_filter");
    const allowed = filter.type === "all" ? null : filterSlots(filter, this.columns);
    let docs: Iterable<[string, Doc]> = this.docs;
    if (q.ids) docs = q.ids.flatMap((id) => (this.docs.has(String(id)) ? [[String(id), this.docs.get(String(id))!] as [string, Doc]] : []));
    const matched: Doc[] = [];
    for (const [id, doc] of docs) if (!allowed || allowed.has(this.columns.slots.slot(id)!)) matched.push(doc);
    return {
      results: matched.slice(offset, offset + limit).map((d) => this.display(d, q.fields)),
      offset,
      limit,
      total: matched.length,
    };
  }

  stats(isIndexing: boolean) {
    if (!this.statsCache) {
      const fieldDistribution: Record<string, number> = {};
      let bytes = 0;
      for (const doc of this.docs.values()) {
        bytes += JSON.stringify(doc).length;
        for (const key of Object.keys(doc)) fieldDistribution[key] = (fieldDistribution[key] ?? 0) + 1;
      }
      this.statsCache = { fieldDistribution, bytes };
    }
    const n = this.docs.size;
    return {
      numberOfDocuments: n,
      rawDocumentDbSize: this.statsCache.bytes,
      avgDocumentSize: n ? Math.round(this.statsCache.bytes / n) : 0,
      isIndexing,
      numberOfEmbeddings: 0,
      numberOfEmbeddedDocuments: 0,
      fieldDistribution: this.statsCache.fieldDistribution,
    };
  }
}

export class Engine {
  readonly indexes = new Map<string, SearchIndex>();

  find(uid: string): SearchIndex | undefined {
    return this.indexes.get(uid);
  }

  get(uid: string): SearchIndex {
    const index = this.indexes.get(uid);
    if (!index) throw indexNotFound(uid);
    return index;
  }

  create(uid: string, primaryKey: string | null = null): SearchIndex {
    if (this.indexes.has(uid)) throw indexAlreadyExists(uid);
    const index = new SearchIndex(uid, primaryKey);
    this.indexes.set(uid, index);
    return index;
  }

  getOrCreate(uid: string): SearchIndex {
    return this.indexes.get(uid) ?? this.create(uid);
  }

  delete(uid: string): number {
    const index = this.get(uid);
    this.indexes.delete(uid);
    return index.docs.size;
  }

  /** Indexes sorted by uid, as GET /indexes lists them. */
  list(): SearchIndex[] {
    return [...this.indexes.values()].sort((a, b) => (a.uid < b.uid ? -1 : a.uid > b.uid ? 1 : 0));
  }
}
