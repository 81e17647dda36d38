// The mail fake as an SMTP relay: nodemailer sends, the fake keeps the message, its API returns it
// with its links, and keeps it on disk across a restart of the fake.
import nodemailer from "nodemailer";
import { describe, expect, it } from "vitest";
import { call, countMail, service, unique, waitForMail } from "../support/app";

const smtp = process.env.SMTP_URL ?? "smtp://127.0.0.1:2535";

describe("mail (smtp-server fake through nodemailer)", () => {
  it("keeps a message with recipient, subject, body and links", async () => {
    const to = `${unique("mail")}@example.test`;
    const since = new Date(Date.now() - 50);
    await nodemailer.createTransport(smtp).sendMail({
      from: "Cordarium <archive@cordarium.test>",
      to,
      subject: "Ein Prüfbrief — ñ",
      text: "Open https://cordarium.test/some/path?x=1 to continue.",
    });
    const mail = await waitForMail(to, /Prüfbrief/, since);
    expect(mail.to).toEqual([to]);
    expect(mail.subject).toBe("Ein Prüfbrief — ñ");
    expect(mail.links).toEqual(["https://cordarium.test/some/path?x=1"]);
  });

  it("shows the messages on the development mailbox page, links clickable", async () => {
    const to = `${unique("page")}@example.test`;
    const since = new Date(Date.now() - 50);
    await nodemailer.createTransport(smtp).sendMail({ from: "a@cordarium.test", to, subject: "Page check", text: "See http://localhost:3100/sign-in now" });
    await waitForMail(to, /Page check/, since);
    const html = await (await call(`/dev/mail?to=${encodeURIComponent(to)}`)).text();
    expect(html).toContain("Page check");
    expect(html).toContain('href="http://localhost:3100/sign-in"');
  });

  it("keeps its messages across a restart", async () => {
    const to = `${unique("restart")}@example.test`;
    const since = new Date(Date.now() - 50);
    await nodemailer.createTransport(smtp).sendMail({ from: "a@cordarium.test", to, subject: "Kept", text: "kept" });
    await waitForMail(to, /Kept/, since);
    service("stop", "mail");
    service("start", "mail");
    expect(await countMail(to)).toBe(1);
  });
});
