import "server-only";
// The CSV import of sources: a preview that reports on every row, and a commit that recomputes the
// report on the server and saves every row in one transaction, or none.
import type { NextRequest } from "next/server";
import { z } from "zod";
import { db } from "@/db/client";
import { authorize, type Actor } from "@/lib/auth/policy";
import { AppError, ValidationError } from "@/lib/errors";
import { IMPORT_LIMITS } from "./import-csv";
import { buildReport } from "./import-report";
import { COLUMN_OF_FIELD, summarise, type ImportReport, type ImportResult, type ImportRow } from "./import-types";
import { insertSource } from "./mutations";

/** A refused commit: 400 like any bad input, carrying the row report beside the message. */
export class ImportRefusedError extends AppError {
  constructor(message: string, report: ImportReport) {
    super(400, "invalid_input", message, { fields: {}, ...report });
  }
}

export const importRequestSchema = z.object({
  csv: z.string({ error: "Send the file's text as csv." }),
  allowDuplicates: z.boolean({ error: "allowDuplicates is true or false." }).default(false),
});
export type ImportRequest = z.output<typeof importRequestSchema>;

// JSON escaping can double a CSV's size (quotes and line breaks); anything beyond that is refused
// before it is read whole.
const BODY_LIMIT = IMPORT_LIMITS.bytes * 2 + 64 * 1024;
const tooLarge = () => new ValidationError("The file is larger than 2 MB; one import takes at most 2 MB. Split it into smaller files.", { csv: ["At most 2 MB."] });

export async function readImportRequest(req: NextRequest): Promise<ImportRequest> {
  if (Number(req.headers.get("content-length") ?? 0) > BODY_LIMIT) throw tooLarge();
  const chunks: Uint8Array[] = [];
  let size = 0;
  if (req.body) {
    const reader = req.body.getReader();
    for (;;) {
      const { done, value } = await reader.read();
      if (done) break;
      size += value.length;
      if (size > BODY_LIMIT) {
        await reader.cancel();
        throw tooLarge();
      }
      chunks.push(value);
    }
  }
  let body: unknown;
  try {
    body = JSON.parse(Buffer.concat(chunks).toString("utf8"));
  } catch {
    throw new ValidationError("The request body is not valid JSON.");
  }
  return importRequestSchema.parse(body);
}

export async function previewImport(actor: Actor | null, csv: string): Promise<ImportReport> {
  authorize(actor, "source.create");
  return (await buildReport(db(), actor!, csv)).report;
}

function refusal(report: ImportReport, allowDuplicates: boolean): string | null {
  const { errors, duplicates } = report.summary;
  const first = report.rows.find((r) => r.status === "error");
  if (first) {
    const [column, messages] = Object.entries(first.errors)[0];
    const where = column === "row" ? "" : `, ${column}`;
    return `Nothing was imported: ${errors} row${errors === 1 ? " has" : "s have"} errors. The first is line ${first.line}${where}: ${messages[0]}`;
  }
  if (duplicates && !allowDuplicates) {
    const dup = report.rows.find((r) => r.status === "duplicate")!;
    return `Nothing was imported: ${duplicates} row${duplicates === 1 ? " is" : "s are"} possible duplicates, the first on line ${dup.line}. Import them anyway only if they are different works.`;
  }
  return null;
}

/** Every row or none: any refusal, even from the database, rolls the whole file back. */
export async function commitImport(actor: Actor | null, { csv, allowDuplicates }: ImportRequest): Promise<ImportResult> {
  authorize(actor, "source.create");
  return db().transaction(async (tx) => {
    const { report, fields } = await buildReport(tx, actor!, csv, { lock: true });
    const refused = refusal(report, allowDuplicates);
    if (refused) throw new ImportRefusedError(refused, report);
    const ids: number[] = [];
    for (const [i, row] of report.rows.entries()) {
      try {
        ids.push((await insertSource(tx, actor!, fields[i]!, "source.imported")).id);
      } catch (error) {
        if (!(error instanceof ValidationError)) throw error;
        markRefused(row, error);
        report.summary = summarise(report.rows);
        throw new ImportRefusedError(`Nothing was imported: line ${row.line} was refused. ${error.message}`, report);
      }
    }
    return { imported: ids.length, ids };
  });
}

function markRefused(row: ImportRow, error: ValidationError) {
  row.status = "error";
  const fields = (error.details?.fields ?? {}) as Record<string, string[]>;
  if (!Object.keys(fields).length) row.errors.row = [error.message];
  for (const [field, messages] of Object.entries(fields)) {
    row.errors[COLUMN_OF_FIELD[field as keyof typeof COLUMN_OF_FIELD] ?? field] = messages;
  }
}
