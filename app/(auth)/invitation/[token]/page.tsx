import type { Metadata } from "next";
import { ChoosePasswordForm } from "@/components/auth/choose-password-form";
import { Notice } from "@/components/ui/notice";
import { describeInvitation } from "@/lib/users/account-tokens";

export const metadata: Metadata = { title: "Accept your invitation" };

export default async function InvitationPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const invitation = await describeInvitation(token);
  return (
    <div className="mx-auto max-w-md">
      <h1 className="mb-2 text-3xl">Join Cordarium</h1>
      {invitation ? (
        <>
          <p className="mb-6 text-ink-soft">
            You are invited as <strong className="text-ink">{invitation.role}</strong> with the address{" "}
            <strong className="text-ink">{invitation.email}</strong>.
          </p>
          <ChoosePasswordForm token={token} mode="invitation" email={invitation.email} />
        </>
      ) : (
        <Notice tone="warn">This invitation is no longer valid: it was used already, has expired, or was replaced. Ask the person who invited you for a new one.</Notice>
      )}
    </div>
  );
}
