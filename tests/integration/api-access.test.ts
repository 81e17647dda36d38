// Every route handler under app/api, called by a visitor and by each demo role: a non-public route
// answers 401 to a visitor and 403 to a role without the permission (DESIGN.md's role table).
// A route file missing from EXPECTED fails the first test, so a new route cannot skip this check.
import { readdirSync, readFileSync, statSync } from "node:fs";
import { join, relative } from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { call, DEMO, signedIn, type Jar } from "../support/app";

type Need = "public" | "reader" | "contributor" | "editor" | "admin";
const EXPECTED: Record<string, Partial<Record<"GET" | "POST" | "PATCH" | "PUT" | "DELETE", Need>>> = {
  "/api/auth/[...nextauth]": { GET: "public", POST: "public" },
  "/api/health": { GET: "public" },
  "/api/account/password-reset": { POST: "public" },
  "/api/account/password": { POST: "public" },
  "/api/invitations/accept": { POST: "public" },
  "/api/dev/mail": { GET: "public" },
  "/api/admin/users": { GET: "admin" },
  "/api/admin/users/[id]": { PATCH: "admin" },
  "/api/admin/invitations": { POST: "admin" },
  "/api/admin/audit": { GET: "admin" },
  "/api/admin/reindex": { GET: "admin", POST: "admin" },
  "/api/search": { GET: "public" },
  "/api/search/export.csv": { GET: "public" },
  "/api/places": { GET: "public", POST: "editor" },
  "/api/places/[id]": { GET: "public", PATCH: "editor" },
  "/api/collections": { GET: "public", POST: "contributor" },
  "/api/collections/[id]": { GET: "public", PATCH: "contributor" },
  "/api/sources": { GET: "public", POST: "contributor" },
  "/api/sources/[id]": { GET: "public", PATCH: "contributor", DELETE: "admin" },
  "/api/sources/[id]/restore": { POST: "admin" },
  "/api/sources/[id]/history": { GET: "public" },
  "/api/sources/[id]/images": { GET: "public", POST: "contributor" },
  "/api/images/[id]": { GET: "public", PATCH: "contributor" },
  "/api/images/[id]/complete": { POST: "contributor" },
  "/api/images/[id]/upload": { DELETE: "contributor" },
  "/api/images/[id]/reprocess": { POST: "editor" },
  "/api/sources/import/template": { GET: "public" },
  "/api/sources/import/preview": { POST: "contributor" },
  "/api/sources/import/commit": { POST: "contributor" },
  "/api/images/[id]/regions": { GET: "public", POST: "contributor" },
  "/api/images/[id]/regions/propose": { POST: "contributor" },
  "/api/regions/[id]": { GET: "public", PATCH: "contributor", DELETE: "contributor" },
  "/api/regions/[id]/restore": { POST: "contributor" },
  "/api/regions/[id]/propose": { POST: "contributor" },
  "/api/regions/[id]/withdraw": { POST: "contributor" },
  "/api/regions/[id]/review": { POST: "editor" },
  "/api/regions/[id]/comments": { GET: "reader", POST: "contributor" },
  "/api/review/desk": { GET: "editor" },
  "/api/account/notifications": { GET: "reader", PATCH: "reader" },
  "/api/admin/notifications/digest": { POST: "admin" },
  "/api/regions/[id]/annotation": { GET: "public" },
  "/api/images/[id]/annotations": { GET: "public" },
  "/api/sources/[id]/stringing": { GET: "public" },
  "/api/vocabulary": { GET: "public", POST: "editor" },
  "/api/vocabulary/order": { POST: "editor" },
  "/api/vocabulary/aspects/[id]": { PATCH: "editor", DELETE: "editor" },
  "/api/vocabulary/aspects/[id]/terms": { POST: "editor" },
  "/api/vocabulary/aspects/[id]/order": { POST: "editor" },
  "/api/vocabulary/terms/[id]": { PATCH: "editor", DELETE: "editor" },
  "/api/vocabulary/terms/[id]/merge": { POST: "editor" },
  "/api/dossiers": { GET: "reader", POST: "reader" },
  "/api/dossiers/[id]": { GET: "public", PATCH: "reader", DELETE: "reader" },
  "/api/dossiers/[id]/restore": { POST: "reader" },
  "/api/dossiers/[id]/items": { POST: "reader" },
  "/api/dossiers/[id]/items/[itemId]": { PATCH: "reader", DELETE: "reader" },
  "/api/dossiers/[id]/order": { POST: "reader" },
  "/api/dossiers/[id]/shares": { PUT: "reader" },
  "/api/dossiers/[id]/export.csv": { GET: "public" },
};

const ROLES = ["reader", "contributor", "editor", "admin"] as const;

function routeFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) return routeFiles(path);
    return name === "route.ts" ? [path] : [];
  });
}

const apiDir = join(process.cwd(), "app/api");
const found = routeFiles(apiDir).map((file) => ({
  route: `/api/${relative(apiDir, file).replace(/\/?route\.ts$/, "")}`,
  methods: [
    ...readFileSync(file, "utf8").matchAll(/export\s+(?:const|async\s+function|function)\s+(GET|POST|PATCH|PUT|DELETE)\b|\bas\s+(GET|POST|PATCH|PUT|DELETE)\b/g),
  ].map((m) => m[1] ?? m[2]),
}));

// Dynamic segments get a plausible value; authorization runs before the record is looked up.
const concrete = (route: string) => route.replace(/\[\.\.\.[^\]]+\]/, "session").replace(/\[[^\]]+\]/g, "1");

describe("API access control", () => {
  const jars: Partial<Record<(typeof ROLES)[number], Jar>> = {};
  beforeAll(async () => {
    for (const role of ROLES) jars[role] = await signedIn(DEMO[role]);
  });

  it("knows every route handler and method under app/api", () => {
    const actual = Object.fromEntries(found.map((f) => [f.route, [...new Set(f.methods)].sort()]));
    const expected = Object.fromEntries(Object.entries(EXPECTED).map(([r, m]) => [r, Object.keys(m).sort()]));
    expect(actual).toEqual(expected);
  });

  for (const [route, methods] of Object.entries(EXPECTED)) {
    for (const [method, need] of Object.entries(methods)) {
      if (need === "public" || route.startsWith("/api/auth/")) continue;
      const path = concrete(route);
      it(`${method} ${route} refuses a visitor with 401`, async () => {
        const res = await call(path, { method, json: method === "GET" ? undefined : {} });
        expect(res.status).toBe(401);
        expect(await res.json()).toMatchObject({ error: { code: "unauthenticated" } });
      });
      for (const role of ROLES) {
        const allowed = ROLES.indexOf(role) >= ROLES.indexOf(need as (typeof ROLES)[number]);
        it(`${method} ${route} ${allowed ? "admits" : "refuses with 403"} a${role === "admin" || role === "editor" ? "n" : ""} ${role}`, async () => {
          const res = await call(path, { method, jar: jars[role], json: method === "GET" ? undefined : {} });
          if (allowed) expect([401, 403]).not.toContain(res.status);
          else {
            expect(res.status).toBe(403);
            expect(await res.json()).toMatchObject({ error: { code: "forbidden" } });
          }
        });
      }
    }
  }

  it("public routes answer a visitor without asking for a sign-in", async () => {
    for (const [route, methods] of Object.entries(EXPECTED)) {
      for (const [method, need] of Object.entries(methods)) {
        if (need !== "public" || route.startsWith("/api/auth/")) continue;
        const res = await call(concrete(route), { method, json: method === "GET" ? undefined : {} });
        expect([401, 403], `${method} ${route}`).not.toContain(res.status);
      }
    }
  });
});
