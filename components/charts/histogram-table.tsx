import { formatWeight } from "@/lib/charts/axis";
import type { SeriesTotals, TimeHistogram } from "@/lib/charts/decades";

type Props = {
  histogram: TimeHistogram;
  title: string;
  seriesLabel: (series: SeriesTotals) => string;
  /** Indexes of the series to list, in order; none for an unstacked chart. */
  columns: number[];
};

// The chart's numbers as a table for screen readers (visually hidden): the bars carry the same
// numbers in their names, but a table can be read by row and column.
export function HistogramTable({ histogram: h, title, seriesLabel, columns }: Props) {
  if (!h.bins.length) return null;
  return (
    <table className="sr-only">
      <caption>{title} (aoristic weights: an item dated over several periods is shared between them)</caption>
      <thead>
        <tr>
          <th scope="col">Period</th>
          {columns.map((i) => (
            <th key={`${h.series[i].kind}:${h.series[i].key}`} scope="col">
              {seriesLabel(h.series[i])}
            </th>
          ))}
          <th scope="col">Total</th>
        </tr>
      </thead>
      <tbody>
        {h.bins.map((bin) => (
          <tr key={bin.start}>
            <th scope="row">{bin.label}</th>
            {columns.map((i) => (
              <td key={i}>{formatWeight(bin.bySeries[i])}</td>
            ))}
            <td>{formatWeight(bin.total)}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
