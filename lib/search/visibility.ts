// Who may see which search documents, as filter expressions the server puts into every query it sends
// (see documents.ts for the document scheme). The same rules as lib/regions/visibility.ts
// (shownVersionId) and lib/sources/visibility.ts (visibleSources), which decide the same in SQL:
//
// - a source is visible when it is published, to its creator when it is a draft, and to editors and
//   admins always (deleted sources have no documents at all);
// - of a region, admins see the working version; its author sees the working version; editors see
//   it once it is in review (proposed, vetted, returned); whoever asks for proposed work sees a
//   proposed version that has no vetted one yet; everyone else sees the vetted version, if any.
//
// "Sees the working version" is `isWorking = true AND <condition>`, "otherwise the vetted one" is
// `isVetted = true AND NOT <condition>`: exactly one document per region matches, or none.
import { atLeast, type Actor } from "@/lib/auth/policy";

export type SearchVisibility = { proposed?: boolean };

function sourceCondition(actor: Actor | null): string | null {
  if (atLeast(actor, "editor")) return null;
  if (atLeast(actor, "contributor")) return `(sourceState = "published" OR sourceCreatorId = ${actor!.id})`;
  return `sourceState = "published"`;
}

function workingCondition(actor: Actor | null, opts: SearchVisibility): string | null {
  const reasons: string[] = [];
  if (actor) reasons.push(`authorId = ${actor.id}`);
  if (atLeast(actor, "editor")) reasons.push(`regionState IN ["proposed", "vetted", "returned"]`);
  if (opts.proposed) reasons.push(`(regionState = "proposed" AND hasVetted = false)`);
  return reasons.length ? `(${reasons.join(" OR ")})` : null;
}

/** The filter of the regions index for this caller: every clause must hold. */
export function regionVisibilityFilter(actor: Actor | null, opts: SearchVisibility = {}): string[] {
  const source = sourceCondition(actor);
  let version: string;
  if (atLeast(actor, "admin")) version = "isWorking = true";
  else {
    const working = workingCondition(actor, opts);
    version = working ? `((isWorking = true AND ${working}) OR (isVetted = true AND NOT ${working}))` : "isVetted = true";
  }
  return source ? [source, version] : [version];
}

/** The filter of the sources index for this caller. */
export function sourceVisibilityFilter(actor: Actor | null): string[] {
  const source = sourceCondition(actor);
  return source ? [source] : [];
}
