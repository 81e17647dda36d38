// API keys: with a master key set, the fake derives the real server's default
// keys (search / admin), checks the bearer of every request, and accepts tenant
// tokens (JWT signed with a search key, carrying searchRules) on search routes.

import { createHash, createHmac, timingSafeEqual } from "node:crypto";
import { MeiliError } from "./errors.js";
import { isPlainObject } from "./fields.js";
import { ok, type Access, type Router } from "./router.js";

export interface ApiKey {
  name: string;
  description: string;
  key: string;
  uid: string;
  actions: string[];
  indexes: string[];
  expiresAt: null;
  createdAt: string;
  updatedAt: string;
}

const invalidKey = () => new MeiliError(403, "invalid_api_key", "The provided API key is invalid.", "auth");

/** A stable v4-shaped UUID from a seed, so default keys survive restarts. */
function seededUuid(seed: string): string {
  const h = createHash("sha256").update(seed).digest("hex").split("");
  h[12] = "4";
  h[16] = "89ab"[parseInt(h[16]!, 16) % 4]!;
  const s = h.join("");
  return `${s.slice(0, 8)}-${s.slice(8, 12)}-${s.slice(12, 16)}-${s.slice(16, 20)}-${s.slice(20, 32)}`;
}

export class KeyStore {
  readonly keys: ApiKey[] = [];

  constructor(private readonly masterKey: string | undefined) {
    if (!masterKey) return;
    const make = (name: string, description: string, actions: string[]): ApiKey => {
      const uid = seededUuid(`${masterKey}:${name}`);
      const key = createHmac("sha256", masterKey).update(uid).digest("hex");
      const at = "2025-01-01T00:00:00Z";
      return { name, description, key, uid, actions, indexes: ["*"], expiresAt: null, createdAt: at, updatedAt: at };
    };
    this.keys.push(
      make("Default Search API Key", "Use it to search from the frontend", ["search"]),
      make("Default Admin API Key", "Use it for anything that is not a search operation. Caution! Do not expose it on a public frontend", ["*"]),
    );
  }

  /** Checks the Authorization header; returns the tenant token's search rules, if any. */
  authorize(header: string | undefined, access: Access): Map<string, unknown> | null {
    if (!this.masterKey || access === "public") return null;
    if (!header)
      throw new MeiliError(401, "missing_authorization_header", "The Authorization header is missing. It must use the bearer authorization method.", "auth");
    const m = /^Bearer\s+(.+)$/i.exec(header.trim());
    if (!m) throw invalidKey();
    const token = m[1]!.trim();
    if (token === this.masterKey) return null;
    const key = this.keys.find((k) => k.key === token);
    if (key) {
      if (access === "keys" || (!key.actions.includes("*") && !(access === "search" && key.actions.includes("search")))) throw invalidKey();
      return null;
    }
    if (access !== "search") throw invalidKey();
    return this.tenantRules(token);
  }

  private tenantRules(token: string): Map<string, unknown> {
    const parts = token.split(".");
    if (parts.length !== 3) throw invalidKey();
    const [h, p, sig] = parts as [string, string, string];
    let header: unknown;
    let payload: unknown;
    try {
      header = JSON.parse(Buffer.from(h, "base64url").toString("utf8"));
      payload = JSON.parse(Buffer.from(p, "base64url").toString("utf8"));
    } catch {
      throw invalidKey();
    }
    if (!isPlainObject(header) || !isPlainObject(payload)) throw invalidKey();
    const alg = ({ HS256: "sha256", HS384: "sha384", HS512: "sha512" } as Record<string, string>)[String(header.alg)];
    const key = this.keys.find((k) => k.uid === payload.apiKeyUid && (k.actions.includes("search") || k.actions.includes("*")));
    if (!alg || !key) throw invalidKey();
    const expected = createHmac(alg, key.key).update(`${h}.${p}`).digest();
    const given = Buffer.from(sig, "base64url");
    if (given.length !== expected.length || !timingSafeEqual(given, expected)) throw invalidKey();
    if (typeof payload.exp === "number" && payload.exp * 1000 < Date.now()) throw invalidKey();
    const rules = payload.searchRules;
    if (Array.isArray(rules)) return new Map(rules.map((uid) => [String(uid), null]));
    if (isPlainObject(rules)) return new Map(Object.entries(rules));
    throw invalidKey();
  }
}

export function keyRoutes(r: Router, keys: KeyStore): void {
  r.add("GET", "/keys", (ctx) => {
    const offset = Number(ctx.query.get("offset") ?? 0);
    const limit = Number(ctx.query.get("limit") ?? 20);
    return ok({ results: keys.keys.slice(offset, offset + limit), offset, limit, total: keys.keys.length });
  }, "keys");
  r.add("GET", "/keys/:key", (ctx) => {
    const key = keys.keys.find((k) => k.key === ctx.params.key || k.uid === ctx.params.key);
    if (!key) throw new MeiliError(404, "api_key_not_found", `API key \`${ctx.params.key}\` not found.`);
    return ok(key);
  }, "keys");
}
