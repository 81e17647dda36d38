// Index settings: the real server's defaults, request validation (400s with
// `invalid_settings_*` codes) and how a partial update is folded into the current settings.

import { bad, invalidType } from "./errors.js";
import { isPlainObject } from "./fields.js";

export interface GranularFilterable {
  attributePatterns: string[];
  features?: { facetSearch?: boolean; filter?: { equality?: boolean; comparison?: boolean } };
}

export interface TypoToleranceSettings {
  enabled: boolean;
  minWordSizeForTypos: { oneTypo: number; twoTypos: number };
  disableOnWords: string[];
  disableOnAttributes: string[];
  disableOnNumbers: boolean;
}

export interface IndexSettings {
  displayedAttributes: string[];
  searchableAttributes: string[];
  filterableAttributes: (string | GranularFilterable)[];
  sortableAttributes: string[];
  rankingRules: string[];
  stopWords: string[];
  nonSeparatorTokens: string[];
  separatorTokens: string[];
  dictionary: string[];
  synonyms: Record<string, string[]>;
  distinctAttribute: string | null;
  proximityPrecision: "byWord" | "byAttribute";
  typoTolerance: TypoToleranceSettings;
  faceting: { maxValuesPerFacet: number; sortFacetValuesBy: Record<string, "alpha" | "count"> };
  pagination: { maxTotalHits: number };
  embedders: Record<string, unknown>;
  searchCutoffMs: number | null;
  localizedAttributes: unknown[] | null;
  facetSearch: boolean;
  prefixSearch: "indexingTime" | "disabled";
}

export type SettingsKey = keyof IndexSettings;
export type SettingsPatch = { [K in SettingsKey]?: IndexSettings[K] | null };

export const DEFAULT_RANKING_RULES = ["words", "typo", "proximity", "attribute", "sort", "exactness"];

export function defaultSettings(): IndexSettings {
  return {
    displayedAttributes: ["*"],
    searchableAttributes: ["*"],
    filterableAttributes: [],
    sortableAttributes: [],
    rankingRules: [...DEFAULT_RANKING_RULES],
    stopWords: [],
    nonSeparatorTokens: [],
    separatorTokens: [],
    dictionary: [],
    synonyms: {},
    distinctAttribute: null,
    proximityPrecision: "byWord",
    typoTolerance: {
      enabled: true,
      minWordSizeForTypos: { oneTypo: 5, twoTypos: 9 },
      disableOnWords: [],
      disableOnAttributes: [],
      disableOnNumbers: false,
    },
    faceting: { maxValuesPerFacet: 100, sortFacetValuesBy: { "*": "alpha" } },
    pagination: { maxTotalHits: 1000 },
    embedders: {},
    searchCutoffMs: null,
    localizedAttributes: null,
    facetSearch: true,
    prefixSearch: "indexingTime",
  };
}

export const SETTINGS_KEYS = Object.keys(defaultSettings()) as SettingsKey[];

/** URL slug of a single setting: `filterable-attributes` → `filterableAttributes`. */
export function keyFromSlug(slug: string): SettingsKey | undefined {
  const key = slug.replace(/-([a-z])/g, (_, c: string) => c.toUpperCase());
  return (SETTINGS_KEYS as string[]).includes(key) ? (key as SettingsKey) : undefined;
}

/** Settings whose sub-route merges the body (PATCH) instead of replacing it. */
export const MERGED_KEYS = new Set<SettingsKey>(["typoTolerance", "faceting", "pagination", "embedders"]);

const code = (key: string) => `invalid_settings_${key.replace(/[A-Z]/g, (c) => `_${c.toLowerCase()}`)}`;

function stringArray(key: string, v: unknown): string[] {
  if (!Array.isArray(v)) throw invalidType(code(key), `.${key}`, "an array", v);
  v.forEach((s, i) => {
    if (typeof s !== "string") throw invalidType(code(key), `.${key}[${i}]`, "a string", s);
  });
  return v as string[];
}

const SORTED_KEYS = new Set(["sortableAttributes", "stopWords", "nonSeparatorTokens", "separatorTokens", "dictionary"]);
const RANKING_RULE_RE = /^(words|typo|proximity|attribute|sort|exactness|attributeRank|wordPosition)$|^.+:(asc|desc)$/;

function validateObject(key: string, v: unknown): Record<string, unknown> {
  if (!isPlainObject(v)) throw invalidType(code(key), `.${key}`, "an object", v);
  return v;
}

/** Validates one setting value from a request; returns it normalised (null = reset). */
export function validateSetting(key: SettingsKey, v: unknown): unknown {
  if (v === null) return null;
  switch (key) {
    case "displayedAttributes":
    case "searchableAttributes":
    case "sortableAttributes":
    case "stopWords":
    case "nonSeparatorTokens":
    case "separatorTokens":
    case "dictionary": {
      const arr = [...new Set(stringArray(key, v))];
      return SORTED_KEYS.has(key) ? arr.sort() : arr;
    }
    case "filterableAttributes":
      if (!Array.isArray(v)) throw invalidType(code(key), `.${key}`, "an array", v);
      v.forEach((item, i) => {
        if (typeof item === "string") return;
        if (isPlainObject(item) && Array.isArray(item.attributePatterns) && item.attributePatterns.every((p) => typeof p === "string")) return;
        throw invalidType(code(key), `.${key}[${i}]`, "a string or an object with `attributePatterns`", item);
      });
      return v;
    case "rankingRules":
      stringArray(key, v).forEach((rule, i) => {
        if (!RANKING_RULE_RE.test(rule))
          throw bad(code(key), `Invalid value at \`.rankingRules[${i}]\`: \`${rule}\` ranking rule is invalid. Valid ranking rules are words, typo, sort, proximity, attribute, exactness and custom ranking rules.`);
      });
      return v;
    case "synonyms": {
      const obj = validateObject(key, v);
      for (const [word, syns] of Object.entries(obj)) stringArray(`synonyms.${word}`, syns);
      return obj;
    }
    case "distinctAttribute":
      if (typeof v !== "string") throw invalidType(code(key), `.${key}`, "a string", v);
      return v;
    case "proximityPrecision":
    case "prefixSearch": {
      const allowed = key === "proximityPrecision" ? ["byWord", "byAttribute"] : ["indexingTime", "disabled"];
      if (typeof v !== "string" || !allowed.includes(v))
        throw bad(code(key), `Unknown value \`${String(v)}\` at \`.${key}\`: expected one of ${allowed.map((a) => `\`${a}\``).join(", ")}`);
      return v;
    }
    case "facetSearch":
      if (typeof v !== "boolean") throw invalidType(code(key), `.${key}`, "a boolean", v);
      return v;
    case "searchCutoffMs":
      if (typeof v !== "number" || v < 0) throw invalidType(code(key), `.${key}`, "a positive integer", v);
      return v;
    case "localizedAttributes":
      if (!Array.isArray(v)) throw invalidType(code(key), `.${key}`, "an array", v);
      return v;
    case "typoTolerance": {
      const obj = validateObject(key, v);
      for (const k of ["disableOnWords", "disableOnAttributes"]) if (obj[k] != null) stringArray(`typoTolerance.${k}`, obj[k]);
      const sizes = obj.minWordSizeForTypos;
      if (sizes != null) {
        const s = validateObject("typoTolerance.minWordSizeForTypos", sizes);
        const one = s.oneTypo ?? 5;
        const two = s.twoTypos ?? 9;
        if (typeof one === "number" && typeof two === "number" && one > two)
          throw bad(code(key), "`minWordSizeForTypos` setting is invalid. `oneTypo` and `twoTypos` fields should be between `0` and `255`, and `twoTypos` should be greater or equals to `oneTypo` but found `oneTypo: " + one + "` and twoTypos: " + two + "`.");
      }
      return obj;
    }
    case "faceting": {
      const obj = validateObject(key, v);
      const max = obj.maxValuesPerFacet;
      if (max != null && (typeof max !== "number" || !Number.isInteger(max) || max < 0))
        throw invalidType(code(key), ".faceting.maxValuesPerFacet", "a positive integer", max);
      return obj;
    }
    case "pagination": {
      const obj = validateObject(key, v);
      const max = obj.maxTotalHits;
      if (max != null && (typeof max !== "number" || !Number.isInteger(max) || max < 0))
        throw invalidType(code(key), ".pagination.maxTotalHits", "a positive integer", max);
      return obj;
    }
    case "embedders":
      return validateObject(key, v);
  }
}

/** Validates a full `PATCH /settings` body. */
export function validateSettingsBody(body: unknown): SettingsPatch {
  if (!isPlainObject(body)) throw invalidType("bad_request", "", "an object", body);
  const patch: Record<string, unknown> = {};
  for (const [key, value] of Object.entries(body)) {
    if (!(SETTINGS_KEYS as string[]).includes(key))
      throw bad("bad_request", `Unknown field \`${key}\`: expected one of ${SETTINGS_KEYS.map((k) => `\`${k}\``).join(", ")}`);
    patch[key] = validateSetting(key as SettingsKey, value);
  }
  return patch as SettingsPatch;
}

/** Applies a validated patch: null resets a setting, object settings are merged. */
export function applySettings(current: IndexSettings, patch: SettingsPatch): IndexSettings {
  const next = structuredClone(current) as unknown as Record<string, unknown>;
  const defaults = defaultSettings() as unknown as Record<string, unknown>;
  for (const [key, value] of Object.entries(patch)) {
    if (value === null || value === undefined) next[key] = defaults[key];
    else if (MERGED_KEYS.has(key as SettingsKey) && isPlainObject(value)) {
      const merged = { ...(next[key] as Record<string, unknown>) };
      for (const [k, v] of Object.entries(value)) {
        const base = (defaults[key] as Record<string, unknown>)[k];
        if (v === null) merged[k] = structuredClone(base);
        else if (isPlainObject(v) && isPlainObject(merged[k]) && k !== "sortFacetValuesBy") merged[k] = { ...merged[k], ...v };
        else if (k === "sortFacetValuesBy" && isPlainObject(v)) merged[k] = { "*": "alpha", ...v };
        else merged[k] = v;
      }
      if (key === "embedders") for (const [k, v] of Object.entries(merged)) if (v === null) delete merged[k];
      next[key] = merged;
    } else next[key] = structuredClone(value);
  }
  return next as unknown as IndexSettings;
}

/** Patterns of filterable attributes (granular rules flattened), for validation and facets. */
export function filterablePatterns(settings: IndexSettings): string[] {
  return settings.filterableAttributes.flatMap((rule) => {
    if (typeof rule === "string") return [rule];
    if (rule.features?.filter && rule.features.filter.equality === false && rule.features.filter.comparison === false) return [];
    return rule.attributePatterns;
  });
}
