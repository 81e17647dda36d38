// Regions in a chosen review state, made through the API as the demo accounts would: the contributor
// marks and proposes, the editor vets. Shared by the light table's integration and browser tests.
import type { RegionView } from "@/lib/regions/types";
import { call, type Jar } from "./app";

type Box = { x: number; y: number; w: number; h: number };
type Stage = "draft" | "proposed" | "vetted";

async function answer(res: Response, what: string): Promise<RegionView> {
  if (res.status >= 300) throw new Error(`${what} failed: ${res.status} ${await res.text()}`);
  return (await res.json()) as RegionView;
}

/** A rectangle on the photograph with these observations, taken as far as `stage`. */
export async function regionAt(
  accounts: { author: Jar; editor: Jar },
  imageId: number,
  stage: Stage,
  body: { box: Box; label?: string; observations?: unknown[] },
): Promise<RegionView> {
  const { author, editor } = accounts;
  let region = await answer(
    await call(`/api/images/${imageId}/regions`, { jar: author, json: { shape: { kind: "rectangle", ...body.box }, label: body.label ?? null, observations: body.observations ?? [] } }),
    "marking a region",
  );
  if (stage === "draft") return region;
  region = await answer(await call(`/api/regions/${region.id}/propose`, { jar: author, json: { version: region.version } }), "proposing");
  if (stage === "proposed") return region;
  return answer(await call(`/api/regions/${region.id}/review`, { jar: editor, json: { version: region.version, decision: "vetted" } }), "vetting");
}

/** The text a browser shows for server-rendered HTML: no scripts, no tags, entities read. */
export function visibleText(html: string): string {
  const body = html.replace(/<script[\s\S]*?<\/script>/g, " ").replace(/<!-- -->/g, "").replace(/<[^>]+>/g, " ");
  return body.replace(/&quot;/g, '"').replace(/&#x27;/g, "'").replace(/&amp;/g, "&").replace(/\s+/g, " ");
}
