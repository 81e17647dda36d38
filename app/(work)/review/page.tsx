import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { DeskFilters } from "@/components/review/desk-filters";
import { DeskList } from "@/components/review/desk-list";
import { EmptyState } from "@/components/ui/empty-state";
import { Notice } from "@/components/ui/notice";
import { PageTitle } from "@/components/ui/page-title";
import { can } from "@/lib/auth/policy";
import { currentActor } from "@/lib/auth/session";
import { ValidationError } from "@/lib/errors";
import { deskFilterOptions, listDesk } from "@/lib/review/desk";
import { deskFilterParams } from "@/lib/review/desk-schema";
import { readDeskParams, type SearchParams } from "./search-params";

export const metadata: Metadata = { title: "Review desk" };

export default async function ReviewDeskPage({ searchParams }: { searchParams: SearchParams }) {
  const actor = await currentActor();
  if (!actor) redirect("/sign-in?callbackUrl=/review");
  if (!can(actor, "review.read_desk")) {
    return <Notice tone="warn">The review desk is for editors. Your role ({actor.role}) does not include reviewing.</Notice>;
  }
  const { query, problem } = await readDeskParams(searchParams);
  const filters = deskFilterParams(query).toString();
  // A damaged page link starts again from the first page under the same filters.
  const page = await listDesk(actor, query).catch((error) => {
    if (error instanceof ValidationError && query.after) redirect(`/review${filters ? `?${filters}` : ""}`);
    throw error;
  });
  const options = await deskFilterOptions(actor);
  const nextPage = new URLSearchParams(deskFilterParams(query));
  if (page.next) nextPage.set("after", page.next);
  const filtered = filters !== "";
  const cleared = (await searchParams).cleared === "1";
  return (
    <>
      <PageTitle
        title="Review desk"
        lead="Regions proposed for review, the longest waiting first. Vet what the picture shows, or return it to its author with a comment. Nobody reviews their own work."
      >
        {page.entries.some((e) => !e.own) && (
          <Link href={`/review/next${filters ? `?${filters}` : ""}`} className="rounded bg-accent px-4 py-2 text-sm font-semibold text-white no-underline hover:bg-accent-deep">
            Review the longest waiting
          </Link>
        )}
      </PageTitle>
      <DeskFilters options={options} values={query} />
      {cleared && (
        <div className="mb-4">
          <Notice tone="ok">Nothing else by others waits for review{filtered ? " under these filters" : ""}.</Notice>
        </div>
      )}
      {problem && (
        <div className="mb-4">
          <Notice tone="warn">{problem} The desk shows every proposed region instead.</Notice>
        </div>
      )}
      <p className="mb-3 text-sm text-ink-soft" aria-live="polite">
        {page.total === 1 ? "One region waits" : `${page.total} regions wait`} for review{filtered ? " under these filters" : ""}.
      </p>
      {page.entries.length === 0 ? (
        <EmptyState title={filtered ? "Nothing waits under these filters" : "Nothing waits for review"}>
          {filtered ? "Clear the filters to see every proposed region." : "When a contributor proposes a region, it appears here."}
        </EmptyState>
      ) : (
        <DeskList entries={page.entries} filters={filters} />
      )}
      <nav aria-label="Pages of the desk" className="mt-4 flex gap-3 text-sm">
        {query.after && <Link href={`/review${filters ? `?${filters}` : ""}`}>← The longest waiting</Link>}
        {page.next && <Link href={`/review?${nextPage.toString()}`}>More regions →</Link>}
      </nav>
    </>
  );
}
