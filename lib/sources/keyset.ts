import "server-only";
import { sql, type AnyColumn, type SQL } from "drizzle-orm";
import { ValidationError } from "@/lib/errors";

// Keyset pagination over (sort column, id): every page is an index range scan, however deep, which
// keeps the sources table fast at 100,000 rows. MariaDB sorts NULL first ascending and last descending.
export type Cursor = [value: string | number | null, id: number];

export function encodeCursor(value: unknown, id: number): string {
  const v = value instanceof Date ? value.toISOString() : (value as string | number | null);
  return Buffer.from(JSON.stringify([v, id])).toString("base64url");
}

export function decodeCursor(cursor: string): Cursor {
  try {
    const parsed = JSON.parse(Buffer.from(cursor, "base64url").toString("utf8")) as unknown;
    if (Array.isArray(parsed) && parsed.length === 2 && Number.isInteger(parsed[1])) return parsed as Cursor;
  } catch {
    // fall through to the error below
  }
  throw new ValidationError("The page link is damaged; go back to the first page.", { after: ["Not a valid page cursor."] });
}

/** Rows strictly after the cursor in the order (column, id), ascending or descending. */
export function afterCursor(column: AnyColumn, idColumn: AnyColumn, [value, id]: Cursor, ascending: boolean, asDate = false): SQL {
  const v = value !== null && asDate ? new Date(value as string) : value;
  if (ascending) {
    if (v === null) return sql`((${column} IS NULL AND ${idColumn} > ${id}) OR ${column} IS NOT NULL)`;
    return sql`(${column} > ${v} OR (${column} = ${v} AND ${idColumn} > ${id}))`;
  }
  if (v === null) return sql`(${column} IS NULL AND ${idColumn} < ${id})`;
  return sql`(${column} < ${v} OR (${column} = ${v} AND ${idColumn} < ${id}) OR ${column} IS NULL)`;
}
