import type { Metadata } from "next";
import Link from "next/link";
import { ChoosePasswordForm } from "@/components/auth/choose-password-form";
import { Notice } from "@/components/ui/notice";
import { passwordResetIsLive } from "@/lib/users/account-tokens";

export const metadata: Metadata = { title: "Choose a new password" };

export default async function ResetPasswordPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const live = await passwordResetIsLive(token);
  return (
    <div className="mx-auto max-w-md">
      <h1 className="mb-6 text-3xl">Choose a new password</h1>
      {live ? (
        <ChoosePasswordForm token={token} mode="reset" />
      ) : (
        <Notice tone="warn">
          This reset link is no longer valid: it was used already, has expired, or a newer one was sent. <Link href="/forgot-password">Ask for a new link</Link>.
        </Notice>
      )}
    </div>
  );
}
