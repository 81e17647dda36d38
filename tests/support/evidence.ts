// Shared steps of the evidence tests: a source with one processed photograph, and the vocabulary's ids by key.
import { call, unique, type Jar } from "./app";
import { picture, settled, upload } from "./images";

export type Vocabulary = { aspect(key: string): number; term(aspectKey: string, termKey: string): number };

export async function vocabulary(jar?: Jar): Promise<Vocabulary> {
  const res = await call("/api/vocabulary", { jar });
  const { aspects } = (await res.json()) as { aspects: { id: number; key: string; terms: { id: number; key: string }[] }[] };
  const byKey = new Map(aspects.map((a) => [a.key, a]));
  const aspect = (key: string) => byKey.get(key) ?? (() => { throw new Error(`no aspect ${key} in the vocabulary`); })();
  return {
    aspect: (key) => aspect(key).id,
    term: (aspectKey, termKey) => {
      const t = aspect(aspectKey).terms.find((x) => x.key === termKey);
      if (!t) throw new Error(`no term ${termKey} of ${aspectKey}`);
      return t.id;
    },
  };
}

/** A published source with one processed photograph of the given size, made by `jar`; `fields` add to or replace its catalogue fields. */
export async function photographedSource(jar: Jar, width = 1600, height = 1200, fields: Record<string, unknown> = {}): Promise<{ sourceId: number; imageId: number }> {
  const res = await call("/api/sources", { jar, json: { title: unique("Evidence"), objectType: "painting", state: "published", ...fields } });
  const sourceId = ((await res.json()) as { source: { id: number } }).source.id;
  const { imageId } = await upload(jar, sourceId, "evidence.jpg", await picture(Math.floor(Math.random() * 1e6), width, height));
  const image = await settled(jar, sourceId, imageId!);
  if (image?.state !== "ready") throw new Error(`the test photograph did not process: ${JSON.stringify(image)}`);
  return { sourceId, imageId: imageId! };
}
