// Field-path lists of documents (what `facets: ["*"]` chooses from), interned:
// documents built by the same code share a list, so a search over 100k hits
// merges a handful of lists instead of walking every hit. A document's list is
// the order fieldPaths (fields.ts) gives; reading it walks the document once,
// through trees of interned paths, without building path strings or sets.

import { isPlainObject, type Doc } from "./fields.js";

/** One dotted path; `stamp` says which walk last met it (each path counts once per document). */
interface PathNode {
  path: string;
  /** Child key → node, a shortcut around building `${path}.${key}`. */
  children: Map<string, PathNode>;
  stamp: number;
}

/** A step in the tree of path sequences; `id` is set where some document's sequence ended. */
interface ShapeNode {
  parent: ShapeNode | null;
  path: string;
  next: Map<PathNode, ShapeNode>;
  id: number;
}

export class Shapes {
  /** Every path by its string: `{"a.b": 1}` and `{a: {b: 1}}` reach the same node, as in fieldPaths' set. */
  private readonly paths = new Map<string, PathNode>();
  private readonly root: PathNode = { path: "", children: new Map(), stamp: 0 };
  private readonly start: ShapeNode = { parent: null, path: "", next: new Map(), id: -1 };
  private stamp = 0;
  private at: ShapeNode = this.start;
  /** Path lists by id. */
  readonly lists: string[][] = [];

  /** The id of the document's path list. */
  of(doc: Doc): number {
    this.stamp++;
    this.at = this.start;
    this.walk(doc, this.root);
    const end = this.at;
    if (end.id < 0) {
      const list: string[] = [];
      for (let n: ShapeNode | null = end; n && n.parent; n = n.parent) list.push(n.path);
      end.id = this.lists.push(list.reverse()) - 1;
    }
    return end.id;
  }

  private walk(v: unknown, at: PathNode): void {
    if (Array.isArray(v)) {
      for (const item of v) this.walk(item, at);
      return;
    }
    if (!isPlainObject(v)) return;
    for (const key of Object.keys(v)) {
      let child = at.children.get(key);
      if (!child) {
        const path = at.path ? `${at.path}.${key}` : key; // as fieldPaths joins them
        child = this.paths.get(path);
        if (!child) this.paths.set(path, (child = { path, children: new Map(), stamp: 0 }));
        at.children.set(key, child);
      }
      if (child.stamp !== this.stamp) {
        child.stamp = this.stamp;
        let next = this.at.next.get(child);
        if (!next) this.at.next.set(child, (next = { parent: this.at, path: child.path, next: new Map(), id: -1 }));
        this.at = next;
      }
      this.walk(v[key], child);
    }
  }
}
