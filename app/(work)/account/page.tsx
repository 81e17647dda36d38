import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { NotificationChoiceForm } from "@/components/account/notification-choice-form";
import { ROLE_LABELS } from "@/components/admin/role-labels";
import { PageTitle } from "@/components/ui/page-title";
import { currentActor } from "@/lib/auth/session";
import { getNotificationChoice } from "@/lib/users/notification-choice";

export const metadata: Metadata = { title: "Your account" };

export default async function AccountPage() {
  const actor = await currentActor();
  if (!actor) redirect("/sign-in?callbackUrl=/account");
  const choice = await getNotificationChoice(actor);
  return (
    <>
      <PageTitle title="Your account" lead="Who you are in the archive, and how often Cordarium writes to you." />
      <dl className="mb-8 grid max-w-xl grid-cols-[auto_1fr] gap-x-6 gap-y-2">
        <dt className="font-semibold text-ink-soft">Name</dt>
        <dd>{actor.name}</dd>
        <dt className="font-semibold text-ink-soft">E-mail address</dt>
        <dd>{actor.email}</dd>
        <dt className="font-semibold text-ink-soft">Role</dt>
        <dd>{ROLE_LABELS[actor.role]}</dd>
      </dl>
      <section aria-labelledby="notifications-heading" className="max-w-xl">
        <h2 id="notifications-heading" className="mb-3 text-2xl">
          Notifications
        </h2>
        <NotificationChoiceForm initial={choice} />
      </section>
    </>
  );
}
