// Chart colours, all drawn from the theme's tokens (app/globals.css): the deep green accent and
// neutral ramps mixed towards the card colour. Vermilion (--color-warn) is for warnings only and
// never encodes data. Values are CSS, for `style={{ fill }}`: CSS variables do not resolve in
// SVG presentation attributes everywhere.

const mix = (token: string, percent: number) => `color-mix(in oklab, var(${token}) ${percent}%, var(--color-card))`;

/** Value series, in stacking order from the baseline; dark and light alternate so neighbours differ. */
export const SERIES_FILLS = [
  "var(--color-accent)",
  mix("--color-accent", 40),
  "var(--color-ink-soft)",
  mix("--color-ink-soft", 40),
  "var(--color-accent-deep)",
] as const;

/** The folded tail of small values. */
export const OTHER_FILL = mix("--color-ink-faint", 65);
/** Items with no value of the aspect. */
export const NO_VALUE_FILL = "var(--color-rule)";

export function seriesFill(kind: "value" | "none" | "other", index: number): string {
  if (kind === "none") return NO_VALUE_FILL;
  if (kind === "other") return OTHER_FILL;
  return SERIES_FILLS[index % SERIES_FILLS.length];
}

/** Countries by class, 0 = no evidence. Light to dark green. */
export const CHOROPLETH_FILLS = [
  "var(--color-paper-deep)",
  mix("--color-accent", 18),
  mix("--color-accent", 40),
  mix("--color-accent", 68),
  "var(--color-accent)",
] as const;

export function choroplethFill(classIndex: number, classCount: number): string {
  if (classIndex <= 0) return CHOROPLETH_FILLS[0];
  // With fewer classes, spread them over the ramp so the top class is always the full accent.
  const steps = CHOROPLETH_FILLS.length - 1;
  const at = classCount <= 1 ? steps : Math.round(1 + ((classIndex - 1) * (steps - 1)) / (classCount - 1));
  return CHOROPLETH_FILLS[Math.min(steps, at)];
}

export const AXIS_STROKE = "var(--color-rule)";
export const TEXT_FILL = "var(--color-ink-soft)";
export const PLACE_FILL = "var(--color-ink)";
export const SEA_FILL = "var(--color-card)";
