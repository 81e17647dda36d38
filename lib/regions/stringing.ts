import "server-only";
import type { Actor } from "@/lib/auth/policy";
import { getSource } from "@/lib/sources/queries";
import { checkStringing, type StringingInput, type StringingReport } from "@/lib/stringing";
import { listRegionsOfSource } from "./queries";
import type { RegionView } from "./types";

const COUNTS = { peg_count: "pegs", string_count: "strings", course_count: "courses" } as const;
const TERMS = { course_arrangement: "arrangement", instrument_type: "instrumentType" } as const;

/** The counts and terms of the regions, as the readings the stringing check weighs against each other. */
export function stringingInput(regions: RegionView[]): StringingInput {
  const input: Required<StringingInput> = { pegs: [], strings: [], courses: [], arrangement: [], instrumentType: [] };
  for (const region of regions) {
    for (const o of region.observations) {
      if (o.aspectKey in COUNTS && o.count !== null) {
        input[COUNTS[o.aspectKey as keyof typeof COUNTS]].push({ value: o.count, confidence: o.confidence, regionId: region.id });
      } else if (o.aspectKey in TERMS && o.termKey) {
        input[TERMS[o.aspectKey as keyof typeof TERMS]].push({ key: o.termKey, confidence: o.confidence, regionId: region.id });
      }
    }
  }
  return input;
}

/** The stringing check over every region of the source the caller sees (with proposed work if asked). */
export async function sourceStringing(actor: Actor | null, sourceId: number, opts: { proposed?: boolean } = {}): Promise<StringingReport> {
  await getSource(actor, sourceId);
  return checkStringing(stringingInput(await listRegionsOfSource(actor, sourceId, opts)));
}
