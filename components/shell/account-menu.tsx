"use client";

import Link from "next/link";
import { signOut } from "next-auth/react";
import { useState } from "react";

export function AccountMenu({ name, email, role }: { name: string; email: string; role: string }) {
  const [leaving, setLeaving] = useState(false);
  return (
    <details className="group relative">
      <summary className="flex cursor-pointer list-none items-center gap-2 rounded border border-rule px-3 py-1.5 text-sm hover:bg-paper-deep">
        <span className="font-semibold">{name}</span>
        <span className="rounded bg-paper-deep px-1.5 py-0.5 text-xs uppercase tracking-wider text-ink-soft">{role}</span>
      </summary>
      <div className="absolute right-0 z-20 mt-1 w-64 rounded border border-rule bg-card p-3 shadow-lg">
        <p className="text-sm text-ink-soft">Signed in as</p>
        <p className="truncate text-sm font-semibold">{email}</p>
        <Link href="/account" className="mt-3 block rounded border border-rule px-3 py-1.5 text-center text-sm font-semibold no-underline hover:bg-paper-deep">
          Your account
        </Link>
        <button
          type="button"
          disabled={leaving}
          onClick={() => {
            setLeaving(true);
            void signOut({ callbackUrl: "/" });
          }}
          className="mt-3 w-full rounded border border-rule px-3 py-1.5 text-sm font-semibold hover:bg-paper-deep"
        >
          {leaving ? "Signing out…" : "Sign out"}
        </button>
      </div>
    </details>
  );
}
