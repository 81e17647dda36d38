// 100,000 invented region documents for the search bench, built with the app's own document builder
// (lib/search/documents.ts) so their shape is the index's. Region ids start at BENCH_FIRST_ID, far
// above any real one, so the bench can delete exactly what it added. Deterministic (seeded).
import { regionDocuments, type RegionDocument, type RegionFacts } from "../../../lib/search/documents";

export const BENCH_FIRST_ID = 1_900_000_000;

const TECHNIQUES = ["strumming", "plucking", "both", "unclear"];
const INSTRUMENTS = ["five_course_guitar", "four_course_guitar", "vihuela", "lute", "cittern", "theorbo"];
const PLACES: [number, string, string, number, number][] = [
  [1, "Sevilla", "ES", 37.38, -5.97],
  [2, "Madrid", "ES", 40.42, -3.7],
  [3, "Naples", "IT", 40.85, 14.27],
  [4, "Venezia", "IT", 45.44, 12.33],
  [5, "Paris", "FR", 48.85, 2.35],
  [6, "Antwerpen", "BE", 51.22, 4.4],
  [7, "Lisboa", "PT", 38.72, -9.14],
  [8, "London", "GB", 51.51, -0.13],
];
const WORDS = ["guitarist", "tavern", "serenade", "portrait", "allegory", "concert", "shepherd", "lady", "soldier", "music lesson"];

function random(seed: number) {
  let s = seed >>> 0;
  return () => ((s = (Math.imul(s ^ (s >>> 15), 2246822519) + 0x6d2b79f5) >>> 0) / 2 ** 32);
}

export function benchDocuments(count: number, seed = 7): RegionDocument[] {
  const r = random(seed);
  const pick = <T>(xs: readonly T[]) => xs[Math.floor(r() * xs.length)];
  const out: RegionDocument[] = [];
  for (let i = 0; i < count; i++) {
    const [placeId, place, country, lat, lng] = pick(PLACES);
    const start = 1550 + Math.floor(r() * 200);
    const span = pick([0, 0, 5, 10, 20, 50]);
    const technique = pick(TECHNIQUES);
    const instrument = pick(INSTRUMENTS);
    const observation = (aspectKey: string, termKey: string) => ({ aspectKey, kind: "terms" as const, termKey, termLabel: termKey.replaceAll("_", " "), count: null, text: null, confidence: pick(["certain", "probable", "possible"] as const), note: null });
    const version = { id: i + 1, number: 1, state: "vetted" as const, label: `${pick(WORDS)} with a ${instrument.replaceAll("_", " ")}`, box: { x: 10, y: 10, w: 200, h: 150 }, observations: [observation("right_hand_technique", technique), observation("instrument_type", instrument), { aspectKey: "course_count", kind: "count" as const, termKey: null, termLabel: null, count: pick([4, 5, 6, 10]), text: null, confidence: "probable" as const, note: null }] };
    const facts: RegionFacts = {
      id: BENCH_FIRST_ID + i,
      imageId: 1,
      authorId: 1,
      state: "vetted",
      working: version,
      vetted: version,
      updatedAt: new Date(Date.UTC(2026, 0, 1) + i * 1000),
      source: {
        id: BENCH_FIRST_ID + Math.floor(i / 4),
        title: `${pick(WORDS)} ${i}`,
        artist: null,
        attribution: "anonymous",
        objectType: pick(["painting", "print", "drawing"]),
        medium: null,
        state: "published",
        createdBy: 1,
        collectionId: null,
        collection: null,
        accessionNumber: null,
        placeId,
        place,
        latitude: lat,
        longitude: lng,
        countryCode: country,
        datingEdtf: span ? `${start}/${start + span}` : String(start),
        datingWords: null,
        datingSearchEarliest: `${start}-01-01`,
        datingSearchLatest: `${start + span}-12-31`,
        description: null,
        reliabilityNote: null,
        imageCount: 1,
        firstImageId: 1,
        updatedAt: new Date(Date.UTC(2026, 0, 1)),
      },
    };
    out.push(...regionDocuments(facts));
  }
  return out;
}
