import { formatWeight } from "@/lib/charts/axis";
import { placeName, type Noun } from "@/lib/charts/describe";
import type { PlaceSummary } from "@/lib/charts/places";

type Props = {
  summary: PlaceSummary;
  title: string;
  nameOf: (code: string) => string;
  noun: Noun;
};

// The map's numbers for screen readers (visually hidden): places, then countries.
export function PlaceTable({ summary, title, nameOf, noun }: Props) {
  return (
    <div className="sr-only">
      {summary.places.length > 0 && (
        <table>
          <caption>{title}: {noun.many} by place</caption>
          <thead>
            <tr>
              <th scope="col">Place</th>
              <th scope="col">Country</th>
              <th scope="col">{noun.many}</th>
            </tr>
          </thead>
          <tbody>
            {summary.places.map((p) => (
              <tr key={p.key}>
                <th scope="row">{placeName(p)}</th>
                <td>{p.countryCode ? nameOf(p.countryCode) : ""}</td>
                <td>{formatWeight(p.count)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
      {summary.countries.length > 0 && (
        <table>
          <caption>{title}: {noun.many} by country</caption>
          <thead>
            <tr>
              <th scope="col">Country</th>
              <th scope="col">{noun.many}</th>
            </tr>
          </thead>
          <tbody>
            {summary.countries.map((c) => (
              <tr key={c.code}>
                <th scope="row">{nameOf(c.code)}</th>
                <td>{formatWeight(c.count)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </div>
  );
}
