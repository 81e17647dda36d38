import { AXIS_STROKE, TEXT_FILL, seriesFill } from "@/lib/charts/palette";
import { formatWeight, labelStride, niceTicks } from "@/lib/charts/axis";
import type { ChartBin, SeriesTotals, TimeHistogram } from "@/lib/charts/decades";
import { ITEMS, binSummary, defaultSeriesLabel, histogramSummary, notShown, type Noun } from "@/lib/charts/describe";
import { ChartLegend } from "./chart-legend";
import { ChartMark } from "./chart-mark";
import { HistogramTable } from "./histogram-table";

export type DecadeChartProps = {
  /** From decadeHistogram or centuryHistogram (lib/charts/decades.ts). */
  histogram: TimeHistogram;
  /** The chart's name, e.g. "Evidence by decade". */
  title: string;
  /** Heading of the legend: the aspect the bars are stacked by. */
  seriesTitle?: string;
  seriesLabel?: (series: SeriesTotals) => string;
  /** A link per bar, e.g. the search narrowed to that decade. */
  hrefForBin?: (bin: ChartBin) => string;
  /** Called on click (instead of following the link) or on Enter/Space. Client components only. */
  onSelectBin?: (bin: ChartBin) => void;
  /** What following a bar does, read after its numbers. */
  selectAction?: string;
  noun?: Noun;
  width?: number;
  height?: number;
};

const MARGIN = { top: 10, right: 8, bottom: 26, left: 44 };

// A stacked bar chart of aoristic weights per decade (or century). Renders on the server or in a
// client component alike: no state, no effects.
export function DecadeChart({
  histogram: h,
  title,
  seriesTitle,
  seriesLabel = defaultSeriesLabel,
  hrefForBin,
  onSelectBin,
  selectAction = "Show this period's evidence",
  noun = ITEMS,
  width = 640,
  height = 220,
}: DecadeChartProps) {
  const plotW = width - MARGIN.left - MARGIN.right;
  const plotH = height - MARGIN.top - MARGIN.bottom;
  const max = h.bins.reduce((m, b) => Math.max(m, b.total), 0);
  const ticks = niceTicks(max, 4);
  const top = ticks[ticks.length - 1] || 1;
  // Two decimals of a unit are finer than any screen and keep the markup short.
  const y = (v: number) => round(MARGIN.top + plotH - (v / top) * plotH);
  const band = h.bins.length ? plotW / h.bins.length : plotW;
  const gap = Math.min(2, band * 0.15);
  const longest = h.bins.reduce((m, b) => Math.max(m, b.label.length), 0);
  const stride = labelStride(h.bins.length, band, longest * 6.5 + 8);
  const interactive = Boolean(hrefForBin || onSelectBin);
  // Series with nothing in range (say, only undated items without a value) stay out of the legend.
  const shown = h.series.flatMap((s, i) => (s.inRange > 0 ? [i] : []));
  const stacked = shown.some((i) => h.series[i].kind === "value");
  const summary = histogramSummary(title, h, noun);
  const fills = h.series.map((s, i) => seriesFill(s.kind, i));
  const caveat = notShown(h, noun);

  return (
    <figure className="m-0">
      <svg
        viewBox={`0 0 ${width} ${height}`}
        className="h-auto w-full"
        role={interactive ? "group" : "img"}
        aria-label={summary}
      >
        <g aria-hidden="true" fontSize={11} fill={TEXT_FILL}>
          {ticks.map((t) => (
            <g key={t}>
              <line x1={MARGIN.left} x2={width - MARGIN.right} y1={y(t)} y2={y(t)} style={{ stroke: AXIS_STROKE }} strokeWidth={t === 0 ? 1 : 0.5} />
              <text x={MARGIN.left - 6} y={y(t)} dy="0.32em" textAnchor="end" style={{ fill: TEXT_FILL }}>
                {formatWeight(t)}
              </text>
            </g>
          ))}
          {h.bins.map((bin, i) =>
            i % stride === 0 ? (
              <text key={bin.start} x={round(MARGIN.left + (i + 0.5) * band)} y={height - 8} textAnchor="middle" style={{ fill: TEXT_FILL }}>
                {bin.label}
              </text>
            ) : null,
          )}
        </g>
        {h.bins.map((bin, i) => {
          const x = round(MARGIN.left + i * band + gap / 2);
          const w = round(Math.max(0.5, band - gap));
          const label = binSummary(bin, h.series, seriesLabel, noun);
          const active = bin.total > 0;
          let base = 0;
          return (
            <ChartMark
              key={bin.start}
              label={label}
              action={active && interactive ? selectAction : undefined}
              href={active && hrefForBin ? hrefForBin(bin) : undefined}
              onSelect={active && onSelectBin ? () => onSelectBin(bin) : undefined}
            >
              <rect
                x={x}
                y={MARGIN.top}
                width={w}
                height={plotH}
                className="fill-transparent stroke-transparent group-hover:stroke-ink-faint group-focus-visible:stroke-ink"
                strokeWidth={1.5}
              />
              {bin.bySeries.map((v, k) => {
                if (v <= 0) return null;
                const y0 = y(base);
                base += v;
                const y1 = y(base);
                return (
                  <rect
                    key={k}
                    x={x}
                    y={y1}
                    width={w}
                    height={round(Math.max(0, y0 - y1))}
                    style={{ fill: fills[k], stroke: "var(--color-card)" }}
                    strokeWidth={stacked ? 0.5 : 0}
                  />
                );
              })}
            </ChartMark>
          );
        })}
      </svg>
      {stacked && (
        <ChartLegend
          title={seriesTitle ?? "Values"}
          entries={shown.map((i) => ({ key: `${h.series[i].kind}:${h.series[i].key}`, label: seriesLabel(h.series[i]), fill: fills[i] }))}
        />
      )}
      {caveat && <p className="mt-1 text-sm text-ink-faint">{caveat}</p>}
      <HistogramTable histogram={h} title={title} seriesLabel={seriesLabel} columns={stacked ? shown : []} />
    </figure>
  );
}

function round(v: number): number {
  return Math.round(v * 100) / 100;
}
