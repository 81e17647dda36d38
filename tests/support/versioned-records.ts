// Records the edit-form tests open in the browser: made, changed and read back through the API, as the
// other person (or the other window) would, so that what is stored is checked, not what a page shows.
import type { AspectView, TermView } from "@/lib/vocabulary/types";
import { call, unique, type Jar } from "./app";

export type Collection = { id: number; name: string; city: string | null; countryCode: string | null; url: string | null; notes: string | null; version: number };
export type Dossier = { id: number; title: string; description: string | null; version: number };

/** The answer's JSON, after checking its status; the body is in the error when the status is not the one expected. */
export async function ok<T>(res: Response, status = 200): Promise<T> {
  const body = await res.text();
  if (res.status !== status) throw new Error(`${res.url} answered ${res.status}, not ${status}: ${body}`);
  return JSON.parse(body) as T;
}

/** A vocabulary key of its own for this run: lowercase letters, digits and _. */
export const uniqueKey = (prefix: string) => unique(prefix).replace(/-/g, "_");

/** A new aspect whose values are terms, with these terms, as stored. */
export async function aspectWithTerms(editor: Jar, terms: { key: string; label: string; description?: string }[]): Promise<AspectView> {
  const body = { key: uniqueKey("conflict"), label: unique("Peg material"), kind: "terms", section: "instrument", description: "What the pegs are turned from." };
  const { aspect } = await ok<{ aspect: AspectView }>(await call("/api/vocabulary", { jar: editor, json: body }));
  for (const term of terms) await ok(await call(`/api/vocabulary/aspects/${aspect.id}/terms`, { jar: editor, json: term }));
  return storedAspect(editor, aspect.id);
}

export async function storedAspect(jar: Jar, id: number): Promise<AspectView> {
  const { aspects } = await ok<{ aspects: AspectView[] }>(await call("/api/vocabulary", { jar }));
  const aspect = aspects.find((a) => a.id === id);
  if (!aspect) throw new Error(`no aspect ${id} in the vocabulary`);
  return aspect;
}

export async function storedTerm(jar: Jar, aspectId: number, termId: number): Promise<TermView> {
  const term = (await storedAspect(jar, aspectId)).terms.find((t) => t.id === termId);
  if (!term) throw new Error(`no term ${termId} in aspect ${aspectId}`);
  return term;
}

export async function addCollection(jar: Jar, fields: Omit<Collection, "id" | "version">): Promise<Collection> {
  return (await ok<{ collection: Collection }>(await call("/api/collections", { jar, json: fields }))).collection;
}

export const storedCollection = async (jar: Jar, id: number) => (await ok<{ collection: Collection }>(await call(`/api/collections/${id}`, { jar }))).collection;

export async function startDossier(owner: Jar, fields: { title: string; description: string }): Promise<Dossier> {
  return (await ok<{ dossier: Dossier }>(await call("/api/dossiers", { jar: owner, json: fields }), 201)).dossier;
}

export const storedDossier = async (jar: Jar, id: number) => (await ok<{ dossier: Dossier }>(await call(`/api/dossiers/${id}`, { jar }))).dossier;

/** A PATCH as the other person, with the version they read. */
export const patch = async (jar: Jar, path: string, body: Record<string, unknown>) => ok(await call(path, { jar, method: "PATCH", json: body }));
