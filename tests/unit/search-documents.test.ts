// Building search documents: decades and centuries from the widened dating, the facet fields of the
// observations, one document per version an audience may see. Decades are counted by their first
// year (the 1640s = 1640–1649), as is common practice in catalogues.
import { describe, expect, it } from "vitest";
import { readDating } from "@/lib/dating";
import {
  centuriesOf,
  dayNumber,
  decadesOf,
  observationFacets,
  regionDocuments,
  sourceDocument,
  type ObservationFacts,
  type RegionFacts,
  type SourceFacts,
  type VersionFacts,
} from "@/lib/search/documents";

function widened(edtf: string): [string | null, string | null] {
  const r = readDating(edtf);
  if (!r.ok) throw new Error(r.error);
  return [r.widenedEarliest, r.widenedLatest];
}

describe("decades and centuries of a dating", () => {
  it("list every decade the bounds overlap, inclusive of the last year", () => {
    expect(decadesOf("1640-01-01", "1660-12-31")).toEqual([1640, 1650, 1660]);
    expect(decadesOf(...widened("1640/1660"))).toEqual([1640, 1650, 1660]);
    expect(decadesOf(...widened("1650"))).toEqual([1650]);
  });

  it("use the widened bounds: 1650~ (1645–1655 with the default margin of 5 years) touches two decades", () => {
    expect(widened("1650~")).toEqual(["1645-01-01", "1655-12-31"]);
    expect(decadesOf(...widened("1650~"))).toEqual([1640, 1650]);
  });

  it("cover a whole unspecified century: 16XX is ten decades and one century", () => {
    expect(decadesOf(...widened("16XX"))).toEqual([1600, 1610, 1620, 1630, 1640, 1650, 1660, 1670, 1680, 1690]);
    expect(centuriesOf(...widened("16XX"))).toEqual([1600]);
  });

  it("give both centuries to a dating across 1600", () => {
    expect(centuriesOf(...widened("1595/1605"))).toEqual([1500, 1600]);
  });

  it("list nothing for an open end or a span of more than a hundred decades", () => {
    expect(decadesOf(...widened("../1700"))).toEqual([]);
    expect(decadesOf(...widened("1700/.."))).toEqual([]);
    expect(decadesOf("0900-01-01", "1950-12-31")).toEqual([]);
    expect(decadesOf("1000-01-01", "1999-12-31")).toHaveLength(100);
  });

  it("write days as sortable numbers", () => {
    expect(dayNumber("1650-06-15")).toBe(16500615);
    expect(dayNumber("0987-01-01")).toBe(9870101);
    expect(dayNumber("1649-12-31")).toBeLessThan(dayNumber("1650-01-01"));
  });
});

const term = (aspectKey: string, termKey: string, confidence: ObservationFacts["confidence"] = "certain"): ObservationFacts => ({
  aspectKey,
  kind: "terms",
  termKey,
  termLabel: termKey.replaceAll("_", " "),
  count: null,
  text: null,
  confidence,
  note: null,
});
const count = (aspectKey: string, n: number): ObservationFacts => ({ aspectKey, kind: "count", termKey: null, termLabel: null, count: n, text: null, confidence: "probable", note: null });

describe("facet fields of observations", () => {
  it("put term keys under t_<aspect> and counts, as numbers, under n_<aspect>, each once", () => {
    const facets = observationFacets([
      term("right_hand_technique", "strumming"),
      term("instrument_type", "five_course_guitar"),
      term("right_hand_technique", "strumming", "possible"),
      count("course_count", 5),
      count("peg_count", 10),
      { ...count("string_count", 9), kind: "text", text: "nine?" },
    ]);
    expect(facets).toEqual({ t_right_hand_technique: ["strumming"], t_instrument_type: ["five_course_guitar"], n_course_count: [5], n_peg_count: [10] });
  });
});

const source: SourceFacts = {
  id: 7,
  title: "A guitarist in a tavern",
  artist: "Invented Painter",
  attribution: "Invented Painter",
  objectType: "painting",
  medium: "oil on canvas",
  state: "published",
  createdBy: 3,
  collectionId: 2,
  collection: "An invented museum, Sevilla",
  accessionNumber: "INV-1",
  placeId: 11,
  place: "Sevilla",
  latitude: 37.38,
  longitude: -5.97,
  countryCode: "ES",
  datingEdtf: "1650~",
  datingWords: "about 1650",
  datingSearchEarliest: "1645-01-01",
  datingSearchLatest: "1655-12-31",
  description: null,
  reliabilityNote: null,
  imageCount: 1,
  firstImageId: 4,
  updatedAt: new Date("2025-01-01T00:00:00Z"),
};

const version = (id: number, state: VersionFacts["state"], observations: ObservationFacts[] = [term("right_hand_technique", "strumming")]): VersionFacts => ({
  id,
  number: id,
  state,
  label: `version ${id}`,
  box: { x: 1, y: 2, w: 3, h: 4 },
  observations,
});
const region = (working: VersionFacts | null, vetted: VersionFacts | null): RegionFacts => ({
  id: 9,
  imageId: 4,
  authorId: 3,
  state: working?.state ?? "draft",
  working,
  vetted,
  updatedAt: new Date("2025-01-02T00:00:00Z"),
  source,
});

describe("region documents", () => {
  it("are one document with both flags when the working version is the vetted one", () => {
    const v = version(1, "vetted");
    const docs = regionDocuments(region(v, v));
    expect(docs.map((d) => [d.id, d.isVetted, d.isWorking])).toEqual([["9-vetted", true, true]]);
  });

  it("are two documents while a revision of a vetted region is in progress, each with its own observations", () => {
    const docs = regionDocuments(region(version(2, "draft", [term("right_hand_technique", "plucking")]), version(1, "vetted")));
    expect(docs.map((d) => [d.id, d.isVetted, d.isWorking, d.state, d.regionState, d.pendingRevision])).toEqual([
      ["9-vetted", true, false, "vetted", "draft", true],
      ["9-working", false, true, "draft", "draft", false],
    ]);
    expect(docs[0].t_right_hand_technique).toEqual(["strumming"]);
    expect(docs[1].t_right_hand_technique).toEqual(["plucking"]);
  });

  it("are only the working document before anything was vetted", () => {
    const docs = regionDocuments(region(version(1, "proposed"), null));
    expect(docs.map((d) => [d.id, d.isVetted, d.isWorking, d.hasVetted])).toEqual([["9-working", false, true, false]]);
  });

  it("carry the source's facets: country, place point, dating bounds as numbers, decades", () => {
    const [doc] = regionDocuments(region(version(1, "vetted"), version(1, "vetted")));
    expect(doc).toMatchObject({
      sourceId: 7,
      objectType: "painting",
      country: "ES",
      placeId: 11,
      collectionId: 2,
      _geo: { lat: 37.38, lng: -5.97 },
      dated: true,
      dateFrom: 16450101,
      dateTo: 16551231,
      decade: [1640, 1650],
      century: [1600],
      sourceState: "published",
      sourceCreatorId: 3,
      confidence: ["certain"],
      terms: ["strumming"],
    });
  });
});

describe("source documents", () => {
  it("leave out an open bound and mark an undated source", () => {
    const open = sourceDocument({ ...source, datingEdtf: "../1700", datingSearchEarliest: null, datingSearchLatest: "1700-12-31" });
    expect(open.dateFrom).toBeUndefined();
    expect(open.dateTo).toBe(17001231);
    expect(open.decade).toEqual([]);
    const undated = sourceDocument({ ...source, datingEdtf: null, datingSearchEarliest: null, datingSearchLatest: null, latitude: null, longitude: null });
    expect(undated).toMatchObject({ id: "7", dated: false, decade: [], century: [] });
    expect(undated).not.toHaveProperty("dateFrom");
    expect(undated).not.toHaveProperty("_geo");
  });
});
