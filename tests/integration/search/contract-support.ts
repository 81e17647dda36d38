// Shared fixtures for the Meilisearch contract suite: an invented catalogue of
// paintings of guitar players, unique index names, and error helpers.

import { expect } from "vitest";
import { Meilisearch, MeilisearchApiError, type Task } from "meilisearch";

export interface ContractTarget {
  url: string;
  /** The master (or admin) key; undefined when the server runs without one. */
  apiKey?: string;
  /** Only the fake can be restarted on the same data directory. */
  restart?: () => Promise<void>;
}

export const paintings = [
  {
    id: 1,
    title: "El guitarrista de Sevilla",
    city: "Sevilla",
    year: 1921,
    technique: "óleo sobre lienzo",
    courses: ["acuarela", "retrato"],
    observations: [{ term: "azul", weight: 2 }],
    price: 1200,
    framed: true,
  },
  {
    id: 2,
    title: "Die Gitarrenspielerin von Köln",
    city: "Köln",
    year: 1930,
    technique: "tempera",
    courses: ["dibujo"],
    observations: [{ term: "rojo", weight: 1 }],
    price: 800,
    framed: false,
    curator: null,
  },
  {
    id: 3,
    title: "La guitarra callada",
    city: "Granada",
    year: 1905,
    technique: "acuarela",
    courses: [],
    observations: [{ term: "verde" }, { term: "azul" }],
    price: 450,
    framed: true,
  },
  {
    id: 4,
    title: "Serenata en Sevilla",
    city: "Sevilla",
    year: 1950,
    technique: "carboncillo",
    courses: ["retrato"],
    price: 300,
    framed: false,
    note: "",
  },
  {
    id: "p-5",
    title: "Laúd y guitarra",
    city: "Lisboa",
    year: 1888,
    technique: "grabado",
    courses: ["grabado", "dibujo"],
    observations: [],
    price: 2500,
    framed: true,
    curator: "Marta Quiroga",
  },
  {
    id: 6,
    title: "Concierto nocturno",
    city: "Porto",
    year: 1975,
    technique: "acrílico",
    courses: ["acuarela"],
    price: 950,
    framed: false,
    description: "Un ensayo de contrapunteo entre dos violas",
  },
];

export type Painting = (typeof paintings)[number];

let counter = 0;
const run = `c${Date.now().toString(36)}${Math.random().toString(36).slice(2, 6)}`;
/** Index uids unique per run, so the suite can target a shared real server. */
export const uniqueUid = (name: string): string => `${run}_${name}_${++counter}`;

export const clientFor = (target: ContractTarget, apiKey = target.apiKey): Meilisearch =>
  new Meilisearch({ host: target.url, apiKey, defaultWaitOptions: { timeout: 20_000, interval: 20 } });

/** Ids of hits, sorted as strings when `sorted`. */
export const hitIds = (hits: readonly Record<string, unknown>[], sorted = false): unknown[] => {
  const ids = hits.map((h) => h.id);
  return sorted ? [...ids].sort((a, b) => String(a).localeCompare(String(b))) : ids;
};

/** Runs `fn` and returns the API error it throws, failing if it does not. */
export async function apiError(fn: () => Promise<unknown>): Promise<MeilisearchApiError> {
  try {
    await fn();
  } catch (err) {
    expect(err).toBeInstanceOf(MeilisearchApiError);
    return err as MeilisearchApiError;
  }
  throw new Error("expected the call to fail with a MeilisearchApiError");
}

export function expectSucceeded(task: Task): void {
  expect(task.error, JSON.stringify(task.error)).toBeNull();
  expect(task.status).toBe("succeeded");
}
