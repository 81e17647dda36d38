// The search index fed through the outbox, seen through GET /api/search as each role sees it: vetted
// regions reach it after the change, drafts only their author, proposed work only on request, facet
// counts, revisions of vetted regions, term labels and merges, renames of places and collections.
import { beforeAll, describe, expect, it } from "vitest";
import { call } from "../support/app";
import { eventually, ids, searchAs, searchBench, token, type SearchBench } from "../support/search";

let bench: SearchBench;
beforeAll(async () => {
  bench = await searchBench();
}, 120_000);

describe("what reaches the index, and who finds it", { timeout: 120_000 }, () => {
  it("finds a vetted region, with its source's facets, for a visitor within a few seconds", async () => {
    const { areaId, collectionId, observe, courses, vetted } = bench;
    const word = token();
    const r = await vetted(`right hand ${word}`, [observe("right_hand_technique", "strumming"), observe("instrument_type", "five_course_guitar"), courses(5)]);
    const answer = await eventually(() => searchAs(undefined, `q=${word}`), (a) => expect(ids(a)).toEqual([`${r.id}:vetted`]));
    expect(answer.hits[0]).toMatchObject({ state: "vetted", label: `right hand ${word}`, t_right_hand_technique: ["strumming"] });
    // "Strumming on a five-course guitar dated between 1620 and 1700 in Spain": the source is 1650~.
    const wanted = `q=${word}&t_right_hand_technique=strumming&t_instrument_type=five_course_guitar&n_course_count=5&from=1620&to=1700&country=ES&type=painting`;
    expect(ids(await searchAs(undefined, wanted))).toEqual([`${r.id}:vetted`]);
    expect(ids(await searchAs(undefined, `q=${word}&to=1640`))).toEqual([]);
    expect(ids(await searchAs(undefined, `q=${word}&t_right_hand_technique=plucking`))).toEqual([]);
    expect(ids(await searchAs(undefined, `q=${word}&country=IT`))).toEqual([]);
    expect(ids(await searchAs(undefined, `q=${word}&place=${areaId}&collection=${collectionId}&decade=1650`))).toEqual([`${r.id}:vetted`]);
  });

  it("finds a draft only for its author, and forgets it once deleted", async () => {
    const { contributor, editor, reader, admin, observe, region } = bench;
    const word = token();
    const draft = await region(`draft ${word}`, [observe("right_hand_technique", "plucking")]);
    await eventually(() => searchAs(contributor, `q=${word}`), (a) => expect(ids(a)).toEqual([`${draft.id}:working`]));
    for (const jar of [undefined, reader, editor]) expect(ids(await searchAs(jar, `q=${word}`))).toEqual([]);
    expect(ids(await searchAs(reader, `q=${word}&proposed=1`))).toEqual([]);
    expect(ids(await searchAs(admin, `q=${word}`))).toEqual([`${draft.id}:working`]);
    await call(`/api/regions/${draft.id}`, { jar: contributor, method: "DELETE", json: { version: draft.version } });
    await eventually(() => searchAs(contributor, `q=${word}`), (a) => expect(ids(a)).toEqual([]));
  });

  it("shows readers proposed work only when they ask for it, and then only proposed work", async () => {
    const { contributor, editor, reader, observe, region, propose, decide, vetted } = bench;
    const word = token();
    const proposed = await propose(await region(`proposed ${word}`, [observe("posture", "seated")]));
    const returned = await decide(await propose(await region(`returned ${word}`, [observe("posture", "standing")])), "returned");
    const draft = await region(`draft ${word}`, [observe("posture", "walking")]);
    const accepted = await vetted(`vetted ${word}`, [observe("posture", "seated")]);
    await eventually(
      () => searchAs(contributor, `q=${word}`),
      (a) => expect(ids(a)).toEqual([`${proposed.id}:working`, `${returned.id}:working`, `${draft.id}:working`, `${accepted.id}:vetted`].sort()),
    );
    expect(ids(await searchAs(reader, `q=${word}`))).toEqual([`${accepted.id}:vetted`]);
    const opted = await searchAs(reader, `q=${word}&proposed=1`);
    expect(ids(opted)).toEqual([`${proposed.id}:working`, `${accepted.id}:vetted`].sort());
    expect(opted.hits.find((h) => h.regionId === proposed.id)!.state).toBe("proposed");
    expect(ids(await searchAs(reader, `q=${word}&proposed=1&state=proposed`))).toEqual([`${proposed.id}:working`]);
    // Editors see work in review, not others' drafts.
    expect(ids(await searchAs(editor, `q=${word}`))).toEqual([`${proposed.id}:working`, `${returned.id}:working`, `${accepted.id}:vetted`].sort());
    expect((await call(`/api/search?q=${word}&proposed=1`)).status).toBe(401);
  });

  it("counts facets over what the caller may see", async () => {
    const { contributor, reader, areaId, observe, courses, region, propose, vetted } = bench;
    const word = token();
    await vetted(`a ${word}`, [observe("right_hand_technique", "strumming"), observe("instrument_type", "five_course_guitar"), courses(5)]);
    await vetted(`b ${word}`, [observe("right_hand_technique", "strumming", "possible"), observe("instrument_type", "lute")]);
    await vetted(`c ${word}`, [observe("right_hand_technique", "plucking"), observe("instrument_type", "lute")]);
    await propose(await region(`d ${word}`, [observe("right_hand_technique", "plucking"), observe("instrument_type", "vihuela")]));
    // Wait for every region in its final state: the reader who asks for proposed work sees all four
    // only once the proposal (not the draft before it) and the three vetted versions are indexed.
    await eventually(() => searchAs(reader, `q=${word}&proposed=1`), (a) => expect(a.total).toBe(4));
    await eventually(() => searchAs(contributor, `q=${word}`), (a) => expect(a.total).toBe(4));
    const { facetDistribution: f, total, labels } = await searchAs(reader, `q=${word}`);
    expect(total).toBe(3);
    expect(f.t_right_hand_technique).toEqual({ strumming: 2, plucking: 1 });
    expect(f.t_instrument_type).toEqual({ lute: 2, five_course_guitar: 1 });
    expect(f.n_course_count).toEqual({ 5: 1 });
    // a: certain, certain, probable (the count); b: possible, certain; c: certain. A region counts once per value.
    expect(f.confidence).toEqual({ certain: 3, probable: 1, possible: 1 });
    // 1650~ is 1645–1655 widened: two decades, one century.
    expect(f.decade).toEqual({ 1640: 3, 1650: 3 });
    expect(f.century).toEqual({ 1600: 3 });
    expect(f.country).toEqual({ ES: 3 });
    expect(f.state).toEqual({ vetted: 3 });
    expect(f.placeId).toEqual({ [areaId]: 3 });
    expect(labels.placeId[areaId]).toMatch(/^Search test area/);
    expect(f).not.toHaveProperty("authorId");
    expect(f).not.toHaveProperty("isWorking");
    const narrowed = await searchAs(reader, `q=${word}&t_right_hand_technique=strumming`);
    expect(narrowed.total).toBe(2);
    expect(narrowed.facetDistribution.t_instrument_type).toEqual({ five_course_guitar: 1, lute: 1 });
    const opted = await searchAs(reader, `q=${word}&proposed=1`);
    expect(opted.facetDistribution.state).toEqual({ vetted: 3, proposed: 1 });
  });

  it("keeps the vetted version for readers while its author revises it", async () => {
    const { contributor, editor, reader, observe, act, propose, vetted } = bench;
    const word = token();
    const r = await vetted(`revised ${word}`, [observe("right_hand_technique", "strumming")]);
    await eventually(() => searchAs(reader, `q=${word}`), (a) => expect(ids(a)).toEqual([`${r.id}:vetted`]));
    const edited = await act(contributor, `/api/regions/${r.id}`, { version: r.version, observations: [observe("right_hand_technique", "plucking")] }, "PATCH");
    expect(edited.state).toBe("draft");
    await eventually(() => searchAs(contributor, `q=${word}`), (a) => expect(ids(a)).toEqual([`${r.id}:working`]));
    const forReader = await searchAs(reader, `q=${word}`);
    expect(ids(forReader)).toEqual([`${r.id}:vetted`]);
    expect(forReader.hits[0].t_right_hand_technique).toEqual(["strumming"]);
    expect(ids(await searchAs(reader, `q=${word}&t_right_hand_technique=plucking`))).toEqual([]);
    expect(ids(await searchAs(editor, `q=${word}`))).toEqual([`${r.id}:vetted`]);
    await propose(edited);
    await eventually(() => searchAs(editor, `q=${word}`), (a) => expect(ids(a)).toEqual([`${r.id}:working`]));
    // Proposed on top of a vetted version: readers asking for proposed work still get the vetted one.
    expect(ids(await searchAs(reader, `q=${word}&proposed=1`))).toEqual([`${r.id}:vetted`]);
  });

  it("follows a term's new label, and a merge of terms, into the documents that name it", async () => {
    const { editor, vocab, vetted } = bench;
    const word = token();
    const aspectId = vocab.aspect("right_hand_technique");
    const created = await call(`/api/vocabulary/aspects/${aspectId}/terms`, { jar: editor, json: { key: word, label: `thumb brush ${word}` } });
    expect(created.status, await created.clone().text()).toBe(200);
    const { term } = (await created.json()) as { term: { id: number; version: number } };
    const r = await vetted(`term ${word}`, [{ aspectId, termId: term.id, confidence: "certain" }]);
    await eventually(() => searchAs(undefined, `q=${word}&t_right_hand_technique=${word}`), (a) => expect(ids(a)).toEqual([`${r.id}:vetted`]));
    const relabel = token();
    const renamed = await call(`/api/vocabulary/terms/${term.id}`, { jar: editor, method: "PATCH", json: { version: term.version, label: `thumb stroke ${relabel}` } });
    expect(renamed.status).toBe(200);
    await eventually(() => searchAs(undefined, `q=${relabel}`), (a) => expect(ids(a)).toEqual([`${r.id}:vetted`]));
    const merged = await call(`/api/vocabulary/terms/${term.id}/merge`, {
      jar: editor,
      json: { intoTermId: vocab.term("right_hand_technique", "strumming"), version: ((await renamed.json()) as { term: { version: number } }).term.version },
    });
    expect(merged.status, await merged.clone().text()).toBe(200);
    await eventually(() => searchAs(undefined, `q=${word}&t_right_hand_technique=strumming`), (a) => expect(ids(a)).toEqual([`${r.id}:vetted`]));
    expect(ids(await searchAs(undefined, `q=${relabel}`))).toEqual([]);
  });

  it("carries renames of the place and the collection into the documents of their sources' regions", async () => {
    const { contributor, editor, areaId, collectionId, observe, vetted } = bench;
    const word = token();
    const r = await vetted(`renamed ${word}`, [observe("setting", "tavern")]);
    await eventually(() => searchAs(undefined, `q=${word}`), (a) => expect(ids(a)).toEqual([`${r.id}:vetted`]));
    const place = ((await (await call(`/api/places/${areaId}`)).json()) as { place: { version: number } }).place;
    const placeName = `Renamed area ${word}`;
    expect((await call(`/api/places/${areaId}`, { jar: editor, method: "PATCH", json: { version: place.version, name: placeName } })).status).toBe(200);
    const coll = ((await (await call(`/api/collections/${collectionId}`)).json()) as { collection: { name: string; version: number } }).collection;
    const collName = `Renamed collection ${word}`;
    const renamed = await call(`/api/collections/${collectionId}`, { jar: contributor, method: "PATCH", json: { name: collName, city: "Sevilla", version: coll.version } });
    expect(renamed.status, await renamed.clone().text()).toBe(200);
    await eventually(
      () => searchAs(undefined, `q=${word}`),
      (a) => expect(a.hits.filter((h) => h.regionId === r.id).map((h) => [h.place, h.collection])).toEqual([[placeName, `${collName}, Sevilla`]]),
    );
  });
});

