// Small axis arithmetic for the SVG charts: "nice" ticks and how many bin labels fit.

/** Round tick values from 0 to at least `max`: steps of 1, 2 or 5 × 10^k, about `count` of them. */
export function niceTicks(max: number, count = 4): number[] {
  if (!(max > 0)) return [0];
  const rough = max / Math.max(1, count);
  const power = 10 ** Math.floor(Math.log10(rough));
  const step = [1, 2, 5, 10].map((m) => m * power).find((s) => s >= rough) ?? 10 * power;
  const ticks: number[] = [];
  for (let v = 0; v < max + step - 1e-9 * step; v += step) ticks.push(Number(v.toPrecision(12)));
  return ticks;
}

/** Label every n-th bin so that labels sit at least `minSpacing` units apart. */
export function labelStride(bins: number, band: number, minSpacing = 40): number {
  if (bins <= 0 || !(band > 0)) return 1;
  return Math.max(1, Math.ceil(minSpacing / band));
}

const NUMBER = new Intl.NumberFormat("en-GB", { maximumFractionDigits: 1 });

/** Weights are fractional (aoristic shares): at most one decimal, "1,250" and "12.5". */
export function formatWeight(value: number): string {
  return NUMBER.format(Math.round(value * 10) / 10);
}
