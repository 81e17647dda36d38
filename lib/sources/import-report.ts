import "server-only";
// One report for a whole CSV file: every row mapped, matched against the database, validated with
// sourceFieldsSchema and checked for duplicates. The preview shows it; the commit recomputes it.
import type { Executor } from "@/db/client";
import { type Actor } from "@/lib/auth/policy";
import { countryCodeSchema } from "@/lib/catalogue/countries";
import { datingMargins } from "@/lib/config";
import { readDating } from "@/lib/dating";
import { ValidationError } from "@/lib/errors";
import { readImportCsv, type CsvRow } from "./import-csv";
import { addError, issuesByColumn, mapCells, type FieldErrors } from "./import-fields";
import { accessionKey, collectionKey, findCatalogued, findCollections, findPlaces, placeKey, type PlaceCandidate } from "./import-lookups";
import { summarise, type ImportReport, type ImportRow } from "./import-types";
import { sourceFieldsSchema, type SourceFields, type SourceFieldsInput } from "./schemas";
import { canSeeSource } from "./visibility";

type Draft = {
  row: CsvRow;
  input: SourceFieldsInput;
  errors: FieldErrors;
  warnings: string[];
  place: { name: string; country: string | null } | null;
  matched: ImportRow["matched"];
};

const placeInWords = (p: PlaceCandidate) =>
  `${p.name}${p.countryCode ? ` (${p.countryCode})` : ""}${p.kind === "city" ? `, population ${p.population.toLocaleString("en")}` : ", a historical area"}`;

function draftOf(row: CsvRow): Draft {
  const { input, errors } = mapCells(row.cells);
  row.problems.forEach((p) => addError(errors, "row", p));
  const warnings: string[] = [];
  const placeName = (row.cells.place ?? "").trim();
  const rawCountry = (row.cells.country ?? "").trim();
  let country: string | null = null;
  if (rawCountry) {
    const code = countryCodeSchema.safeParse(rawCountry);
    if (code.success) country = code.data;
    else addError(errors, "country", `"${rawCountry}" is not a country code. ${code.error.issues[0].message}`);
  }
  if (rawCountry && !placeName) warnings.push("country: used only to find the place; with no place given it is not saved.");
  const place = placeName && !errors.country ? { name: placeName, country } : null;
  return { row, input, errors, warnings, place, matched: { collection: null, place: null } };
}

async function matchCollections(tx: Executor, drafts: Draft[]) {
  const found = await findCollections(tx, drafts.map((d) => d.row.cells.collection ?? ""));
  for (const d of drafts) {
    const name = (d.row.cells.collection ?? "").trim();
    if (!name) continue;
    const match = found.get(collectionKey(name));
    if (!match) {
      addError(d.errors, "collection", `No collection is called "${name}". Give the exact name of a collection already in Cordarium, or leave the cell empty.`);
      continue;
    }
    d.input.collectionId = match.id;
    d.matched.collection = match.name;
    if (match.others) d.warnings.push(`collection: ${match.others + 1} collections are called "${match.name}"; chose the oldest (#${match.id}).`);
  }
}

async function matchPlaces(tx: Executor, drafts: Draft[]) {
  const asked = drafts.flatMap((d) => (d.place ? [d.place] : []));
  const found = await findPlaces(tx, asked);
  for (const d of drafts) {
    if (!d.place) continue;
    const { name, country } = d.place;
    const [best, ...rest] = found.get(placeKey(name, country)) ?? [];
    if (!best) {
      addError(d.errors, "place", `The gazetteer has no place called "${name}"${country ? ` in ${country}` : ""}. Check the spelling (the local name often works), ${country ? "and the country code" : "or add a country code"}.`);
      continue;
    }
    d.input.placeId = best.id;
    d.matched.place = `${best.name}${best.countryCode ? ` (${best.countryCode})` : ""}`;
    // Ambiguity is common ("Sevilla" is in Spain and in Colombia) and the most populous is usually meant.
    if (rest.length) {
      d.warnings.push(`place: ${rest.length + 1} places are called "${name}"${country ? ` in ${country}` : ""}; chose the most populous, ${placeInWords(best)}.${country ? "" : " Give the country to be sure."}`);
    }
  }
}

async function markDuplicates(tx: Executor, actor: Actor, drafts: Draft[], rows: ImportRow[], lock: boolean) {
  const keyed = drafts.map((d) => {
    const accession = typeof d.input.accessionNumber === "string" ? d.input.accessionNumber.trim() : "";
    const collectionId = typeof d.input.collectionId === "number" ? d.input.collectionId : null;
    return collectionId && accession ? { collectionId, accession, key: accessionKey(collectionId, accession) } : null;
  });
  const lines = new Map<string, number[]>();
  keyed.forEach((k, i) => k && (lines.get(k.key) ?? lines.set(k.key, []).get(k.key)!).push(drafts[i].row.line));
  const stored = await findCatalogued(tx, keyed.filter((k) => k !== null), lock);
  keyed.forEach((k, i) => {
    if (!k) return;
    const row = rows[i];
    const existing = stored.get(k.key);
    if (existing) {
      const visible = canSeeSource(actor, existing);
      row.duplicateOf = { sourceId: existing.id, title: visible ? existing.title : null };
      row.warnings.push(`duplicate: this collection and accession number are catalogued already as source #${existing.id}${visible ? `, "${existing.title}"` : " (a draft you cannot see)"}.`);
    }
    const others = lines.get(k.key)!.filter((l) => l !== row.line);
    if (others.length) {
      row.duplicateOf ??= { line: others[0] };
      row.warnings.push(`duplicate: the same collection and accession number as line${others.length > 1 ? "s" : ""} ${others.join(", ")}.`);
    }
    if (row.status === "ok" && row.duplicateOf) row.status = "duplicate";
  });
}

/** The report, and for each row its validated fields (null where the row has errors). */
export async function buildReport(tx: Executor, actor: Actor, csv: string, opts: { lock?: boolean } = {}): Promise<{ report: ImportReport; fields: (SourceFields | null)[] }> {
  const reading = readImportCsv(csv);
  if (!reading.ok) throw new ValidationError(reading.message, reading.fields);
  const drafts = reading.rows.map(draftOf);
  await matchCollections(tx, drafts);
  await matchPlaces(tx, drafts);
  const margins = datingMargins();
  const fields: (SourceFields | null)[] = [];
  const rows = drafts.map((d): ImportRow => {
    const parsed = sourceFieldsSchema.safeParse(d.input);
    if (!parsed.success) issuesByColumn(parsed.error, d.errors);
    const ok = parsed.success && Object.keys(d.errors).length === 0;
    fields.push(ok ? parsed.data : null);
    // The reading is shown even when another column of the row is wrong.
    const edtf = typeof d.input.datingEdtf === "string" ? d.input.datingEdtf.trim() : "";
    const reading = edtf && !d.errors.dating ? readDating(edtf, margins) : null;
    return {
      line: d.row.line,
      values: (parsed.success ? parsed.data : d.input) as Record<string, unknown>,
      status: ok ? "ok" : "error",
      errors: d.errors,
      warnings: d.warnings,
      dating: reading?.ok ? { words: reading.words, earliest: reading.earliest, latest: reading.latest } : null,
      matched: d.matched,
      duplicateOf: null,
    };
  });
  await markDuplicates(tx, actor, drafts, rows, opts.lock ?? false);
  return { report: { rows, summary: summarise(rows) }, fields };
}
