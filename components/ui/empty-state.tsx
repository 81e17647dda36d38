import type { ReactNode } from "react";

export function EmptyState({ title, children }: { title: string; children?: ReactNode }) {
  return (
    <div className="rounded border border-dashed border-rule bg-card/60 px-6 py-10 text-center">
      <p className="font-serif text-xl text-ink">{title}</p>
      {children && <div className="mx-auto mt-2 max-w-prose text-ink-soft">{children}</div>}
    </div>
  );
}
