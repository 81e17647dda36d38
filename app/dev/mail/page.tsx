import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { EmptyState } from "@/components/ui/empty-state";
import { Notice } from "@/components/ui/notice";
import { PageTitle } from "@/components/ui/page-title";
import { devMailboxEnabled, listDevMessages, type DevMessage } from "@/lib/mail/dev-mailbox";

export const metadata: Metadata = { title: "Mailbox (development)" };

// Development and test only: the messages the local mail fake received, links clickable.
export default async function DevMailPage({ searchParams }: { searchParams: Promise<{ to?: string }> }) {
  if (!devMailboxEnabled()) notFound();
  const { to } = await searchParams;
  let messages: DevMessage[] = [];
  let failure: string | null = null;
  try {
    messages = await listDevMessages(to);
  } catch (error) {
    failure = error instanceof Error ? error.message : String(error);
  }
  return (
    <>
      <PageTitle title="Mailbox" lead="Every e-mail the app sent while running with the local mail fake. Not available in production." />
      {failure && <Notice tone="warn">The mail fake could not be read: {failure}</Notice>}
      {!failure && messages.length === 0 && <EmptyState title="No mail yet">Messages appear here as the app sends them.</EmptyState>}
      <ol className="grid gap-4">
        {messages.map((m) => (
          <li key={m.id} className="rounded border border-rule bg-card p-4" aria-label={`Message to ${m.to.join(", ")}: ${m.subject}`}>
            <p className="font-serif text-xl">{m.subject}</p>
            <p className="text-sm text-ink-soft">
              To <strong>{m.to.join(", ")}</strong> from {m.from} · <time dateTime={m.receivedAt} className="font-mono">{m.receivedAt.replace("T", " ").slice(0, 19)}</time>
            </p>
            <div className="mt-3 whitespace-pre-wrap break-words text-sm">
              {m.text.split(/(https?:\/\/[^\s<>"')]+)/g).map((part, i) =>
                /^https?:\/\//.test(part) ? (
                  <a key={i} href={part}>
                    {part}
                  </a>
                ) : (
                  <span key={i}>{part}</span>
                ),
              )}
            </div>
          </li>
        ))}
      </ol>
    </>
  );
}
