// The review pages read the desk's filters from their address; this turns Next's searchParams into them.
import { deskQuerySchema, type DeskQuery } from "@/lib/review/desk-schema";

export type SearchParams = Promise<Record<string, string | string[] | undefined>>;

export async function readDeskParams(searchParams: SearchParams): Promise<{ query: DeskQuery; problem: string | null }> {
  const raw = Object.fromEntries(Object.entries(await searchParams).map(([k, v]) => [k, Array.isArray(v) ? v[0] : v]));
  const parsed = deskQuerySchema.safeParse(raw);
  if (parsed.success) return { query: parsed.data, problem: null };
  return { query: deskQuerySchema.parse({}), problem: parsed.error.issues[0]?.message ?? "The filters in the address are not valid." };
}
