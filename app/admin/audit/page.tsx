import type { Metadata } from "next";
import Link from "next/link";
import { EmptyState } from "@/components/ui/empty-state";
import { PageTitle } from "@/components/ui/page-title";
import { changedFields } from "@/lib/audit/diff";
import { auditQuerySchema, listAuditEvents } from "@/lib/audit/queries";
import { can } from "@/lib/auth/policy";
import { currentActor } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Audit trail" };

export default async function AuditPage({ searchParams }: { searchParams: Promise<Record<string, string | undefined>> }) {
  const raw = await searchParams;
  const parsed = auditQuerySchema.safeParse(raw);
  const query = parsed.success ? parsed.data : auditQuerySchema.parse({});
  const actor = await currentActor();
  // The layout refuses non-admins, but pages render alongside their layout, not after it.
  if (!can(actor, "audit.read")) return null;
  const { events, nextBefore } = await listAuditEvents(actor, query);
  const filterQuery = (extra: Record<string, string | number>) =>
    `?${new URLSearchParams(Object.entries({ ...(query.entityType ? { entityType: query.entityType } : {}), ...extra }).map(([k, v]) => [k, String(v)])).toString()}`;

  return (
    <>
      <PageTitle title="Audit trail" lead="Every change to the archive: who made it, when, and the record before and after." />
      <nav aria-label="Filter by record type" className="mb-4 flex flex-wrap gap-2 text-sm">
        {["", "user", "invitation", "collection"].map((t) => (
          <Link
            key={t || "all"}
            href={t ? `?entityType=${t}` : "?"}
            aria-current={(query.entityType ?? "") === t ? "page" : undefined}
            className="rounded border border-rule px-3 py-1 no-underline aria-[current=page]:bg-accent-wash aria-[current=page]:font-semibold"
          >
            {t ? `${t[0].toUpperCase()}${t.slice(1)}s` : "All records"}
          </Link>
        ))}
      </nav>
      {events.length === 0 ? (
        <EmptyState title="Nothing recorded here yet" />
      ) : (
        <ol className="divide-y divide-rule rounded border border-rule bg-card">
          {events.map((e) => {
            const fields = changedFields(e.before, e.after);
            return (
              <li key={e.id} className="grid gap-1 px-4 py-3 sm:grid-cols-[11rem_1fr]">
                <time dateTime={e.createdAt.toISOString()} className="font-mono text-xs text-ink-faint">
                  {e.createdAt.toISOString().replace("T", " ").slice(0, 19)} UTC
                </time>
                <div>
                  <p>
                    <span className="font-mono text-sm">{e.action}</span> on {e.entityType} <span className="font-mono text-sm">#{e.entityId}</span>
                    {" by "}
                    <strong>{e.actorName ?? (e.actorId ? `user #${e.actorId}` : "the system")}</strong>
                  </p>
                  {fields.length > 0 && <p className="text-sm text-ink-soft">Fields: {fields.join(", ")}</p>}
                  <details className="mt-1 text-sm">
                    <summary className="cursor-pointer text-accent">Before and after</summary>
                    <div className="mt-2 grid gap-2 sm:grid-cols-2">
                      <pre className="overflow-x-auto rounded bg-paper-deep p-2 font-mono text-xs">{JSON.stringify(e.before, null, 2)}</pre>
                      <pre className="overflow-x-auto rounded bg-paper-deep p-2 font-mono text-xs">{JSON.stringify(e.after, null, 2)}</pre>
                    </div>
                  </details>
                </div>
              </li>
            );
          })}
        </ol>
      )}
      {nextBefore && (
        <p className="mt-4">
          <Link href={filterQuery({ before: nextBefore })}>Older events</Link>
        </p>
      )}
    </>
  );
}
