// Document routes: fetch (GET / POST fetch / by id), add-or-replace, add-or-update,
// and the four kinds of deletion. Writes become tasks.

import { bad, documentNotFound, invalidType } from "./errors.js";
import { assertIndexUid } from "./engine.js";
import { isPlainObject } from "./fields.js";
import { FilterSyntaxError, parseFilter } from "./filter.js";
import { parseDocumentsBody, validateId } from "./payload.js";
import { accepted, jsonBody, ok, type Ctx, type Router } from "./router.js";
import { intParam, withImplicitIndex, type Deps } from "./routes-indexes.js";

const list = (v: string | null) => (v === null ? undefined : v.split(",").map((s) => s.trim()).filter(Boolean));

/** Syntax-checks a filter at enqueue time, as Meilisearch does (filterability is checked by the task). */
function checkFilterSyntax(filter: unknown, code: string): void {
  try {
    parseFilter(filter as string | unknown[]);
  } catch (err) {
    if (err instanceof FilterSyntaxError) throw bad(code, err.message);
    throw err;
  }
}

export function documentRoutes(r: Router, { engine, queue }: Deps): void {
  const uidOf = (ctx: Ctx): string => {
    const uid = ctx.params.uid!;
    assertIndexUid(uid);
    return uid;
  };

  r.add("GET", "/indexes/:uid/documents", (ctx) => {
    const index = engine.get(ctx.params.uid!);
    return ok(
      index.browse({
        offset: intParam(ctx.query, "offset", "invalid_document_offset", 0),
        limit: intParam(ctx.query, "limit", "invalid_document_limit", 20),
        fields: list(ctx.query.get("fields")),
        filter: ctx.query.get("filter") ?? undefined,
        ids: list(ctx.query.get("ids")),
      }),
    );
  });

  r.add("POST", "/indexes/:uid/documents/fetch", (ctx) => {
    const index = engine.get(ctx.params.uid!);
    const body = jsonBody(ctx, true) ?? {};
    if (!isPlainObject(body)) throw invalidType("bad_request", "", "an object", body);
    for (const k of ["offset", "limit"] as const) {
      const v = body[k];
      if (v !== undefined && (typeof v !== "number" || !Number.isInteger(v) || v < 0)) throw invalidType(`invalid_document_${k}`, `.${k}`, "a positive integer", v);
    }
    if (body.fields != null && !Array.isArray(body.fields)) throw invalidType("invalid_document_fields", ".fields", "an array", body.fields);
    if (body.ids != null && !Array.isArray(body.ids)) throw invalidType("invalid_document_ids", ".ids", "an array", body.ids);
    return ok(
      index.browse({
        offset: body.offset as number | undefined,
        limit: body.limit as number | undefined,
        fields: body.fields as string[] | undefined,
        filter: (body.filter ?? undefined) as string | unknown[] | undefined,
        ids: (body.ids as unknown[] | undefined)?.map(String),
      }),
    );
  });

  r.add("GET", "/indexes/:uid/documents/:id", (ctx) => {
    const index = engine.get(ctx.params.uid!);
    const doc = index.docs.get(ctx.params.id!);
    if (!doc) throw documentNotFound(ctx.params.id!);
    return ok(index.display(doc, list(ctx.query.get("fields"))));
  });

  const addDocuments = (replace: boolean) => (ctx: Ctx) => {
    const uid = uidOf(ctx);
    const docs = parseDocumentsBody(ctx.raw, ctx.contentType, ctx.query.get("csvDelimiter") ?? ",");
    const primaryKey = ctx.query.get("primaryKey");
    const skipCreation = ctx.query.get("skipCreation") === "true";
    return accepted(
      queue.enqueue("documentAdditionOrUpdate", uid, { receivedDocuments: docs.length, indexedDocuments: null }, () => ({
        indexedDocuments: withImplicitIndex(engine, uid, (index) => index.addDocuments(docs, { replace, primaryKey, skipCreation })),
      })),
    );
  };
  r.add("POST", "/indexes/:uid/documents", addDocuments(true));
  r.add("PUT", "/indexes/:uid/documents", addDocuments(false));

  const deletion = (uid: string, details: Record<string, unknown>, run: () => number) =>
    accepted(queue.enqueue("documentDeletion", uid, { ...details, deletedDocuments: null }, () => ({ deletedDocuments: run() })));

  r.add("DELETE", "/indexes/:uid/documents/:id", (ctx) => {
    const uid = uidOf(ctx);
    const id = ctx.params.id!;
    return deletion(uid, { providedIds: 1, originalFilter: null }, () => engine.get(uid).deleteIds([id]));
  });

  r.add("POST", "/indexes/:uid/documents/delete-batch", (ctx) => {
    const uid = uidOf(ctx);
    const body = jsonBody(ctx);
    if (!Array.isArray(body)) throw invalidType("bad_request", "", "an array", body);
    const ids = body.map((id) => (typeof id === "string" ? id : validateId(id)));
    return deletion(uid, { providedIds: ids.length, originalFilter: null }, () => engine.get(uid).deleteIds(ids));
  });

  r.add("POST", "/indexes/:uid/documents/delete", (ctx) => {
    const uid = uidOf(ctx);
    const body = jsonBody(ctx);
    if (!isPlainObject(body)) throw invalidType("bad_request", "", "an object", body);
    if (body.filter === undefined || body.filter === null) throw bad("missing_document_filter", "Missing field `filter`");
    checkFilterSyntax(body.filter, "invalid_document_filter");
    const filter = body.filter;
    return deletion(uid, { providedIds: 0, originalFilter: JSON.stringify(filter) }, () => {
      const index = engine.get(uid);
      return index.deleteWhere(index.compileFilter(filter, "invalid_document_filter"));
    });
  });

  r.add("DELETE", "/indexes/:uid/documents", (ctx) => {
    const uid = uidOf(ctx);
    return deletion(uid, { providedIds: 0, originalFilter: null }, () => engine.get(uid).clear());
  });
}
