// Minimal router for the fake: "/indexes/:uid/documents/:id" style patterns,
// JSON body helpers, and the request context handed to route handlers.

import { bad, MeiliError } from "./errors.js";

export interface Ctx {
  method: string;
  params: Record<string, string>;
  query: URLSearchParams;
  raw: string;
  contentType: string | undefined;
  /** Index uids a tenant token may search, with their extra filter (null = full access). */
  searchRules: Map<string, unknown> | null;
}

export interface Reply {
  status: number;
  body?: unknown;
}

export type Handler = (ctx: Ctx) => Reply | Promise<Reply>;

/** What a route needs from an API key: `search` routes accept search keys and tenant tokens. */
export type Access = "search" | "admin" | "keys" | "public";

interface Route {
  method: string;
  segments: string[];
  handler: Handler;
  access: Access;
}

export const ok = (body: unknown): Reply => ({ status: 200, body });
export const accepted = (body: unknown): Reply => ({ status: 202, body });

/** The JSON body; Meilisearch's `missing_payload` / `malformed_payload` errors otherwise. */
export function jsonBody(ctx: Ctx, optional = false): unknown {
  if (ctx.raw.trim() === "") {
    if (optional) return undefined;
    throw bad("missing_payload", "A json payload is missing.");
  }
  const type = ctx.contentType?.split(";")[0]?.trim().toLowerCase();
  if (type && type !== "application/json")
    throw new MeiliError(415, "invalid_content_type", `The Content-Type \`${type}\` is invalid. Accepted values for the Content-Type header are: \`application/json\``);
  try {
    return JSON.parse(ctx.raw) as unknown;
  } catch (err) {
    throw bad("malformed_payload", `The json payload provided is malformed. \`${(err as Error).message}\`.`);
  }
}

export class Router {
  private readonly routes: Route[] = [];

  add(method: string, pattern: string, handler: Handler, access: Access = "admin"): this {
    this.routes.push({ method, segments: pattern.split("/").filter(Boolean), handler, access });
    return this;
  }

  match(method: string, pathname: string): { handler: Handler; params: Record<string, string>; access: Access } {
    let segs: string[];
    try {
      segs = pathname.split("/").filter(Boolean).map(decodeURIComponent);
    } catch {
      segs = pathname.split("/").filter(Boolean);
    }
    let pathMatched = false;
    for (const route of this.routes) {
      if (route.segments.length !== segs.length) continue;
      const params: Record<string, string> = {};
      const hit = route.segments.every((s, i) => (s.startsWith(":") ? ((params[s.slice(1)] = segs[i]!), true) : s === segs[i]));
      if (!hit) continue;
      pathMatched = true;
      if (route.method === method) return { handler: route.handler, params, access: route.access };
    }
    if (pathMatched) throw new MeiliError(405, "method_not_allowed", `Method \`${method}\` is not allowed on \`${pathname}\`.`);
    throw new MeiliError(404, "not_found", `Route \`${method} ${pathname}\` does not exist in the search fake.`);
  }
}
