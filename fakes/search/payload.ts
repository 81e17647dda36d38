// Document payloads: JSON / NDJSON / CSV bodies, primary-key inference and
// document id rules, with the same error codes as Meilisearch.

import { bad, MeiliError } from "./errors.js";
import { isPlainObject, type Doc } from "./fields.js";

const ID_RE = /^[a-zA-Z0-9_-]{1,511}$/;

/** Parses a document addition body according to its content type. */
export function parseDocumentsBody(raw: string, contentType: string | undefined, csvDelimiter = ","): Doc[] {
  const type = (contentType ?? "application/json").split(";")[0]!.trim().toLowerCase();
  if (raw.trim() === "") throw bad("missing_payload", `A ${type === "text/csv" ? "csv" : type === "application/x-ndjson" ? "ndjson" : "json"} payload is missing.`);
  if (type === "application/json") {
    let parsed: unknown;
    try {
      parsed = JSON.parse(raw);
    } catch (err) {
      throw bad("malformed_payload", `The \`json\` payload provided is malformed. \`${(err as Error).message}\`.`);
    }
    const docs = Array.isArray(parsed) ? parsed : [parsed];
    docs.forEach((d, i) => {
      if (!isPlainObject(d)) throw bad("malformed_payload", `The \`json\` payload provided is malformed. \`Couldn't serialize document value: document at index ${i} is not an object\`.`);
    });
    return docs as Doc[];
  }
  if (type === "application/x-ndjson") {
    return raw
      .split(/\r?\n/)
      .filter((l) => l.trim() !== "")
      .map((line) => {
        try {
          const d: unknown = JSON.parse(line);
          if (isPlainObject(d)) return d;
        } catch {
          // fall through to the error below
        }
        throw bad("malformed_payload", `The \`ndjson\` payload provided is malformed. \`${line.slice(0, 80)}\`.`);
      });
  }
  if (type === "text/csv") return parseCsv(raw, csvDelimiter);
  throw new MeiliError(
    415,
    "invalid_content_type",
    `The Content-Type \`${type}\` is invalid. Accepted values for the Content-Type header are: \`application/json\`, \`application/x-ndjson\`, \`text/csv\``,
  );
}

/** CSV with RFC 4180 quoting; headers may carry a type, e.g. `year:number`. */
function parseCsv(raw: string, delimiter: string): Doc[] {
  const rows: string[][] = [];
  let row: string[] = [];
  let cell = "";
  let quoted = false;
  for (let i = 0; i < raw.length; i++) {
    const c = raw[i]!;
    if (quoted) {
      if (c === '"' && raw[i + 1] === '"') (cell += '"'), i++;
      else if (c === '"') quoted = false;
      else cell += c;
    } else if (c === '"') quoted = true;
    else if (c === delimiter) row.push(cell), (cell = "");
    else if (c === "\n" || c === "\r") {
      if (c === "\r" && raw[i + 1] === "\n") i++;
      row.push(cell), rows.push(row), (row = []), (cell = "");
    } else cell += c;
  }
  if (cell !== "" || row.length) row.push(cell), rows.push(row);
  const [header, ...lines] = rows.filter((r) => r.some((c) => c !== ""));
  if (!header) return [];
  const columns = header.map((h) => {
    const m = /^(.*):(string|number|boolean)$/.exec(h);
    return m ? { name: m[1]!, type: m[2]! } : { name: h, type: "string" };
  });
  return lines.map((cells) => {
    const doc: Doc = {};
    columns.forEach((col, i) => {
      const v = cells[i] ?? "";
      if (col.type === "number") doc[col.name] = v === "" ? null : Number(v);
      else if (col.type === "boolean") doc[col.name] = v === "" ? null : v === "true";
      else doc[col.name] = v;
    });
    return doc;
  });
}

/** Infers the primary key from the first document: the single field ending in "id". */
export function inferPrimaryKey(doc: Doc | undefined): string {
  const candidates = doc ? Object.keys(doc).filter((k) => k.toLowerCase().endsWith("id")) : [];
  if (candidates.length === 1) return candidates[0]!;
  if (candidates.length === 0)
    throw bad("index_primary_key_no_candidate_found", "The primary key inference failed as the engine did not find any field ending with `id` in its name. Please specify the primary key manually using the `primaryKey` query parameter.");
  throw bad(
    "index_primary_key_multiple_candidates_found",
    `The primary key inference failed as the engine found ${candidates.length} fields ending with \`id\` in their names: ${candidates.map((c) => `'${c}'`).join(" and ")}. Please specify the primary key manually using the \`primaryKey\` query parameter.`,
  );
}

/** The external id of a document as a string key, or a task error. */
export function documentId(doc: Doc, primaryKey: string): string {
  if (!Object.hasOwn(doc, primaryKey))
    throw bad("missing_document_id", `Document doesn't have a \`${primaryKey}\` attribute: \`${JSON.stringify(doc).slice(0, 500)}\`.`);
  const id = doc[primaryKey];
  return validateId(id);
}

export function validateId(id: unknown): string {
  const ok = (typeof id === "number" && Number.isSafeInteger(id) && id >= 0) || (typeof id === "string" && ID_RE.test(id));
  if (!ok)
    throw bad(
      "invalid_document_id",
      `Document identifier \`${JSON.stringify(id)}\` is invalid. A document identifier can be of type integer or string, only composed of alphanumeric characters (a-z A-Z 0-9), hyphens (-) and underscores (_), and can not be more than 511 bytes.`,
    );
  return String(id);
}
