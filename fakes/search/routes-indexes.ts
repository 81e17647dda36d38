// Routes for indexes and settings. Reads answer at once; writes are validated
// synchronously (400s) and then enqueued as tasks (202) that run later.

import { bad, invalidType } from "./errors.js";
import { assertIndexUid, SearchIndex, type Engine } from "./engine.js";
import { isPlainObject } from "./fields.js";
import { accepted, jsonBody, ok, type Ctx, type Router } from "./router.js";
import { keyFromSlug, SETTINGS_KEYS, validateSetting, validateSettingsBody, type SettingsPatch } from "./settings.js";
import type { TaskQueue } from "./tasks.js";

export interface Deps {
  engine: Engine;
  queue: TaskQueue;
}

export function intParam(query: URLSearchParams, name: string, code: string, fallback: number): number {
  const v = query.get(name);
  if (v === null || v === "") return fallback;
  if (!/^\d+$/.test(v)) throw bad(code, `Invalid value in parameter \`${name}\`: could not parse \`${v}\` as a positive integer`);
  return Number(v);
}

/** Runs `fn` on the index, creating it if missing (registered only if `fn` succeeds), as document/settings writes do. */
export function withImplicitIndex<T>(engine: Engine, uid: string, fn: (index: SearchIndex) => T): T {
  const existing = engine.find(uid);
  const index = existing ?? new SearchIndex(uid);
  const out = fn(index);
  if (!existing) engine.indexes.set(uid, index);
  return out;
}

export function indexRoutes(r: Router, { engine, queue }: Deps): void {
  const uidOf = (ctx: Ctx): string => {
    const uid = ctx.params.uid!;
    assertIndexUid(uid);
    return uid;
  };

  r.add("GET", "/indexes", (ctx) => {
    const offset = intParam(ctx.query, "offset", "invalid_index_offset", 0);
    const limit = intParam(ctx.query, "limit", "invalid_index_limit", 20);
    const all = engine.list();
    return ok({ results: all.slice(offset, offset + limit).map((i) => i.meta()), offset, limit, total: all.length });
  });

  r.add("POST", "/indexes", (ctx) => {
    const body = jsonBody(ctx);
    if (!isPlainObject(body)) throw invalidType("bad_request", "", "an object", body);
    for (const k of Object.keys(body))
      if (k !== "uid" && k !== "primaryKey") throw bad("bad_request", `Unknown field \`${k}\`: expected one of \`uid\`, \`primaryKey\``);
    if (body.uid === undefined) throw bad("missing_index_uid", "Missing field `uid`");
    assertIndexUid(body.uid);
    const pk = body.primaryKey ?? null;
    if (pk !== null && typeof pk !== "string") throw invalidType("invalid_index_primary_key", ".primaryKey", "a string", pk);
    const uid = body.uid;
    return accepted(queue.enqueue("indexCreation", uid, { primaryKey: pk }, () => void engine.create(uid, pk)));
  });

  r.add("GET", "/indexes/:uid", (ctx) => ok(engine.get(ctx.params.uid!).meta()));

  r.add("PATCH", "/indexes/:uid", (ctx) => {
    const uid = uidOf(ctx);
    const body = jsonBody(ctx);
    if (!isPlainObject(body)) throw invalidType("bad_request", "", "an object", body);
    const pk = body.primaryKey ?? null;
    if (pk !== null && typeof pk !== "string") throw invalidType("invalid_index_primary_key", ".primaryKey", "a string", pk);
    return accepted(
      queue.enqueue("indexUpdate", uid, { primaryKey: pk }, () => {
        const index = engine.get(uid);
        if (pk === null || pk === index.primaryKey) return;
        if (index.docs.size > 0 && index.primaryKey)
          throw bad("index_primary_key_already_exists", `Index \`${uid}\`: Index already has a primary key: \`${index.primaryKey}\`.`);
        index.primaryKey = pk;
        index.updatedAt = new Date().toISOString();
      }),
    );
  });

  r.add("DELETE", "/indexes/:uid", (ctx) => {
    const uid = uidOf(ctx);
    return accepted(queue.enqueue("indexDeletion", uid, { deletedDocuments: null }, () => ({ deletedDocuments: engine.delete(uid) })));
  });

  r.add("GET", "/indexes/:uid/stats", (ctx) => {
    const index = engine.get(ctx.params.uid!);
    return ok(index.stats(queue.isIndexing(index.uid)));
  });

  r.add("POST", "/swap-indexes", (ctx) => {
    const body = jsonBody(ctx);
    if (!Array.isArray(body)) throw invalidType("bad_request", "", "an array", body);
    const swaps = body.map((s, i) => {
      if (!isPlainObject(s) || !Array.isArray(s.indexes) || s.indexes.length !== 2)
        throw bad("invalid_swap_indexes", `Invalid value at \`[${i}].indexes\`: two indexes must be given for each swap.`);
      s.indexes.forEach((u) => assertIndexUid(u));
      return { indexes: s.indexes as [string, string], rename: s.rename === true };
    });
    return accepted(
      queue.enqueue("indexSwap", null, { swaps }, () => {
        for (const { indexes: [a, b], rename } of swaps) {
          const ia = engine.get(a);
          if (rename) {
            if (engine.find(b)) throw bad("index_already_exists", `Index \`${b}\` already exists.`);
            engine.indexes.delete(a);
            ia.uid = b;
            engine.indexes.set(b, ia);
          } else {
            const ib = engine.get(b);
            ia.uid = b;
            ib.uid = a;
            engine.indexes.set(a, ib).set(b, ia);
          }
          for (const uid of [a, b]) {
            const moved = engine.find(uid);
            if (moved) moved.unsavedAll = true;
            queue.touch(uid);
          }
        }
      }),
    );
  });

  // Settings, all at once and one by one.
  const enqueueSettings = (uid: string, patch: SettingsPatch) =>
    accepted(queue.enqueue("settingsUpdate", uid, { ...patch }, () => withImplicitIndex(engine, uid, (index) => index.updateSettings(patch))));

  r.add("GET", "/indexes/:uid/settings", (ctx) => ok(engine.get(ctx.params.uid!).settings));
  r.add("PATCH", "/indexes/:uid/settings", (ctx) => enqueueSettings(uidOf(ctx), validateSettingsBody(jsonBody(ctx))));
  r.add("DELETE", "/indexes/:uid/settings", (ctx) =>
    enqueueSettings(uidOf(ctx), Object.fromEntries(SETTINGS_KEYS.map((k) => [k, null])) as SettingsPatch),
  );

  const settingKey = (ctx: Ctx) => {
    const key = keyFromSlug(ctx.params.setting!);
    if (!key) throw bad("not_found", `Unknown setting \`${ctx.params.setting}\`.`);
    return key;
  };
  r.add("GET", "/indexes/:uid/settings/:setting", (ctx) => ok(engine.get(ctx.params.uid!).settings[settingKey(ctx)]));
  const update = (ctx: Ctx) => {
    const key = settingKey(ctx);
    return enqueueSettings(uidOf(ctx), { [key]: validateSetting(key, jsonBody(ctx)) } as SettingsPatch);
  };
  r.add("PUT", "/indexes/:uid/settings/:setting", update);
  r.add("PATCH", "/indexes/:uid/settings/:setting", update);
  r.add("DELETE", "/indexes/:uid/settings/:setting", (ctx) => {
    const key = settingKey(ctx);
    return enqueueSettings(uidOf(ctx), { [key]: null } as SettingsPatch);
  });
}
