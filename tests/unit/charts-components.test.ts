// The chart components rendered to static markup, as a server component would send them:
// links for filtering without JavaScript, a title per mark, the numbers in a hidden table.
import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { DecadeChart } from "@/components/charts/decade-chart";
import { PlaceMap } from "@/components/charts/place-map";
import { decadeHistogram } from "@/lib/charts/decades";
import { aggregatePlaces } from "@/lib/charts/places";
import { worldMap } from "@/lib/charts/world-map";

describe("DecadeChart", () => {
  const histogram = decadeHistogram([
    { earliest: 1640, latest: 1660, series: "strumming" },
    { earliest: 1641, latest: 1641, series: "plucking" },
    { earliest: 1670, latest: 1670, series: "plucking" },
    { earliest: null, latest: null },
  ]);

  it("links each non-empty decade and names it with its numbers", () => {
    const html = renderToStaticMarkup(
      createElement(DecadeChart, {
        histogram,
        title: "Evidence by decade",
        seriesTitle: "Right-hand technique",
        hrefForBin: (bin) => `/search?from=${bin.start}&to=${bin.end - 1}`,
      }),
    );
    expect(html).toContain('role="group"');
    expect(html).toContain('href="/search?from=1640&amp;to=1649"');
    expect(html).toContain('href="/search?from=1670&amp;to=1679"');
    expect(html).not.toContain("from=1660"); // the empty 1660s is not a link
    expect(html).toContain("<title>1640s: 1.5 items (plucking 1, strumming 0.5)</title>");
    expect(html).toContain("Not shown: 1 item undated.");
    expect(html).toMatch(/<table class="sr-only">.*<th scope="row">1650s<\/th><td>0<\/td><td>0.5<\/td><td>0.5<\/td>/);
    expect(html).toContain("Right-hand technique");
  });

  it("is an image with a summary when nothing is clickable", () => {
    const html = renderToStaticMarkup(createElement(DecadeChart, { histogram, title: "Evidence by decade" }));
    expect(html).toContain('role="img"');
    expect(html).toContain('aria-label="Evidence by decade, 1640s to 1670s: 3 items; most in the 1640s (1.5). Not shown: 1 item undated."');
    expect(html).not.toContain("<a ");
  });
});

describe("PlaceMap", () => {
  it("draws a linked circle per place and colours countries with evidence", () => {
    const summary = aggregatePlaces([
      { place: { id: 1, name: "Sevilla", countryCode: "ES", latitude: 37.38, longitude: -5.97 } },
      { place: { id: 1, name: "Sevilla", countryCode: "ES", latitude: 37.38, longitude: -5.97 } },
      { place: { id: 2, name: "Roma", countryCode: "IT", latitude: 41.89, longitude: 12.51 } },
    ]);
    const html = renderToStaticMarkup(
      createElement(PlaceMap, {
        map: worldMap({ width: 480, height: 250 }),
        summary,
        title: "Evidence by place",
        hrefForPlace: (p) => `/search?place=${p.id}`,
      }),
    );
    expect(html.match(/<circle /g)).toHaveLength(2);
    expect(html).toContain('href="/search?place=1"');
    expect(html).toContain("<title>Sevilla (Spain): 2 items</title>");
    expect(html).toContain("<title>Italy: 1 item</title>");
    expect(html).toContain('aria-label="Evidence by place: 2 places in 2 countries; most at Sevilla (2)."');
    expect(html).toMatch(/<th scope="row">Roma<\/th><td>Italy<\/td><td>1<\/td>/);
  });
});
