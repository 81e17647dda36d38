// The whole permission table, written out from the roles in DESIGN.md ("Who uses it, and what they
// may do"), checked against the policy module. A new action must be added here to pass.
import { describe, expect, it } from "vitest";
import { ACTIONS, authorize, can, decide, type Action, type Actor } from "@/lib/auth/policy";
import { ForbiddenError, UnauthenticatedError } from "@/lib/errors";

const actor = (role: Actor["role"], id = 10): Actor => ({ id, role, email: `${role}@x.test`, name: role });
const visitor = null;
const reader = actor("reader", 11);
const contributor = actor("contributor", 12);
const editor = actor("editor", 13);
const admin = actor("admin", 14);

// Lowest role allowed for each action on a resource the actor does not own.
const LOWEST: Record<Action, "anyone" | "reader" | "contributor" | "editor" | "admin"> = {
  "archive.read": "anyone",
  "export.visible": "anyone",
  "archive.read_proposed": "reader",
  "dossier.manage": "reader",
  "account.notifications": "reader",
  "region.discuss": "contributor",
  "source.create": "contributor",
  "region.create": "contributor",
  "collection.create": "contributor",
  // Others' work: editors may change anyone's; contributors only their own (checked below).
  "source.edit": "editor",
  "image.upload": "editor",
  // Regions: editors review others' work and do not rewrite it; only an admin acting for the archive.
  "region.edit": "admin",
  "collection.edit": "editor",
  // Proposing or withdrawing someone else's region: only an admin acting for the archive.
  "region.propose": "admin",
  "region.withdraw": "admin",
  "review.decide": "editor",
  "review.read_desk": "editor",
  "vocabulary.edit": "editor",
  "duplicate.merge": "editor",
  "image.reprocess": "editor",
  "place.define_area": "editor",
  "source.delete": "admin",
  "source.restore": "admin",
  "user.manage": "admin",
  "audit.read": "admin",
  "system.reindex": "admin",
  "system.backup": "admin",
  "system.digest": "admin",
};

const ladder = [
  ["visitor", visitor],
  ["reader", reader],
  ["contributor", contributor],
  ["editor", editor],
  ["admin", admin],
] as const;
const order = ["anyone", "reader", "contributor", "editor", "admin"];

describe("policy: the permission table", () => {
  it("covers every action the policy knows, and no other", () => {
    expect([...ACTIONS].sort()).toEqual(Object.keys(LOWEST).sort());
  });

  for (const action of Object.keys(LOWEST) as Action[]) {
    const othersWork = { ownerId: 999, authorId: 999 };
    for (const [name, who] of ladder) {
      const rank = name === "visitor" ? 0 : order.indexOf(name);
      const expected = rank >= order.indexOf(LOWEST[action]);
      it(`${action}: ${name} ${expected ? "may" : "may not"} act on others' work`, () => {
        expect(can(who, action, othersWork)).toBe(expected);
      });
    }
  }
});

describe("policy: ownership and peer review", () => {
  const own = { ownerId: contributor.id, authorId: contributor.id };
  it.each(["source.edit", "image.upload", "region.edit", "region.propose", "region.withdraw", "collection.edit"] as const)(
    "a contributor may %s their own work",
    (action) => expect(can(contributor, action, own)).toBe(true),
  );
  it("a reader may not edit a source even if recorded as its owner", () => {
    expect(can(reader, "source.edit", { ownerId: reader.id })).toBe(false);
  });
  it("nobody reviews their own work, not even an admin", () => {
    expect(can(editor, "review.decide", { authorId: editor.id })).toBe(false);
    expect(can(admin, "review.decide", { authorId: admin.id })).toBe(false);
    expect(can(editor, "review.decide", { authorId: contributor.id })).toBe(true);
  });
  it("says why it refuses", () => {
    expect(decide(visitor, "source.create")).toMatchObject({ allowed: false, reason: "unauthenticated" });
    expect(decide(reader, "source.create")).toMatchObject({ allowed: false, reason: "forbidden" });
    expect(decide(contributor, "source.edit", { ownerId: 1 })).toMatchObject({ message: "You may only change your own work." });
  });
  it("authorize throws 401 for visitors and 403 for a role without the permission", () => {
    expect(() => authorize(visitor, "user.manage")).toThrow(UnauthenticatedError);
    expect(() => authorize(editor, "user.manage")).toThrow(ForbiddenError);
    expect(() => authorize(admin, "user.manage")).not.toThrow();
  });
});
