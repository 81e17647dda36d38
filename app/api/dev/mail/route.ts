// GET /api/dev/mail?to=: the local mail fake's messages, newest first. Development and test only (404 elsewhere).
import { z } from "zod";
import { readQuery, route } from "@/lib/api/handler";
import { NotFoundError } from "@/lib/errors";
import { devMailboxEnabled, listDevMessages } from "@/lib/mail/dev-mailbox";

export const GET = route("public", async ({ req }) => {
  if (!devMailboxEnabled()) throw new NotFoundError("page");
  const { to } = readQuery(req, z.object({ to: z.string().max(254).optional() }));
  return { messages: await listDevMessages(to) };
});
