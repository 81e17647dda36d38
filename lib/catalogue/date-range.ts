// A date range as a request names it (from, to: years or EDTF), read into the ISO days that the overlap
// rule compares with: the source list and the search share it, and refuse a bad range the same way.
import { overlapQueryDays } from "@/lib/dating";
import { ValidationError } from "@/lib/errors";

export function requestedDateRange(range: { from?: string | null; to?: string | null }): { fromDay: string | null; toDay: string | null } {
  try {
    return overlapQueryDays({ from: range.from ?? null, to: range.to ?? null });
  } catch (error) {
    throw new ValidationError(error instanceof Error ? error.message : "The date range is not valid.", { from: ["Check the date range."] });
  }
}
