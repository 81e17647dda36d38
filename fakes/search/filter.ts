// Meilisearch's filter language: a recursive-descent parser that follows the
// grammar of meilisearch's filter-parser crate (same precedence, same reserved
// keywords, errors ending with "start:end filter"), and an evaluator in filter-eval.ts.

export { matchesFilter } from "./filter-eval.js";

export interface FilterValue {
  raw: string;
  /** Lowercased + NFKD, the form Meilisearch stores facet strings in. */
  folded: string;
  /** The value as a number when it parses as one (Meilisearch tries both). */
  num: number | null;
}

export interface AttrSpan {
  name: string;
  start: number;
  end: number;
  source: string;
}

export type CompareOp = "=" | "!=" | ">" | ">=" | "<" | "<=";

export type FilterNode =
  | { type: "all" }
  | { type: "and" | "or"; children: FilterNode[] }
  | { type: "not"; child: FilterNode }
  | { type: "compare"; attr: AttrSpan; op: CompareOp; value: FilterValue }
  | { type: "range"; attr: AttrSpan; from: FilterValue; to: FilterValue }
  | { type: "in"; attr: AttrSpan; values: FilterValue[] }
  | { type: "exists" | "null" | "empty"; attr: AttrSpan }
  | { type: "geoRadius"; attr: AttrSpan; lat: number; lng: number; radius: number }
  | { type: "geoBoundingBox"; attr: AttrSpan; top: [number, number]; bottom: [number, number] };

export class FilterSyntaxError extends Error {
  constructor(message: string) {
    super(message);
    this.name = "FilterSyntaxError";
  }
}

const KEYWORDS = new Set(["AND", "OR", "IN", "NOT", "TO", "EXISTS", "IS", "NULL", "EMPTY", "CONTAINS", "STARTS", "WITH", "_geoRadius", "_geoBoundingBox"]);
const WORD_CHAR = /[\p{L}\p{N}_.-]/u;
const NUMBER_RE = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

export function parseNumber(s: string): number | null {
  const t = s.trim();
  if (!NUMBER_RE.test(t)) return null;
  const n = Number(t);
  return Number.isFinite(n) ? n : null;
}

const ASCII_RE = /^[\x00-\x7f]*$/;

/** Lowercased + NFKD; ASCII is its own NFKD form, so most values skip the normalisation. */
export const foldFacet = (s: string): string => (ASCII_RE.test(s) ? s.trim().toLowerCase() : s.trim().normalize("NFKD").toLowerCase());

export function makeValue(raw: string): FilterValue {
  return { raw, folded: foldFacet(raw), num: parseNumber(raw) };
}

/** Parses a filter string, or the array form (outer = AND, inner arrays = OR). */
export function parseFilter(input: string | unknown[]): FilterNode {
  if (typeof input === "string") return new Parser(input).parse();
  if (!Array.isArray(input)) throw new FilterSyntaxError(`Invalid syntax for the filter parameter: \`expected String, Array, found: ${JSON.stringify(input)}\`.`);
  const and: FilterNode[] = [];
  for (const item of input) {
    if (typeof item === "string") and.push(new Parser(item).parse());
    else if (Array.isArray(item)) {
      const or = item.map((inner) => {
        if (typeof inner !== "string") throw new FilterSyntaxError(`Invalid syntax for the filter parameter: \`expected String, found: ${JSON.stringify(inner)}\`.`);
        return new Parser(inner).parse();
      });
      and.push(simplify({ type: "or", children: or }));
    } else throw new FilterSyntaxError(`Invalid syntax for the filter parameter: \`expected String, [String], found: ${JSON.stringify(item)}\`.`);
  }
  return simplify({ type: "and", children: and });
}

function simplify(node: FilterNode): FilterNode {
  if (node.type !== "and" && node.type !== "or") return node;
  const children = node.children.filter((c) => c.type !== "all");
  if (children.length === 0) return { type: "all" };
  return children.length === 1 ? children[0]! : { type: node.type, children };
}

/** Attributes a filter reads, with their position for error messages. */
export function filterAttributes(node: FilterNode): AttrSpan[] {
  switch (node.type) {
    case "all":
      return [];
    case "and":
    case "or":
      return node.children.flatMap(filterAttributes);
    case "not":
      return filterAttributes(node.child);
    default:
      return [node.attr];
  }
}

/** The "1:6 city = x" suffix Meilisearch appends to filter errors. */
export const spanSuffix = (s: { start: number; end: number; source: string }): string => `${s.start + 1}:${s.end + 1} ${s.source}`;

class Parser {
  private pos = 0;
  constructor(private readonly src: string) {}

  parse(): FilterNode {
    if (this.src.trim() === "") return { type: "all" };
    const node = this.or();
    this.ws();
    if (this.pos < this.src.length) this.fail(`Found unexpected characters at the end of the filter: \`${this.rest()}\`. You probably forgot an \`OR\` or an \`AND\` rule.`, this.pos);
    return node;
  }

  private fail(message: string, start: number, end = this.src.length): never {
    throw new FilterSyntaxError(`${message}\n${spanSuffix({ start, end, source: this.src })}`);
  }

  private rest(from = this.pos): string {
    return this.src.slice(from);
  }

  private ws(): void {
    while (this.pos < this.src.length && /\s/.test(this.src[this.pos]!)) this.pos++;
  }

  /** The bare word at the cursor (without consuming it). */
  private peekWord(): string {
    this.ws();
    let end = this.pos;
    while (end < this.src.length && WORD_CHAR.test(this.src[end]!)) end++;
    return this.src.slice(this.pos, end);
  }

  private keyword(word: string): boolean {
    if (this.peekWord() !== word) return false;
    this.pos += word.length;
    return true;
  }

  private or(): FilterNode {
    const children = [this.and()];
    while (this.keyword("OR")) children.push(this.and());
    return children.length === 1 ? children[0]! : { type: "or", children };
  }

  private and(): FilterNode {
    const children = [this.not()];
    while (this.keyword("AND")) children.push(this.not());
    return children.length === 1 ? children[0]! : { type: "and", children };
  }

  private not(): FilterNode {
    if (this.keyword("NOT")) {
      const inner = this.not();
      return inner.type === "not" ? inner.child : { type: "not", child: inner };
    }
    return this.primary();
  }

  private primary(): FilterNode {
    this.ws();
    const start = this.pos;
    if (this.src[this.pos] === "(") {
      this.pos++;
      const inner = this.or();
      this.ws();
      if (this.src[this.pos] !== ")") this.fail(`Expression \`${this.rest(start)}\` is missing the following closing delimiter: \`)\`.`, start);
      this.pos++;
      return inner;
    }
    const word = this.peekWord();
    if (word === "_geoRadius" || word === "_geoBoundingBox") return this.geo(word, start);
    if (start >= this.src.length) this.fail("Was expecting an operation `=`, `!=`, `>=`, `>`, `<=`, `<`, `IN`, `NOT IN`, `TO`, `EXISTS`, `NOT EXISTS`, `IS NULL`, `IS NOT NULL`, `IS EMPTY`, `IS NOT EMPTY`, `_geoRadius`, or `_geoBoundingBox` but instead got nothing.", start);
    const attrStart = this.pos;
    const name = this.value("attribute");
    const attr: AttrSpan = { name: name.raw, start: attrStart, end: this.pos, source: this.src };
    return this.condition(attr, start);
  }

  private condition(attr: AttrSpan, start: number): FilterNode {
    this.ws();
    const op = /^(!=|>=|<=|=|>|<)/.exec(this.rest())?.[0] as CompareOp | undefined;
    if (op) {
      this.pos += op.length;
      return { type: "compare", attr, op, value: this.value("value") };
    }
    const save = this.pos;
    if (this.keyword("IN")) return { type: "in", attr, values: this.list() };
    if (this.keyword("EXISTS")) return { type: "exists", attr };
    if (this.keyword("NOT")) {
      if (this.keyword("IN")) return { type: "not", child: { type: "in", attr, values: this.list() } };
      if (this.keyword("EXISTS")) return { type: "not", child: { type: "exists", attr } };
      this.pos = save;
    }
    if (this.keyword("IS")) {
      const negated = this.keyword("NOT");
      const kind = this.keyword("NULL") ? "null" : this.keyword("EMPTY") ? "empty" : undefined;
      if (kind) {
        const node: FilterNode = { type: kind, attr };
        return negated ? { type: "not", child: node } : node;
      }
      this.pos = save;
    }
    // `attr low TO high`
    const word = this.peekWord();
    if (this.pos < this.src.length && !KEYWORDS.has(word) && /[^()=<>!\s]/.test(this.src[this.pos]!)) {
      const from = this.value("value");
      if (this.keyword("TO")) return { type: "range", attr, from, to: this.value("value") };
    }
    this.pos = save;
    this.fail(`Was expecting an operation \`=\`, \`!=\`, \`>=\`, \`>\`, \`<=\`, \`<\`, \`IN\`, \`NOT IN\`, \`TO\`, \`EXISTS\`, \`NOT EXISTS\`, \`IS NULL\`, \`IS NOT NULL\`, \`IS EMPTY\`, \`IS NOT EMPTY\`, \`_geoRadius\`, or \`_geoBoundingBox\` at \`${this.rest(start).trim()}\`.`, start);
  }

  /** value = word | 'single quoted' | "double quoted" (with backslash escapes). */
  private value(what: "attribute" | "value"): FilterValue {
    this.ws();
    const start = this.pos;
    const quote = this.src[this.pos];
    if (quote === "'" || quote === '"') return makeValue(this.quoted(quote, start));
    const word = this.peekWord();
    if (!word) {
      let end = start;
      while (end < this.src.length && !/[\s()=<>!]/.test(this.src[end]!)) end++;
      const got = this.src.slice(start, end);
      if (what === "attribute" && got === "") this.fail(`Was expecting an operation \`=\`, \`!=\`, \`>=\`, \`>\`, \`<=\`, \`<\`, \`IN\`, \`NOT IN\`, \`TO\`, \`EXISTS\`, \`NOT EXISTS\`, \`IS NULL\`, \`IS NOT NULL\`, \`IS EMPTY\`, \`IS NOT EMPTY\`, \`_geoRadius\`, or \`_geoBoundingBox\` at \`${this.rest(start)}\`.`, start);
      this.fail(got.trim() ? `Was expecting a value but instead got \`${got}\`.` : "Was expecting a value but instead got nothing.", start, end);
    }
    if (KEYWORDS.has(word)) this.fail(`Was expecting a value but instead got \`${word}\`, which is a reserved keyword. To use \`${word}\` as a field name or a value, surround it by quotes.`, start, start + word.length);
    this.pos += word.length;
    return makeValue(word);
  }

  private quoted(quote: string, start: number): string {
    let out = "";
    let i = start + 1;
    while (i < this.src.length) {
      const c = this.src[i]!;
      if (c === quote) {
        this.pos = i + 1;
        return out;
      }
      if (c === "\\" && i + 1 < this.src.length) {
        const n = this.src[i + 1]!;
        out += n === "n" ? "\n" : n === "t" ? "\t" : n === "r" ? "\r" : n === "0" ? "\0" : n;
        i += 2;
        continue;
      }
      out += c;
      i++;
    }
    this.fail(`Expression \`${this.src.slice(start)}\` is missing the following closing delimiter: \`${quote}\`.`, start);
  }

  private list(): FilterValue[] {
    this.ws();
    if (this.src[this.pos] !== "[") this.fail("Expected `[` after `IN` keyword.", this.pos);
    this.pos++;
    const values: FilterValue[] = [];
    for (;;) {
      this.ws();
      if (this.src[this.pos] === "]") break;
      if (this.pos >= this.src.length) this.fail("Expected matching `]` after the list of field names given to `IN[`", this.pos);
      const word = this.peekWord();
      if (KEYWORDS.has(word)) this.fail(`Expected only comma-separated field names inside \`IN[..]\` but instead found \`${word}\`, which is a keyword. To use \`${word}\` as a field name or a value, surround it by quotes.`, this.pos, this.pos + word.length);
      values.push(this.value("value"));
      this.ws();
      if (this.src[this.pos] === ",") this.pos++;
      else if (this.src[this.pos] !== "]") {
        if (this.pos >= this.src.length) this.fail("Expected matching `]` after the list of field names given to `IN[`", this.pos);
        this.fail(`Expected only comma-separated field names inside \`IN[..]\` but instead found \`${this.rest()}\`.`, this.pos);
      }
    }
    this.pos++;
    return values;
  }

  private geo(kind: "_geoRadius" | "_geoBoundingBox", start: number): FilterNode {
    this.pos += kind.length;
    const radius = kind === "_geoRadius";
    const re = radius
      ? /^\(\s*([^,\s()]+)\s*,\s*([^,\s()]+)\s*,\s*([^,\s()]+)\s*\)/
      : /^\(\s*\[\s*([^,\s\]]+)\s*,\s*([^,\s\]]+)\s*\]\s*,\s*\[\s*([^,\s\]]+)\s*,\s*([^,\s\]]+)\s*\]\s*\)/;
    const m = re.exec(this.rest());
    const nums = m?.slice(1).map((s) => parseNumber(s));
    if (!m || !nums || nums.some((n) => n === null)) {
      this.fail(
        radius
          ? "The `_geoRadius` filter expects three arguments: `_geoRadius(latitude, longitude, radius)`."
          : "The `_geoBoundingBox` filter expects two pairs of arguments: `_geoBoundingBox([latitude, longitude], [latitude, longitude])`.",
        start,
      );
    }
    this.pos += m[0].length;
    const n = nums as number[];
    const attr: AttrSpan = { name: "_geo", start, end: this.pos, source: this.src };
    return radius
      ? { type: "geoRadius", attr, lat: n[0]!, lng: n[1]!, radius: n[2]! }
      : { type: "geoBoundingBox", attr, top: [n[0]!, n[1]!], bottom: [n[2]!, n[3]!] };
  }
}
