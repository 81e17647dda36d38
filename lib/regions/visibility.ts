import "server-only";
import { sql, type SQL } from "drizzle-orm";
import { regions } from "@/db/schema";
import { atLeast, can, type Actor } from "@/lib/auth/policy";
import type { RegionPermissions, RegionState } from "./types";

export type RegionVisibility = { proposed?: boolean };

/**
 * Which version of a region the caller sees, as an SQL expression (NULL: none), so that what a caller
 * may see is decided inside the query. Authors and admins see the working version; editors see it once
 * it is in review (proposed, vetted, returned) and otherwise the vetted one; everyone else sees the
 * vetted version, and, when they ask for it, proposed work that has no vetted version yet.
 */
export function shownVersionId(actor: Actor | null, opts: RegionVisibility = {}): SQL<number | null> {
  const working = sql`${regions.workingVersionId}`;
  const vetted = sql`${regions.vettedVersionId}`;
  if (atLeast(actor, "admin")) return sql<number | null>`${working}`;
  const mine = actor ? sql`${regions.authorId} = ${actor.id}` : sql`FALSE`;
  const inReview = atLeast(actor, "editor") ? sql`${regions.state} IN ('proposed', 'vetted', 'returned')` : sql`FALSE`;
  const optIn = opts.proposed ? sql`(${regions.state} = 'proposed' AND ${vetted} IS NULL)` : sql`FALSE`;
  return sql<number | null>`CASE WHEN ${mine} OR ${inReview} OR ${optIn} THEN ${working} ELSE ${vetted} END`;
}

export function regionPermissions(
  actor: Actor | null,
  region: { authorId: number; state: RegionState; hasVetted: boolean; isWorking: boolean },
): RegionPermissions {
  const own = { authorId: region.authorId };
  // Only the working version can be acted on; a reader looking at the vetted one while a revision is
  // in progress acts on nothing.
  const working = region.isWorking;
  return {
    edit: working && can(actor, "region.edit", own),
    propose: working && can(actor, "region.propose", own) && ["draft", "returned", "withdrawn"].includes(region.state),
    withdraw: working && can(actor, "region.withdraw", own) && region.state === "proposed",
    delete: working && can(actor, "region.edit", own) && (!region.hasVetted || atLeast(actor, "admin")),
    decide: working && can(actor, "review.decide", own) && region.state === "proposed",
    discuss: can(actor, "region.discuss"),
  };
}
