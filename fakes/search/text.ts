// Text normalisation shared by indexing, querying and highlighting, so that
// "Köln", "KOLN" and "koln" all become the same token, as in Meilisearch.

const SPECIAL_FOLDS: Record<string, string> = {
  ß: "ss",
  æ: "ae",
  œ: "oe",
  ø: "o",
  đ: "d",
  ð: "d",
  ł: "l",
  ħ: "h",
  ı: "i",
  þ: "th",
};
const SPECIAL_RE = /[ßæœøđðłħıþ]/g;
const MARKS_RE = /\p{M}/gu;
// A word is a run of letters/digits (marks kept so decomposed accents stay inside).
const WORD_RE = /[\p{L}\p{N}\p{M}]+/gu;

const ASCII_RE = /^[\x00-\x7f]*$/;
const foldCache = new Map<string, string>();

/** Folds case and accents: "Crème Brûlée" → "creme brulee", "Straße" → "strasse". */
export function foldText(text: string): string {
  // Fast path: most words are ASCII, where folding is just lowercasing.
  if (ASCII_RE.test(text)) return text.toLowerCase();
  let folded = foldCache.get(text);
  if (folded === undefined) {
    folded = text
      .normalize("NFKD")
      .replace(MARKS_RE, "")
      .toLowerCase()
      .replace(SPECIAL_RE, (c) => SPECIAL_FOLDS[c] ?? c);
    if (foldCache.size > 100_000) foldCache.clear();
    foldCache.set(text, folded);
  }
  return folded;
}

export interface WordSpan {
  start: number;
  end: number;
  term: string;
}

/** Words of `text` with their offsets in the original string and folded form. */
export function wordSpans(text: string): WordSpan[] {
  const spans: WordSpan[] = [];
  for (const m of text.matchAll(WORD_RE)) {
    const term = foldText(m[0]);
    if (term) spans.push({ start: m.index, end: m.index + m[0].length, term });
  }
  return spans;
}

const ASCII_WORD_RE = /[a-z0-9]+/g;

/** Folded tokens of a text; the single tokenizer used for documents and queries. */
export function tokenize(text: string): string[] {
  // ASCII text (most of it): words are runs of [A-Za-z0-9] and folding is lowercasing,
  // so one match over the lowercased text gives the same tokens without a match object per word.
  if (ASCII_RE.test(text)) return text.toLowerCase().match(ASCII_WORD_RE) ?? [];
  const out: string[] = [];
  for (const m of text.matchAll(WORD_RE)) {
    const term = foldText(m[0]);
    if (term) out.push(term);
  }
  return out;
}

/** Levenshtein distance, giving up (returning max + 1) once it exceeds `max`. */
export function editDistance(a: string, b: string, max: number): number {
  if (Math.abs(a.length - b.length) > max) return max + 1;
  let prev = Array.from({ length: b.length + 1 }, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    const cur = [i];
    let rowMin = i;
    for (let j = 1; j <= b.length; j++) {
      const cost = a[i - 1] === b[j - 1] ? 0 : 1;
      const v = Math.min(prev[j]! + 1, cur[j - 1]! + 1, prev[j - 1]! + cost);
      cur.push(v);
      if (v < rowMin) rowMin = v;
    }
    if (rowMin > max) return max + 1;
    prev = cur;
  }
  return prev[b.length]!;
}

/**
 * Smallest edit distance between `query` and any prefix of `term` (the typo
 * tolerance Meilisearch applies to the last word, typed as you go), with the
 * length of that prefix. Gives up with max + 1 once every prefix is too far.
 */
export function prefixEditDistance(query: string, term: string, max: number): { dist: number; length: number } {
  const m = query.length;
  let col = Array.from({ length: m + 1 }, (_, i) => i);
  let best = { dist: col[m]!, length: 0 };
  for (let j = 1; j <= term.length; j++) {
    const next = [j];
    let colMin = j;
    for (let i = 1; i <= m; i++) {
      const v = Math.min(col[i]! + 1, next[i - 1]! + 1, col[i - 1]! + (query[i - 1] === term[j - 1] ? 0 : 1));
      next.push(v);
      if (v < colMin) colMin = v;
    }
    if (next[m]! < best.dist) best = { dist: next[m]!, length: j };
    if (colMin > max) break;
    col = next;
  }
  return best.dist > max ? { dist: max + 1, length: 0 } : best;
}

/**
 * How a document word matches the query: `full` (whole word highlighted) or a
 * prefix length in folded characters (only that part highlighted, as Meilisearch does).
 */
export type WordMatch = { kind: "full" } | { kind: "prefix"; length: number } | null;
export type WordMatcher = (term: string) => WordMatch;

/** Number of original characters whose folded form covers `foldedLength` characters. */
function originalPrefixLength(word: string, foldedLength: number): number {
  for (let i = 1; i <= word.length; i++) {
    if (foldText(word.slice(0, i)).length >= foldedLength) return i;
  }
  return word.length;
}

/** Wraps matching words of `text` in pre/post tags. */
export function highlightText(text: string, match: WordMatcher, pre: string, post: string): string {
  let out = "";
  let last = 0;
  for (const span of wordSpans(text)) {
    const m = match(span.term);
    if (!m) continue;
    const word = text.slice(span.start, span.end);
    const len = m.kind === "full" ? word.length : originalPrefixLength(word, m.length);
    out += text.slice(last, span.start) + pre + word.slice(0, len) + post;
    last = span.start + len;
  }
  return out + text.slice(last);
}

/** Keeps about `cropLength` words around the first match, marking cut ends with `marker`. */
export function cropText(text: string, match: WordMatcher, cropLength: number, marker: string): string {
  const spans = wordSpans(text);
  if (spans.length <= cropLength) return text;
  if (cropLength <= 0) return "";
  const first = Math.max(
    0,
    spans.findIndex((s) => match(s.term) !== null),
  );
  let from = Math.max(0, first - Math.floor((cropLength - 1) / 2));
  from = Math.min(from, spans.length - cropLength);
  const to = from + cropLength - 1;
  const start = from === 0 ? 0 : spans[from]!.start;
  const end = to === spans.length - 1 ? text.length : spans[to]!.end;
  return (from > 0 ? marker : "") + text.slice(start, end) + (to < spans.length - 1 ? marker : "");
}
