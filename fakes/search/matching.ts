// Query matching: turns `q` into a plan (words, synonyms, typo budget per word
// length, prefix on the last word), runs it on minisearch and measures each hit
// for the words / typo / attribute / exactness ranking rules.

import type MiniSearch from "minisearch";
import type { Doc } from "./fields.js";
import type { RankedHit } from "./ranking.js";
import type { IndexSettings } from "./settings.js";
import { editDistance, foldText, prefixEditDistance, tokenize, type WordMatch, type WordMatcher } from "./text.js";

export interface QueryPlan {
  /** One entry per query word: the word and its single-word synonyms, folded. */
  positions: { alternatives: { term: string; budget: number }[] }[];
  prefixLast: boolean;
  strategy: "last" | "all" | "frequency";
}

export function typoBudget(term: string, settings: IndexSettings): number {
  const t = settings.typoTolerance;
  if (!t.enabled || t.disableOnWords.some((w) => foldText(w) === term)) return 0;
  if (t.disableOnNumbers && /^\d+$/.test(term)) return 0;
  const len = [...term].length;
  return len >= t.minWordSizeForTypos.twoTypos ? 2 : len >= t.minWordSizeForTypos.oneTypo ? 1 : 0;
}

export function planQuery(q: string, settings: IndexSettings, strategy: QueryPlan["strategy"]): QueryPlan {
  const stop = new Set(settings.stopWords.map(foldText));
  let words = tokenize(q);
  const kept = words.filter((w) => !stop.has(w));
  if (kept.length) words = kept;
  const synonyms = new Map<string, string[]>();
  for (const [word, syns] of Object.entries(settings.synonyms)) {
    const key = tokenize(word).join(" ");
    synonyms.set(key, [...(synonyms.get(key) ?? []), ...syns.flatMap((s) => (tokenize(s).length === 1 ? tokenize(s) : []))]);
  }
  const positions = words.map((w) => {
    const terms = [...new Set([w, ...(synonyms.get(w) ?? [])])];
    return { alternatives: terms.map((term) => ({ term, budget: typoBudget(term, settings) })) };
  });
  const prefixLast = settings.prefixSearch !== "disabled" && /[\p{L}\p{N}]$/u.test(q);
  return { positions, prefixLast, strategy };
}

interface TermMatch {
  pos: number;
  typos: number;
  exact: boolean;
  /** Folded characters of the document word that matched (a typed prefix); undefined = whole word. */
  prefixLength?: number;
}

/** Meilisearch only allows a different first letter when it is the word's single typo. */
const firstLetterOk = (query: string, term: string, dist: number) => dist < 2 || query[0] === term[0];

function matchTerm(plan: QueryPlan, term: string): TermMatch[] {
  const out: TermMatch[] = [];
  const last = plan.positions.length - 1;
  plan.positions.forEach((p, pos) => {
    const prefix = pos === last && plan.prefixLast;
    let best: TermMatch | null = null;
    const offer = (m: TermMatch) => {
      if (!best || m.typos < best.typos || (m.typos === best.typos && m.exact && !best.exact)) best = m;
    };
    for (const { term: alt, budget } of p.alternatives) {
      if (term === alt) offer({ pos, typos: 0, exact: true });
      else if (prefix && term.startsWith(alt)) offer({ pos, typos: 0, exact: false, prefixLength: alt.length });
      else if (budget > 0 && prefix) {
        const { dist, length } = prefixEditDistance(alt, term, budget);
        if (dist <= budget && firstLetterOk(alt, term, dist)) offer({ pos, typos: dist, exact: false, ...(length < term.length ? { prefixLength: length } : {}) });
      } else if (budget > 0) {
        const dist = editDistance(term, alt, budget);
        if (dist <= budget && firstLetterOk(alt, term, dist)) offer({ pos, typos: dist, exact: false });
      }
    }
    if (best) out.push(best);
  });
  return out;
}

/**
 * Vocabulary words reachable from the last query word by prefix + typos, which
 * minisearch cannot find by itself (its fuzzy search compares whole words).
 */
export function expandLastWord(plan: QueryPlan, vocabulary: Iterable<string>, max = 200): string[] {
  const lastPos = plan.positions[plan.positions.length - 1];
  if (!lastPos || !plan.prefixLast) return [];
  const found: { term: string; dist: number }[] = [];
  for (const { term: alt, budget } of lastPos.alternatives) {
    if (budget === 0) continue;
    for (const term of vocabulary) {
      if (term.length < alt.length - budget || term.startsWith(alt)) continue;
      const { dist } = prefixEditDistance(alt, term, budget);
      if (dist <= budget && firstLetterOk(alt, term, dist)) found.push({ term, dist });
    }
  }
  return found.sort((a, b) => a.dist - b.dist).slice(0, max).map((f) => f.term);
}

/** Highlighting matcher for a plan: full words, or the matched prefix of the last word. */
export function wordMatcher(plan: QueryPlan): WordMatcher {
  const cache = new Map<string, WordMatch>();
  return (term) => {
    let m = cache.get(term);
    if (m !== undefined) return m;
    m = null;
    for (const t of matchTerm(plan, term)) {
      if (t.prefixLength === undefined) {
        m = { kind: "full" };
        break;
      }
      if (m === null || t.prefixLength > m.length) m = { kind: "prefix", length: t.prefixLength };
    }
    cache.set(term, m);
    return m;
  };
}

/** Runs the plan on minisearch and scores each hit for the words/typo/attribute/exactness rules. */
export function matchQuery(
  ms: MiniSearch<Doc>,
  plan: QueryPlan,
  fields: string[],
  restrictTo: string[] | null,
  lookup: (id: string) => { doc: Doc; ordinal: number; slot: number } | undefined,
  expansions: string[] = [],
): RankedHit[] {
  const last = plan.positions.length - 1;
  const boost = Object.fromEntries(fields.map((f, i) => [f, fields.length - i]));
  const queries = plan.positions.flatMap((p, i) =>
    p.alternatives.map((alt) => ({
      queries: [alt.term],
      combineWith: "OR" as const,
      prefix: i === last && plan.prefixLast,
      fuzzy: alt.budget,
    })),
  );
  for (const term of expansions) queries.push({ queries: [term], combineWith: "OR", prefix: false, fuzzy: 0 });
  const raw = ms.search({ combineWith: "OR", queries }, { boost, ...(restrictTo ? { fields: restrictTo } : {}) });
  const cache = new Map<string, TermMatch[]>();
  const fieldRank = new Map(fields.map((f, i) => [f, i]));
  const n = plan.positions.length;
  // Scratch buffers reused for every hit: this loop runs once per matching document.
  const typos = new Int32Array(n);
  const exact = new Uint8Array(n);
  const NONE = 1 << 20;
  const hits: RankedHit[] = [];
  for (const r of raw) {
    typos.fill(NONE);
    exact.fill(0);
    let attribute = fields.length;
    for (const term in r.match) {
      let tm = cache.get(term);
      if (!tm) cache.set(term, (tm = matchTerm(plan, term)));
      if (tm.length === 0) continue;
      for (const t of tm) {
        if (t.typos < typos[t.pos]!) typos[t.pos] = t.typos;
        if (t.exact) exact[t.pos] = 1;
      }
      for (const f of r.match[term]!) {
        const rank = fieldRank.get(f) ?? fields.length;
        if (rank < attribute) attribute = rank;
      }
    }
    let words = 0;
    let typoSum = 0;
    let exactCount = 0;
    for (let i = 0; i < n; i++) {
      if (typos[i] === NONE) {
        if (plan.strategy === "last") break;
        if (plan.strategy === "all") {
          words = 0;
          break;
        }
        continue;
      }
      words++;
      typoSum += typos[i]!;
      exactCount += exact[i]!;
    }
    if (words === 0) continue;
    const id = String(r.id);
    const entry = lookup(id);
    if (!entry) continue;
    hits.push({ id, doc: entry.doc, words, typos: typoSum, attribute, exact: exactCount, bm25: r.score, ordinal: entry.ordinal, slot: entry.slot });
  }
  return hits;
}
