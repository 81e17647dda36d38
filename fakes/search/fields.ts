// Dotted-path access into documents. Meilisearch flattens nested objects and
// arrays, so `observations.term` reaches every `term` of an array of objects,
// and a literal key "a.b" is the same field as {a: {b}}.

export type Doc = Record<string, unknown>;

export const isPlainObject = (v: unknown): v is Record<string, unknown> =>
  typeof v === "object" && v !== null && !Array.isArray(v);

/** Raw values found at `path` (arrays on the way are traversed, the final value is kept as is). */
export function rawValuesAt(doc: unknown, path: string): unknown[] {
  const out: unknown[] = [];
  collect(doc, path.split("."), 0, out);
  return out;
}

function collect(value: unknown, segs: string[], i: number, out: unknown[]): void {
  if (i === segs.length) {
    out.push(value);
    return;
  }
  if (Array.isArray(value)) {
    for (const item of value) collect(item, segs, i, out);
    return;
  }
  if (!isPlainObject(value)) return;
  let key = "";
  for (let j = i; j < segs.length; j++) {
    key = j === i ? segs[j]! : `${key}.${segs[j]}`;
    if (Object.hasOwn(value, key)) collect(value[key], segs, j + 1, out);
  }
}

/** Scalar leaves at `path`: nested arrays flattened, nulls and objects dropped. */
export function leafValuesAt(doc: unknown, path: string): (string | number | boolean)[] {
  const out: (string | number | boolean)[] = [];
  for (const v of rawValuesAt(doc, path)) pushLeaves(v, out);
  return out;
}

// Module-level walkers rather than closures: these run per document per query.
function pushLeaves(v: unknown, out: (string | number | boolean)[]): void {
  if (Array.isArray(v)) for (const item of v) pushLeaves(item, out);
  else if (typeof v === "string" || typeof v === "number" || typeof v === "boolean") out.push(v);
}

/** Every scalar string/number under a value, for full-text indexing of a field. */
export function textOf(value: unknown): string {
  const parts: string[] = [];
  pushText(value, parts);
  return parts.join(" \n ");
}

function pushText(v: unknown, parts: string[]): void {
  if (typeof v === "string") parts.push(v);
  else if (typeof v === "number" || typeof v === "boolean") parts.push(String(v));
  else if (Array.isArray(v)) for (const item of v) pushText(item, parts);
  else if (isPlainObject(v)) for (const item of Object.values(v)) pushText(item, parts);
}

/** Dotted paths of every field (objects and leaves) of a document, in document order. */
export function fieldPaths(doc: Doc, into: Set<string> = new Set()): Set<string> {
  walkPaths(doc, "", into);
  return into;
}

function walkPaths(v: unknown, prefix: string, into: Set<string>): void {
  if (Array.isArray(v)) for (const item of v) walkPaths(item, prefix, into);
  else if (isPlainObject(v)) {
    for (const k of Object.keys(v)) {
      const p = prefix ? `${prefix}.${k}` : k;
      into.add(p);
      walkPaths(v[k], p, into);
    }
  }
}

/**
 * Whether an attribute pattern covers a field: "*" covers all, "a" covers "a"
 * and "a.b", "a.*" / "*_at" are wildcards (the granular filterableAttributes form).
 */
export function patternMatches(pattern: string, field: string): boolean {
  if (pattern === "*" || pattern === field || field.startsWith(`${pattern}.`)) return true;
  if (!pattern.includes("*")) return false;
  let re = patternCache.get(pattern);
  if (!re) {
    re = new RegExp(
      `^${pattern
        .split("*")
        .map((s) => s.replace(/[.+?^${}()|[\]\\]/g, "\\$&"))
        .join(".*")}$`,
    );
    if (patternCache.size > 1000) patternCache.clear();
    patternCache.set(pattern, re);
  }
  return re.test(field);
}

/** Wildcard patterns compiled once: facets ["*"] tests every field path against them per search. */
const patternCache = new Map<string, RegExp>();

/** Keeps only the listed attributes (dotted paths allowed), as attributesToRetrieve does. */
export function pickFields(doc: Doc, fields: readonly string[]): Doc {
  if (fields.includes("*")) return { ...doc };
  const out: Doc = {};
  for (const [key, value] of Object.entries(doc)) {
    if (fields.includes(key)) {
      out[key] = value;
      continue;
    }
    const nested = fields.filter((f) => f.startsWith(`${key}.`)).map((f) => f.slice(key.length + 1));
    if (nested.length === 0) continue;
    const picked = pickNested(value, nested);
    if (picked !== undefined) out[key] = picked;
  }
  return out;
}

function pickNested(value: unknown, fields: string[]): unknown {
  if (Array.isArray(value)) {
    const items = value.map((v) => pickNested(v, fields)).filter((v) => v !== undefined);
    return items.length ? items : undefined;
  }
  if (!isPlainObject(value)) return undefined;
  const picked = pickFields(value, fields);
  return Object.keys(picked).length ? picked : undefined;
}
