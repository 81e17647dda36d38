// A local stand-in for an SMTP relay: accepts every message (no auth, loopback only), keeps it in a
// Mailbox and shows the mailbox over a small JSON API that the development mail page and the tests read.
import { createServer, type Server } from "node:http";
import type { AddressInfo } from "node:net";
import { simpleParser, type AddressObject } from "mailparser";
import { SMTPServer } from "smtp-server";
import { Mailbox } from "./store";

export type MailFakeOptions = { host?: string; smtpPort: number; apiPort: number; dataDir: string };

const addresses = (a: AddressObject | AddressObject[] | undefined): string[] =>
  (Array.isArray(a) ? a : a ? [a] : []).flatMap((o) => o.value.map((v) => v.address ?? "")).filter(Boolean);

const linksIn = (text: string): string[] => [...new Set(text.match(/https?:\/\/[^\s<>"')]+/g) ?? [])];

export async function startMailFake(opts: MailFakeOptions) {
  const host = opts.host ?? "127.0.0.1";
  const mailbox = new Mailbox(opts.dataDir);

  const smtp = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS"],
    logger: false,
    size: 10 * 1024 * 1024,
    onData(stream, session, callback) {
      simpleParser(stream)
        .then((parsed) => {
          const text = parsed.text ?? "";
          mailbox.add({
            envelopeFrom: session.envelope.mailFrom ? session.envelope.mailFrom.address : "",
            envelopeTo: session.envelope.rcptTo.map((r) => r.address),
            from: addresses(parsed.from)[0] ?? "",
            to: addresses(parsed.to),
            subject: parsed.subject ?? "",
            text,
            html: typeof parsed.html === "string" ? parsed.html : null,
            links: linksIn(`${text} ${typeof parsed.html === "string" ? parsed.html : ""}`),
          });
          callback();
        })
        .catch((error: Error) => callback(error));
    },
  });

  const api: Server = createServer((req, res) => {
    const url = new URL(req.url ?? "/", "http://localhost");
    const send = (status: number, body: unknown) => {
      res.writeHead(status, { "content-type": "application/json" });
      res.end(JSON.stringify(body));
    };
    const match = url.pathname.match(/^\/messages\/([a-z0-9-]+)$/);
    if (req.method === "GET" && url.pathname === "/health") return send(200, { status: "available" });
    if (req.method === "GET" && url.pathname === "/messages")
      return send(200, { messages: mailbox.list({ to: url.searchParams.get("to") ?? undefined }) });
    if (req.method === "DELETE" && url.pathname === "/messages") return send(200, { deleted: mailbox.clear() });
    if (req.method === "GET" && match) {
      const message = mailbox.get(match[1]);
      return message ? send(200, message) : send(404, { message: "no such message" });
    }
    send(404, { message: "not found" });
  });

  await new Promise<void>((resolve, reject) => {
    smtp.on("error", reject);
    smtp.listen(opts.smtpPort, host, () => resolve());
  });
  await new Promise<void>((resolve, reject) => {
    api.on("error", reject);
    api.listen(opts.apiPort, host, () => resolve());
  });

  return {
    smtpPort: (smtp.server.address() as AddressInfo).port,
    apiUrl: `http://${host}:${(api.address() as AddressInfo).port}`,
    mailbox,
    close: async () => {
      await new Promise<void>((resolve) => smtp.close(() => resolve()));
      await new Promise<void>((resolve) => api.close(() => resolve()));
    },
  };
}
