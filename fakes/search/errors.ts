// Error shape and codes of the Meilisearch HTTP API, so clients can branch on `code`.

export type ErrorType = "invalid_request" | "internal" | "auth" | "system";

export interface ErrorBody {
  message: string;
  code: string;
  type: ErrorType;
  link: string;
}

export class MeiliError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly type: ErrorType = "invalid_request",
  ) {
    super(message);
    this.name = "MeiliError";
  }

  toJSON(): ErrorBody {
    return {
      message: this.message,
      code: this.code,
      type: this.type,
      link: `https://docs.meilisearch.com/errors#${this.code}`,
    };
  }
}

export const bad = (code: string, message: string): MeiliError => new MeiliError(400, code, message);

export const indexNotFound = (uid: string): MeiliError =>
  new MeiliError(404, "index_not_found", `Index \`${uid}\` not found.`);

export const indexAlreadyExists = (uid: string): MeiliError =>
  new MeiliError(409, "index_already_exists", `Index \`${uid}\` already exists.`);

export const documentNotFound = (id: string): MeiliError =>
  new MeiliError(404, "document_not_found", `Document \`${id}\` not found.`);

export const invalidIndexUid = (uid: unknown): MeiliError =>
  bad(
    "invalid_index_uid",
    `\`${String(uid)}\` is not a valid index uid. Index uid can be an integer or a string containing only alphanumeric characters, hyphens (-) and underscores (_), and can not be more than 512 bytes.`,
  );

/** Turns anything thrown into a MeiliError; unknown failures become `internal` 500s. */
export function asMeiliError(err: unknown): MeiliError {
  if (err instanceof MeiliError) return err;
  const message = err instanceof Error ? err.message : String(err);
  return new MeiliError(500, "internal", message, "internal");
}

/** Describes a JSON value the way Meilisearch's deserializer errors do. */
export function describeJson(value: unknown): string {
  if (value === null) return "null";
  if (Array.isArray(value)) return "an array";
  if (typeof value === "object") return "an object";
  if (typeof value === "string") return "a string";
  if (typeof value === "number") return !Number.isInteger(value) ? "a number" : value < 0 ? "a negative integer" : "a positive integer";
  return `a ${typeof value}`;
}

export function invalidType(code: string, path: string, expected: string, value: unknown): MeiliError {
  return bad(
    code,
    `Invalid value type at \`${path}\`: expected ${expected}, but found ${describeJson(value)}: \`${JSON.stringify(value)}\``,
  );
}
