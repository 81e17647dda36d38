import { describe, expect, it } from "vitest";
import { filterAttributes, FilterSyntaxError, matchesFilter, parseFilter, type FilterNode } from "../../fakes/search/filter";

// Invented demo documents: paintings of guitar players.
const docs = [
  { id: 1, title: "El guitarrista de Sevilla", city: "Sevilla", year: 1921, framed: true, courses: ["Acuarela", "retrato"], observations: [{ term: "azul" }], curator: null },
  { id: 2, title: "Die Gitarrenspielerin", city: "Köln", year: 1930, framed: false, courses: [], observations: [{ term: "rojo" }, { term: "azul" }], note: "" },
  { id: 3, title: "La guitarra callada", city: "Granada", year: "1905", framed: true, courses: ["dibujo"], extra: {}, _geo: { lat: 37.18, lng: -3.6 } },
];

const ids = (filter: string | unknown[]) => {
  const node = parseFilter(filter);
  return docs.filter((d) => matchesFilter(node, d)).map((d) => d.id);
};

const children = (node: FilterNode): FilterNode[] => (node as { children: FilterNode[] }).children;

const syntaxError = (filter: string): string => {
  try {
    parseFilter(filter);
  } catch (err) {
    expect(err).toBeInstanceOf(FilterSyntaxError);
    return (err as Error).message;
  }
  throw new Error(`expected a syntax error for ${filter}`);
};

describe("parseFilter", () => {
  it("parses a comparison", () => {
    const node = parseFilter("city = Sevilla");
    expect(node).toMatchObject({ type: "compare", op: "=", attr: { name: "city" }, value: { raw: "Sevilla", folded: "sevilla", num: null } });
  });

  it("gives AND precedence over OR", () => {
    const node = parseFilter("a = 1 OR b = 2 AND c = 3");
    expect(node.type).toBe("or");
    expect(children(node).map((c) => c.type)).toEqual(["compare", "and"]);
  });

  it("parses parentheses, NOT and folds double negation", () => {
    expect(parseFilter("NOT NOT year > 1900").type).toBe("compare");
    const node = parseFilter("NOT (city = Sevilla OR city = Granada) AND year >= 1900");
    expect(node.type).toBe("and");
    expect(children(node)[0]!.type).toBe("not");
  });

  it("reads quoted strings with escapes and dotted names", () => {
    expect(parseFilter(`title = 'l\\'atelier'`)).toMatchObject({ value: { raw: "l'atelier" } });
    expect(parseFilter(`title = "el \\"maestro\\""`)).toMatchObject({ value: { raw: 'el "maestro"' } });
    expect(parseFilter(`"dog race" = 'Bernese Mountain'`)).toMatchObject({ attr: { name: "dog race" }, value: { raw: "Bernese Mountain" } });
    expect(parseFilter("observations.term = azul")).toMatchObject({ attr: { name: "observations.term" } });
  });

  it("parses IN lists, ranges and the existence operators", () => {
    expect(parseFilter("city IN [Sevilla, 'Köln',]")).toMatchObject({ type: "in", values: [{ raw: "Sevilla" }, { raw: "Köln" }] });
    expect(parseFilter("city IN []")).toMatchObject({ type: "in", values: [] });
    expect(parseFilter("city NOT IN [Sevilla]")).toMatchObject({ type: "not", child: { type: "in" } });
    expect(parseFilter("year 1900 TO 1930")).toMatchObject({ type: "range", from: { num: 1900 }, to: { num: 1930 } });
    expect(parseFilter("curator EXISTS").type).toBe("exists");
    expect(parseFilter("curator NOT EXISTS")).toMatchObject({ type: "not", child: { type: "exists" } });
    expect(parseFilter("curator IS NULL").type).toBe("null");
    expect(parseFilter("curator IS NOT NULL")).toMatchObject({ type: "not", child: { type: "null" } });
    expect(parseFilter("courses IS EMPTY").type).toBe("empty");
    expect(parseFilter("courses IS NOT EMPTY")).toMatchObject({ type: "not", child: { type: "empty" } });
  });

  it("treats an empty filter as match-all and keywords as case-sensitive", () => {
    expect(parseFilter("   ").type).toBe("all");
    expect(parseFilter([]).type).toBe("all");
    expect(parseFilter("city = and")).toMatchObject({ value: { raw: "and" } });
  });

  it("reads the array form: outer AND, inner OR", () => {
    const node = parseFilter(["year > 1900", ["city = Sevilla", "city = Granada"]]);
    expect(node).toMatchObject({ type: "and", children: [{ type: "compare" }, { type: "or" }] });
  });

  it("lists the attributes a filter reads, with positions", () => {
    const node = parseFilter("year > 1900 AND (city = x OR NOT observations.term EXISTS) AND _geoRadius(1, 2, 3)");
    expect(filterAttributes(node).map((a) => a.name)).toEqual(["year", "city", "observations.term", "_geo"]);
    expect(filterAttributes(parseFilter("  title = x"))[0]).toMatchObject({ start: 2, end: 7 });
  });

  it("reports syntax errors the way Meilisearch does", () => {
    expect(syntaxError("year >")).toMatch(/^Was expecting a value but instead got nothing\.\n7:7 year >$/);
    expect(syntaxError("city Sevilla")).toMatch(/^Was expecting an operation `=`, `!=`.* at `city Sevilla`\.\n1:13 city Sevilla$/);
    expect(syntaxError("(city = Sevilla")).toMatch(/missing the following closing delimiter: `\)`/);
    expect(syntaxError("city = 'Sevilla")).toMatch(/missing the following closing delimiter: `'`/);
    expect(syntaxError("city = Sevilla year = 1")).toMatch(/Found unexpected characters at the end of the filter: `year = 1`/);
    expect(syntaxError("city = Sevilla AND")).toMatch(/Was expecting an operation .* but instead got nothing/);
    expect(syntaxError("AND = 1")).toMatch(/`AND`, which is a reserved keyword/);
    expect(syntaxError("city IN Sevilla")).toMatch(/Expected `\[` after `IN` keyword/);
    expect(syntaxError("city IN [Sevilla")).toMatch(/Expected matching `\]`/);
    expect(syntaxError("_geoRadius(1, 2)")).toMatch(/expects three arguments/);
    expect(() => parseFilter([["ok = 1", 3]])).toThrow(FilterSyntaxError);
    expect(() => parseFilter([true])).toThrow(FilterSyntaxError);
  });
});

describe("matchesFilter", () => {
  it("compares strings case-insensitively and numbers numerically", () => {
    expect(ids("city = sevilla")).toEqual([1]);
    expect(ids("city = 'KÖLN'")).toEqual([2]);
    expect(ids("year = 1905")).toEqual([3]); // numeric string counts as a number
    expect(ids("year > 1905")).toEqual([1, 2]);
    expect(ids("year >= 1905")).toEqual([1, 2, 3]);
    expect(ids("year < 1921")).toEqual([3]);
    expect(ids("year <= 1921.0")).toEqual([1, 3]);
    expect(ids("year 1905 TO 1921")).toEqual([1, 3]);
    expect(ids("title > m")).toEqual([]);
    expect(ids("city < h")).toEqual([3]);
    expect(ids("framed = true")).toEqual([1, 3]);
  });

  it("keeps documents lacking the field for != and NOT", () => {
    expect(ids("curator != x")).toEqual([1, 2, 3]);
    expect(ids("city != Sevilla")).toEqual([2, 3]);
    expect(ids("NOT year > 1920")).toEqual([3]);
  });

  it("matches arrays and nested objects on any element", () => {
    expect(ids("courses = acuarela")).toEqual([1]);
    expect(ids("courses IN [dibujo, retrato]")).toEqual([1, 3]);
    expect(ids("courses NOT IN [dibujo]")).toEqual([1, 2]);
    expect(ids("observations.term = azul")).toEqual([1, 2]);
    expect(ids("observations.term = rojo AND observations.term = azul")).toEqual([2]);
  });

  it("implements EXISTS, IS NULL and IS EMPTY", () => {
    expect(ids("curator EXISTS")).toEqual([1]);
    expect(ids("curator NOT EXISTS")).toEqual([2, 3]);
    expect(ids("curator IS NULL")).toEqual([1]);
    expect(ids("curator IS NOT NULL")).toEqual([2, 3]);
    expect(ids("courses IS EMPTY")).toEqual([2]);
    expect(ids("note IS EMPTY OR extra IS EMPTY")).toEqual([2, 3]);
    expect(ids("courses IS NOT EMPTY")).toEqual([1, 3]);
  });

  it("combines AND, OR, NOT, parentheses and the array form", () => {
    expect(ids("(city = Sevilla OR city = Granada) AND NOT year < 1910")).toEqual([1]);
    expect(ids("city = Sevilla OR city = Granada AND year > 1950")).toEqual([1]);
    expect(ids([["city = Köln", "city = Granada"], "framed = false"])).toEqual([2]);
  });

  it("filters by geo radius and bounding box", () => {
    expect(ids("_geoRadius(37.18, -3.6, 1000)")).toEqual([3]);
    expect(ids("_geoRadius(40.4, -3.7, 1000)")).toEqual([]);
    expect(ids("_geoBoundingBox([38, -3], [37, -4])")).toEqual([3]);
  });
});
