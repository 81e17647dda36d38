import type { Metadata } from "next";
import Link from "next/link";

export const metadata: Metadata = { title: "Check your e-mail" };

export default async function CheckEmailPage({ searchParams }: { searchParams: Promise<{ email?: string }> }) {
  const { email } = await searchParams;
  return (
    <div className="mx-auto max-w-md">
      <h1 className="text-3xl">Check your e-mail</h1>
      <p className="mt-4 text-ink-soft">
        If {email ? <strong className="text-ink">{email}</strong> : "that address"} belongs to a Cordarium account, a sign-in link is on its way.
        It works once and expires in 24 hours.
      </p>
      <p className="mt-6">
        <Link href="/sign-in">Back to sign-in</Link>
      </p>
    </div>
  );
}
