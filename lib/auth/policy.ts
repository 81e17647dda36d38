// The one place that decides every permission. Route handlers, server actions and data-access
// functions call authorize(); the UI calls can() only to hide what the server would refuse anyway.
import { ForbiddenError, UnauthenticatedError } from "@/lib/errors";
import { ROLES, type Role } from "@/db/schema/users";

export type Actor = { id: number; role: Role; email: string; name: string };

/** Ownership and authorship facts a rule may need about the record acted on. */
export type Resource = { ownerId?: number | null; authorId?: number | null; state?: string };

type Rule = {
  /** Lowest role that may act; "anyone" includes visitors who are not signed in. */
  min: Role | "anyone";
  /** Below `fullFrom`, the actor must own the resource. */
  ownOnlyBelow?: Role;
  /** The actor may never act on their own work (peer review). */
  notOwn?: boolean;
};

export const RULES = {
  "archive.read": { min: "anyone" },
  "archive.read_proposed": { min: "reader" },
  "dossier.manage": { min: "reader" },
  "export.visible": { min: "anyone" },
  "source.create": { min: "contributor" },
  "source.edit": { min: "contributor", ownOnlyBelow: "editor" },
  "image.upload": { min: "contributor", ownOnlyBelow: "editor" },
  "region.create": { min: "contributor" },
  // Regions are peer-reviewed work: an editor vets others' regions but does not rewrite them.
  "region.edit": { min: "contributor", ownOnlyBelow: "admin" },
  "region.propose": { min: "contributor", ownOnlyBelow: "admin" },
  "region.withdraw": { min: "contributor", ownOnlyBelow: "admin" },
  "region.discuss": { min: "contributor" },
  "account.notifications": { min: "reader" },
  "collection.create": { min: "contributor" },
  "collection.edit": { min: "contributor", ownOnlyBelow: "editor" },
  "review.decide": { min: "editor", notOwn: true },
  "review.read_desk": { min: "editor" },
  "vocabulary.edit": { min: "editor" },
  "duplicate.merge": { min: "editor" },
  "image.reprocess": { min: "editor" },
  "place.define_area": { min: "editor" },
  "source.delete": { min: "admin" },
  "source.restore": { min: "admin" },
  "user.manage": { min: "admin" },
  "audit.read": { min: "admin" },
  "system.reindex": { min: "admin" },
  "system.backup": { min: "admin" },
  // Sending the daily digest out of schedule mails every person who chose it.
  "system.digest": { min: "admin" },
} as const satisfies Record<string, Rule>;

export type Action = keyof typeof RULES;
export const ACTIONS = Object.keys(RULES) as Action[];

const rank = (role: Role) => ROLES.indexOf(role);

export function atLeast(actor: Actor | null, role: Role): boolean {
  return actor !== null && rank(actor.role) >= rank(role);
}

export type Decision = { allowed: true } | { allowed: false; reason: "unauthenticated" | "forbidden"; message: string };

export function decide(actor: Actor | null, action: Action, resource?: Resource): Decision {
  const rule: Rule = RULES[action];
  if (rule.min === "anyone") return { allowed: true };
  if (!actor) return { allowed: false, reason: "unauthenticated", message: "Sign in to do this." };
  if (!atLeast(actor, rule.min)) {
    return { allowed: false, reason: "forbidden", message: `This needs the ${rule.min} role or higher.` };
  }
  const ownerId = resource?.ownerId ?? resource?.authorId;
  if (rule.ownOnlyBelow && !atLeast(actor, rule.ownOnlyBelow) && resource && ownerId !== actor.id) {
    return { allowed: false, reason: "forbidden", message: "You may only change your own work." };
  }
  if (rule.notOwn && resource && ownerId === actor.id) {
    return { allowed: false, reason: "forbidden", message: "Nobody reviews their own work." };
  }
  return { allowed: true };
}

export function can(actor: Actor | null, action: Action, resource?: Resource): boolean {
  return decide(actor, action, resource).allowed;
}

/** Throws the matching application error when the actor may not act. */
export function authorize(actor: Actor | null, action: Action, resource?: Resource): void {
  const decision = decide(actor, action, resource);
  if (decision.allowed) return;
  if (decision.reason === "unauthenticated") throw new UnauthenticatedError(decision.message);
  throw new ForbiddenError(decision.message);
}
