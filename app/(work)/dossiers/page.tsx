import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { DossierForm } from "@/components/dossiers/dossier-form";
import { RestoreDossierButton } from "@/components/dossiers/restore-dossier-button";
import { EmptyState } from "@/components/ui/empty-state";
import { Notice } from "@/components/ui/notice";
import { PageTitle } from "@/components/ui/page-title";
import { can } from "@/lib/auth/policy";
import { currentActor } from "@/lib/auth/session";
import { listMyDossiers } from "@/lib/dossiers/queries";
import { dossierPath, VISIBILITY_LABELS, type DossierSummary } from "@/lib/dossiers/types";

export const metadata: Metadata = { title: "Dossiers" };

export default async function DossiersPage() {
  const actor = await currentActor();
  if (!actor) redirect("/sign-in?callbackUrl=/dossiers");
  if (!can(actor, "dossier.manage")) return <Notice tone="warn">Dossiers need an account with the reader role or higher.</Notice>;
  const { mine, shared, deleted } = await listMyDossiers(actor);
  return (
    <>
      <PageTitle title="Dossiers" lead="Your own sets of regions and sources for a study, in the order you choose, with your notes; and those others have shared with you." />
      <div className="grid gap-8 lg:grid-cols-[1fr_24rem]">
        <div className="grid gap-8">
          <section aria-labelledby="mine-heading">
            <h2 id="mine-heading" className="mb-2 text-2xl">Mine</h2>
            {mine.length === 0 ? <EmptyState title="No dossiers yet">Start one with the form beside this list.</EmptyState> : <DossierList dossiers={mine} />}
          </section>
          <section aria-labelledby="shared-heading">
            <h2 id="shared-heading" className="mb-2 text-2xl">Shared with me</h2>
            {shared.length === 0 ? <p className="text-ink-soft">Nobody has shared a dossier with you yet.</p> : <DossierList dossiers={shared} showOwner />}
          </section>
          {deleted.length > 0 && (
            <section aria-labelledby="deleted-heading">
              <h2 id="deleted-heading" className="mb-2 text-2xl">Deleted</h2>
              <ul className="divide-y divide-rule rounded border border-rule bg-card">
                {deleted.map((d) => (
                  <li key={d.id} className="flex flex-wrap items-center justify-between gap-2 px-4 py-3">
                    <span>
                      <Link href={dossierPath(d.id)}>{d.title}</Link>
                      <span className="ml-2 text-sm text-ink-faint">deleted {d.deletedAt?.slice(0, 10)}</span>
                    </span>
                    <RestoreDossierButton id={d.id} version={d.version} title={d.title} />
                  </li>
                ))}
              </ul>
            </section>
          )}
        </div>
        <section aria-labelledby="new-heading" className="self-start rounded border border-rule bg-card p-4">
          <h2 id="new-heading" className="mb-2 text-xl">Start a dossier</h2>
          <DossierForm />
        </section>
      </div>
    </>
  );
}

function DossierList({ dossiers, showOwner = false }: { dossiers: DossierSummary[]; showOwner?: boolean }) {
  return (
    <ul className="divide-y divide-rule rounded border border-rule bg-card">
      {dossiers.map((d) => (
        <li key={d.id} className="px-4 py-3">
          <Link href={dossierPath(d.id)} className="font-serif text-lg font-semibold">
            {d.title}
          </Link>
          <span className="ml-2 text-sm text-ink-faint">
            {VISIBILITY_LABELS[d.visibility]} · {d.itemCount} {d.itemCount === 1 ? "item" : "items"}
            {showOwner && ` · by ${d.ownerName}`}
          </span>
          {d.description && <p className="line-clamp-2 text-sm text-ink-soft">{d.description}</p>}
        </li>
      ))}
    </ul>
  );
}
