// The light table's address: the chosen regions in order (`?r=12,40,7`), the common crop height and the
// opt-in to proposed work. Everything a table shows is in its link, so a table can be shared and
// bookmarked. Pure: used by the server page, the client table and other pages' links.

export const LIGHT_TABLE_PATH = "/light-table";

/** More crops than this side by side stop being a comparison; a longer link is cut here. */
export const MAX_REGIONS = 24;

export const CROP_SIZES = ["small", "medium", "large"] as const;
export type CropSize = (typeof CROP_SIZES)[number];
export const DEFAULT_CROP_SIZE: CropSize = "medium";

/** The common height of every crop on screen, in CSS pixels. */
export const CROP_HEIGHTS: Record<CropSize, number> = { small: 240, medium: 360, large: 520 };
export const CROP_SIZE_WORDS: Record<CropSize, string> = { small: "Small", medium: "Medium", large: "Large" };

export type LightTableOptions = { proposed?: boolean; size?: CropSize };

export type Selection = {
  /** Region ids in the order asked for, each once, at most MAX_REGIONS. */
  ids: number[];
  /** Entries that are not region ids at all (counted among the regions not shown). */
  malformed: number;
  /** Ids past MAX_REGIONS, left out. */
  beyondLimit: number;
};

const ID = /^[1-9]\d{0,15}$/;

/** Reads `r` as the page receives it ("12,40,7", or repeated `r` parameters). Duplicates keep their first place. */
export function readSelection(raw: string | string[] | null | undefined): Selection {
  const parts = (Array.isArray(raw) ? raw : raw ? [raw] : []).flatMap((s) => s.split(",")).map((s) => s.trim()).filter(Boolean);
  const ids: number[] = [];
  let malformed = 0;
  let beyondLimit = 0;
  for (const part of parts) {
    const n = ID.test(part) ? Number(part) : NaN;
    if (!Number.isSafeInteger(n)) malformed++;
    else if (ids.includes(n)) continue;
    else if (ids.length >= MAX_REGIONS) beyondLimit++;
    else ids.push(n);
  }
  return { ids, malformed, beyondLimit };
}

export function readCropSize(raw: string | string[] | null | undefined): CropSize {
  const value = Array.isArray(raw) ? raw[0] : raw;
  return (CROP_SIZES as readonly string[]).includes(value ?? "") ? (value as CropSize) : DEFAULT_CROP_SIZE;
}

export function readProposed(raw: string | string[] | null | undefined): boolean {
  const value = Array.isArray(raw) ? raw[0] : raw;
  return value === "1" || value === "true";
}

/**
 * The light table's link for these regions, in this order: `/light-table?r=12,40,7`. The commas stay
 * unescaped (RFC 3986 allows them in a query), so the link reads as it is. Ids that are not positive
 * integers are left out, as are repeats.
 */
export function lightTableHref(ids: number[], opts: LightTableOptions = {}): string {
  const kept = [...new Set(ids.filter((id) => Number.isSafeInteger(id) && id > 0))];
  const query: string[] = [];
  if (kept.length) query.push(`r=${kept.join(",")}`);
  if (opts.size && opts.size !== DEFAULT_CROP_SIZE) query.push(`size=${opts.size}`);
  if (opts.proposed) query.push("proposed=1");
  return query.length ? `${LIGHT_TABLE_PATH}?${query.join("&")}` : LIGHT_TABLE_PATH;
}

/** The order after moving the item at `from` to `to` (both indexes into the current order). */
export function moveRegion(ids: number[], from: number, to: number): number[] {
  if (from < 0 || from >= ids.length || to < 0 || to >= ids.length || from === to) return ids;
  const next = [...ids];
  const [moved] = next.splice(from, 1);
  next.splice(to, 0, moved);
  return next;
}
