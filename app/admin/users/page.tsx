import type { Metadata } from "next";
import { InviteForm } from "@/components/admin/invite-form";
import { UsersTable } from "@/components/admin/users-table";
import { PageTitle } from "@/components/ui/page-title";
import { can } from "@/lib/auth/policy";
import { currentActor } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Users" };

export default async function UsersPage() {
  const actor = await currentActor();
  // The layout refuses non-admins, but pages render alongside their layout, not after it.
  if (!can(actor, "user.manage")) return null;
  return (
    <>
      <PageTitle title="Users" lead="Who may read, contribute, review and administer. A change of role or a disabled account takes effect at once." />
      <section aria-labelledby="invite-heading" className="mb-8 rounded border border-rule bg-card p-4">
        <h2 id="invite-heading" className="mb-3 text-xl">
          Invite someone
        </h2>
        <InviteForm />
      </section>
      <UsersTable selfId={actor!.id} />
    </>
  );
}
