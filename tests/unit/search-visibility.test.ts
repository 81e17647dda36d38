// The visibility filter of the search index, evaluated on real documents with the filter evaluator of
// the search fake (the same grammar and semantics as Meilisearch's filters). Every caller must get at
// most one document per region, the version lib/regions/visibility.ts (shownVersionId) shows them in
// SQL, and only regions of sources lib/sources/visibility.ts lets them see.
import { describe, expect, it } from "vitest";
import { matchesFilter, parseFilter } from "../../fakes/search/filter";
import type { Actor } from "@/lib/auth/policy";
import { regionDocuments, type RegionFacts, type SourceFacts, type VersionFacts } from "@/lib/search/documents";
import { requestFilters } from "@/lib/search/filters";
import { searchParamsToQuery, searchQuerySchema } from "@/lib/search/schemas";
import { regionVisibilityFilter, sourceVisibilityFilter } from "@/lib/search/visibility";

const AUTHOR = 10;
const source = (state: SourceFacts["state"], createdBy: number, dating: [string | null, string | null, string | null] = ["1650", "1650-01-01", "1650-12-31"]) =>
  ({
    id: createdBy * 100 + (state === "draft" ? 1 : 0),
    title: "Invented source",
    artist: null,
    attribution: "Artist not recorded",
    objectType: "painting",
    medium: null,
    state,
    createdBy,
    collectionId: null,
    collection: null,
    accessionNumber: null,
    placeId: null,
    place: null,
    latitude: null,
    longitude: null,
    countryCode: "ES",
    datingEdtf: dating[0],
    datingWords: null,
    datingSearchEarliest: dating[1],
    datingSearchLatest: dating[2],
    description: null,
    reliabilityNote: null,
    imageCount: 1,
    firstImageId: 1,
    updatedAt: new Date(0),
  }) satisfies SourceFacts;

let nextVersion = 1;
const v = (state: VersionFacts["state"]): VersionFacts => ({ id: nextVersion++, number: 1, state, label: null, box: { x: 0, y: 0, w: 1, h: 1 }, observations: [] });

function region(id: number, working: VersionFacts, vetted: VersionFacts | null, src: SourceFacts = source("published", 3)): RegionFacts {
  return { id, imageId: 1, authorId: AUTHOR, state: working.state, working, vetted, updatedAt: new Date(0), source: src };
}

const vettedOnce = v("vetted");
const reviseVetted = v("vetted");
const proposeOnVetted = v("vetted");
const ownDraftSource = v("vetted");
// Region letters: A draft, B proposed, C vetted, D vetted with a draft revision, E vetted with a
// proposed revision, F returned, G vetted on a draft source its author created.
const regions = {
  A: region(1, v("draft"), null),
  B: region(2, v("proposed"), null),
  C: region(3, vettedOnce, vettedOnce),
  D: region(4, v("draft"), reviseVetted),
  E: region(5, v("proposed"), proposeOnVetted),
  F: region(6, v("returned"), null),
  G: region(7, ownDraftSource, ownDraftSource, source("draft", AUTHOR)),
};
const docs = Object.values(regions).flatMap(regionDocuments);

const actor = (id: number, role: Actor["role"]): Actor => ({ id, role, email: `${role}@example.test`, name: role });

/** Which document of each region the caller gets: "vetted", "working" or "-" (none). */
function seen(who: Actor | null, opts: { proposed?: boolean } = {}): string {
  const filter = parseFilter(regionVisibilityFilter(who, opts));
  const hits = docs.filter((d) => matchesFilter(filter, d));
  return Object.entries(regions)
    .map(([letter, r]) => {
      const mine = hits.filter((d) => d.regionId === r.id);
      if (mine.length > 1) throw new Error(`${letter}: ${mine.length} documents for one region`);
      return `${letter}:${mine[0]?.copy ?? "-"}`;
    })
    .join(" ");
}

describe("who sees which version of a region", () => {
  it("visitors and readers: vetted versions of published sources only", () => {
    const expected = "A:- B:- C:vetted D:vetted E:vetted F:- G:-";
    expect(seen(null)).toBe(expected);
    expect(seen(actor(20, "reader"))).toBe(expected);
    expect(seen(actor(30, "contributor"))).toBe(expected);
  });

  it("readers asking for proposed work: also proposed versions that have no vetted one, never drafts or returned work", () => {
    expect(seen(actor(20, "reader"), { proposed: true })).toBe("A:- B:working C:vetted D:vetted E:vetted F:- G:-");
  });

  it("the author: the working version of every own region, and regions of the own draft source", () => {
    expect(seen(actor(AUTHOR, "contributor"))).toBe("A:working B:working C:vetted D:working E:working F:working G:vetted");
  });

  it("editors: work in review (proposed, vetted, returned), otherwise the vetted version; draft sources too", () => {
    expect(seen(actor(40, "editor"))).toBe("A:- B:working C:vetted D:vetted E:working F:working G:vetted");
  });

  it("admins: the working version of everything", () => {
    expect(seen(actor(50, "admin"))).toBe("A:working B:working C:vetted D:working E:working F:working G:vetted");
  });

  it("sources: published ones, own drafts for contributors, all for editors", () => {
    const sources = [source("published", 3), source("draft", AUTHOR), source("draft", 3)].map((s) => ({ sourceState: s.state, sourceCreatorId: s.createdBy }));
    const count = (who: Actor | null) => sources.filter((d) => matchesFilter(parseFilter(sourceVisibilityFilter(who)), d)).length;
    expect(count(null)).toBe(1);
    expect(count(actor(AUTHOR, "contributor"))).toBe(2);
    expect(count(actor(40, "editor"))).toBe(3);
  });
});

describe("the caller's filters", () => {
  const parse = (query: string) => searchQuerySchema.parse(searchParamsToQuery(new URLSearchParams(query)));
  const dated = (edtf: string | null, from: string | null, to: string | null) =>
    regionDocuments(region(99, vettedOnce, vettedOnce, source("published", 3, [edtf, from, to])))[0];

  it("match a date range by overlap of the widened bounds; undated sources never match, open ends match their side", () => {
    const filter = parseFilter(requestFilters(parse("from=1620&to=1700")));
    const matches = (edtf: string | null, from: string | null, to: string | null) => matchesFilter(filter, dated(edtf, from, to));
    expect(matches("1650~", "1645-01-01", "1655-12-31")).toBe(true);
    expect(matches("1700/1710", "1700-01-01", "1710-12-31")).toBe(true);
    expect(matches("1701", "1701-01-01", "1701-12-31")).toBe(false);
    expect(matches("1619", "1619-01-01", "1619-12-31")).toBe(false);
    expect(matches("../1650", null, "1650-12-31")).toBe(true);
    expect(matches("../1610", null, "1610-12-31")).toBe(false);
    expect(matches(null, null, null)).toBe(false);
  });

  it("read aspect terms, repeated and comma-separated values", () => {
    const q = parse("t_right_hand_technique=strumming&t_instrument_type=five_course_guitar,vihuela&country=es&country=it&n_course_count=5");
    expect(requestFilters(q)).toEqual([
      `country IN ["ES", "IT"]`,
      `t_right_hand_technique IN ["strumming"]`,
      `t_instrument_type IN ["five_course_guitar", "vihuela"]`,
      `n_course_count IN [5]`,
    ]);
  });

  it("refuse keys and values that could break out of a filter expression", () => {
    expect(() => parse(`t_right_hand_technique=x" OR sourceState = "draft`)).toThrow();
    expect(() => parse(`t_x"%20OR%20isWorking%20=%20true=y`)).toThrow();
    expect(() => parse("country=ES OR 1=1")).toThrow();
  });
});
