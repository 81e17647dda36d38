import { redirect } from "next/navigation";
import { can } from "@/lib/auth/policy";
import { currentActor } from "@/lib/auth/session";
import { nextOnDesk } from "@/lib/review/desk";
import { deskFilterParams } from "@/lib/review/desk-schema";
import { readDeskParams, type SearchParams } from "../search-params";

// After a decision, or from the desk: the longest waiting region under the same filters that is not the
// editor's own; back to the desk when none is left.
export default async function NextOnDeskPage({ searchParams }: { searchParams: SearchParams }) {
  const actor = await currentActor();
  if (!actor) redirect("/sign-in?callbackUrl=/review");
  if (!can(actor, "review.read_desk")) redirect("/review");
  const { query } = await readDeskParams(searchParams);
  const filters = deskFilterParams(query).toString();
  const next = await nextOnDesk(actor, query);
  redirect(next ? `/review/${next}${filters ? `?${filters}` : ""}` : `/review?${new URLSearchParams([...deskFilterParams(query), ["cleared", "1"]]).toString()}`);
}
