import type { ReactNode } from "react";

export function PageTitle({ title, lead, children }: { title: string; lead?: ReactNode; children?: ReactNode }) {
  return (
    <header className="mb-6 flex flex-wrap items-end justify-between gap-4 border-b border-rule pb-4">
      <div>
        <h1 className="text-3xl sm:text-4xl">{title}</h1>
        {lead && <p className="mt-2 max-w-prose text-ink-soft">{lead}</p>}
      </div>
      {children}
    </header>
  );
}
