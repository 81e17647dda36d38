import type { Metadata } from "next";
import { RequestResetForm } from "@/components/auth/request-reset-form";

export const metadata: Metadata = { title: "Forgotten password" };

export default function ForgotPasswordPage() {
  return (
    <div className="mx-auto max-w-md">
      <h1 className="mb-2 text-3xl">Forgotten password</h1>
      <p className="mb-6 text-ink-soft">Give the address of your account and we send you a link to choose a new password.</p>
      <RequestResetForm />
    </div>
  );
}
