import "server-only";
import { and, asc, desc, eq, isNull, like, ne, type SQL } from "drizzle-orm";
import { db, type Executor } from "@/db/client";
import { places } from "@/db/schema";
import { authorize, type Actor } from "@/lib/auth/policy";
import { countryName } from "@/lib/catalogue/countries";
import { escapeLike } from "@/lib/db-like";
import { foldName } from "./fold";
import type { PlaceRecord, PlaceSuggestion } from "./schemas";

export type { PlaceRecord, PlaceSuggestion } from "./schemas";
/** Kept for callers written before PlaceRecord existed. */
export type PlaceSummary = PlaceRecord;

/** The columns a place needs wherever it is shown beside something else (a source, a suggestion). */
export const suggestionColumns = {
  id: places.id,
  kind: places.kind,
  name: places.name,
  countryCode: places.countryCode,
  subdivisionCode: places.subdivisionCode,
  latitude: places.latitude,
  longitude: places.longitude,
};

export const placeColumns = {
  ...suggestionColumns,
  altName: places.altName,
  population: places.population,
  description: places.description,
  version: places.version,
};

type SuggestionRow = Omit<PlaceSuggestion, "country">;
type RecordRow = Omit<PlaceRecord, "country">;

function withCountry<T extends SuggestionRow>(row: T): T & { country: string | null } {
  return { ...row, country: countryName(row.countryCode) };
}


/**
 * Type-ahead: names starting with what was typed (folded), historical areas first, then cities by
 * population. Two small queries, each a range scan on an index that starts with the folded name, so
 * the gazetteer is never read in bulk.
 */
export async function suggestPlaces(
  actor: Actor | null,
  typed: string,
  opts: { country?: string; kind?: "city" | "area"; limit?: number } = {},
): Promise<PlaceSuggestion[]> {
  authorize(actor, "archive.read");
  const folded = foldName(typed);
  if (!folded) return [];
  const limit = opts.limit ?? 10;
  const filter = (kind: "city" | "area") => {
    const where: SQL[] = [eq(places.kind, kind), like(places.foldedName, `${escapeLike(folded)}%`)];
    if (opts.country) where.push(eq(places.countryCode, opts.country));
    return and(...where);
  };
  const areas =
    opts.kind === "city"
      ? []
      : await db().select(suggestionColumns).from(places).where(filter("area")).orderBy(asc(places.foldedName)).limit(limit);
  const room = limit - areas.length;
  const cities =
    opts.kind === "area" || room <= 0
      ? []
      : await db()
          .select(suggestionColumns)
          .from(places)
          .where(filter("city"))
          .orderBy(desc(places.population), asc(places.foldedName))
          .limit(room);
  return [...areas, ...cities].map((row) => withCountry(row as SuggestionRow));
}

/** One place, city or area, or null. Reading places is open to everyone, as the archive is. */
export async function getPlace(id: number, tx: Executor = db()): Promise<PlaceRecord | null> {
  const [row] = await tx.select(placeColumns).from(places).where(eq(places.id, id)).limit(1);
  return row ? withCountry(row as RecordRow) : null;
}

/** Every historical area, by name: there are a few dozen at most, unlike the gazetteer's cities. */
export async function listAreas(actor: Actor | null): Promise<PlaceRecord[]> {
  authorize(actor, "archive.read");
  const rows = await db().select(placeColumns).from(places).where(eq(places.kind, "area")).orderBy(asc(places.name)).limit(1000);
  return rows.map((row) => withCountry(row as RecordRow));
}

/**
 * The area already using this name in this country (folded, so "Naples" and "naples" clash), if any.
 * Locks the matching index range, so two editors cannot both create the same area at once.
 */
export async function findAreaNamed(tx: Executor, name: string, countryCode: string | null, exceptId?: number) {
  const where: SQL[] = [
    eq(places.kind, "area"),
    eq(places.foldedName, foldName(name).slice(0, 200)),
    countryCode ? eq(places.countryCode, countryCode) : isNull(places.countryCode),
  ];
  if (exceptId) where.push(ne(places.id, exceptId));
  const [row] = await tx.select({ id: places.id }).from(places).where(and(...where)).limit(1).for("update");
  return row ?? null;
}
