import type { ReactNode } from "react";

// A short message in a box: "warn" for errors and refusals, "ok" for confirmations.
export function Notice({ tone = "info", children }: { tone?: "info" | "ok" | "warn"; children: ReactNode }) {
  const look = {
    info: "border-rule bg-card text-ink",
    ok: "border-accent bg-accent-wash text-accent-deep",
    warn: "border-warn bg-warn-wash text-warn",
  }[tone];
  return (
    <div role={tone === "warn" ? "alert" : "status"} className={`rounded border px-4 py-3 text-sm ${look}`}>
      {children}
    </div>
  );
}
