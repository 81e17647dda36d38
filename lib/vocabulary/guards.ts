import "server-only";
import { and, eq, max, ne } from "drizzle-orm";
import { db, type Executor, type Transaction } from "@/db/client";
import { aspects, aspectTerms, type AspectSection } from "@/db/schema";
import { AppError, NotFoundError, ValidationError } from "@/lib/errors";

/** A record that observations still name: removing it would leave them pointing at nothing. */
export class InUseError extends AppError {
  constructor(message: string, usage: number) {
    super(409, "in_use", message, { usage });
  }
}

export const observationsPhrase = (n: number) => `${n} observation${n === 1 ? "" : "s"}`;

// Two editors adding the same key at once both pass the check; the unique index then refuses the
// second with ER_DUP_ENTRY, which is the same mistake and gets the same answer.
function isDuplicateEntry(error: unknown): boolean {
  const e = error as { errno?: number; cause?: { errno?: number } } | null;
  return e?.errno === 1062 || e?.cause?.errno === 1062;
}

export async function inTransaction<T>(work: (tx: Transaction) => Promise<T>, duplicate: () => ValidationError): Promise<T> {
  try {
    return await db().transaction(work);
  } catch (error) {
    if (isDuplicateEntry(error)) throw duplicate();
    throw error;
  }
}

export async function lockAspect(tx: Executor, id: number) {
  const [row] = await tx.select().from(aspects).where(eq(aspects.id, id)).for("update");
  if (!row) throw new NotFoundError("aspect");
  return row;
}

export async function lockTerm(tx: Executor, id: number) {
  const [row] = await tx.select().from(aspectTerms).where(eq(aspectTerms.id, id)).for("update");
  if (!row) throw new NotFoundError("term");
  return row;
}

export async function refuseDuplicateAspectKey(tx: Executor, key: string) {
  const [same] = await tx.select({ id: aspects.id }).from(aspects).where(eq(aspects.key, key));
  if (same) throw duplicateAspectKey();
}

export const duplicateAspectKey = () =>
  new ValidationError("Another aspect has this key already.", { key: ["Another aspect has this key. Keys cannot be reused."] });

export const duplicateTermKey = () =>
  new ValidationError("Another term of this aspect has this key already.", { key: ["Another term of this aspect has this key."] });

// The label is what a contributor picks from: two alike in one list cannot be told apart. The
// column's collation compares without case or accents, so "Barre" meets "barré" too.
export async function refuseDuplicateTermLabel(tx: Executor, aspectId: number, label: string, exceptId?: number) {
  const where = [eq(aspectTerms.aspectId, aspectId), eq(aspectTerms.label, label)];
  if (exceptId !== undefined) where.push(ne(aspectTerms.id, exceptId));
  const [same] = await tx.select({ label: aspectTerms.label, deprecatedAt: aspectTerms.deprecatedAt }).from(aspectTerms).where(and(...where));
  if (!same) return;
  const hint = same.deprecatedAt ? ` A deprecated term is labelled "${same.label}": restore it instead.` : "";
  throw new ValidationError(`This aspect has a term labelled "${same.label}" already.${hint}`, {
    label: [`Another term of this aspect has this label.${hint}`],
  });
}

export async function nextAspectPosition(tx: Executor, section: AspectSection): Promise<number> {
  const [{ top }] = await tx.select({ top: max(aspects.position) }).from(aspects).where(eq(aspects.section, section));
  return (top ?? 0) + 1;
}

export async function nextTermPosition(tx: Executor, aspectId: number): Promise<number> {
  const [{ top }] = await tx.select({ top: max(aspectTerms.position) }).from(aspectTerms).where(eq(aspectTerms.aspectId, aspectId));
  return (top ?? 0) + 1;
}

/** A new order must name exactly the records there are now; otherwise someone changed the list. */
export function sameMembers(current: { id: number }[], proposed: { id: number }[]): boolean {
  if (current.length !== proposed.length) return false;
  const ids = new Set(current.map((r) => r.id));
  return proposed.every((r) => ids.delete(r.id)) && ids.size === 0;
}
