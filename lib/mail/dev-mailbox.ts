import "server-only";
import { z } from "zod";
import { config } from "@/lib/config";

// Reads the local mail fake's mailbox. Enabled only where MAIL_FAKE_API_URL is set (never in production).
const messageSchema = z.object({
  id: z.string(),
  receivedAt: z.string(),
  from: z.string(),
  to: z.array(z.string()),
  subject: z.string(),
  text: z.string(),
  links: z.array(z.string()),
});

export type DevMessage = z.infer<typeof messageSchema>;

export function devMailboxEnabled(): boolean {
  return Boolean(config().MAIL_FAKE_API_URL) && config().CORDARIUM_ENV !== "production";
}

export async function listDevMessages(to?: string): Promise<DevMessage[]> {
  const base = config().MAIL_FAKE_API_URL;
  if (!base || !devMailboxEnabled()) return [];
  const url = new URL("/messages", base);
  if (to) url.searchParams.set("to", to);
  const res = await fetch(url, { cache: "no-store", signal: AbortSignal.timeout(3000) });
  if (!res.ok) throw new Error(`the mail fake answered ${res.status}`);
  return z.object({ messages: z.array(messageSchema) }).parse(await res.json()).messages;
}
