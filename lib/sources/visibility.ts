import "server-only";
import { and, eq, isNotNull, isNull, or, type SQL } from "drizzle-orm";
import { sources } from "@/db/schema";
import { atLeast, type Actor } from "@/lib/auth/policy";

// Who may see which sources, as a condition inside every query: readers and visitors see published
// sources, contributors also their own drafts, editors and admins everything not deleted; only admins
// may ask for deleted ones.
export function visibleSources(actor: Actor | null, opts: { deleted?: "only" } = {}): SQL {
  if (opts.deleted === "only" && atLeast(actor, "admin")) return isNotNull(sources.deletedAt);
  const live = isNull(sources.deletedAt);
  if (atLeast(actor, "editor")) return live;
  if (atLeast(actor, "contributor")) return and(live, or(eq(sources.state, "published"), eq(sources.createdBy, actor!.id)))!;
  return and(live, eq(sources.state, "published"))!;
}

export function canSeeSource(actor: Actor | null, source: { state: string; createdBy: number; deletedAt: Date | null }): boolean {
  if (source.deletedAt) return atLeast(actor, "admin");
  if (source.state === "published") return true;
  return atLeast(actor, "editor") || (actor !== null && atLeast(actor, "contributor") && actor.id === source.createdBy);
}
