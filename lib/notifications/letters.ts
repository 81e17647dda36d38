// The e-mails that carry notifications: one notice on its own, or the day's notices in one digest.
// Pure: the caller passes the base URL, so the texts can be checked without a server.
import type { Letter } from "@/lib/mail/transport";

export type Notice = { subject: string; body: string; link: string | null; createdAt: Date };

const signature = "\n\n— Cordarium, an archive of visual evidence for historical performance practice";

const settings = (base: string) => `\n\nChoose how often Cordarium writes to you (each notice at once, one letter a day, or none): ${base}/account`;

/** One notice, sent as soon as it is recorded. */
export function noticeLetter(to: string, notice: Notice, base: string): Letter {
  return { to, subject: notice.subject, text: `${notice.body}${settings(base)}${signature}` };
}

const day = (d: Date) => d.toISOString().slice(0, 10);
const time = (d: Date) => d.toISOString().slice(11, 16);

/**
 * Every notice gathered since the last letter, oldest first, each under its own subject line. The
 * subject says how many, so that a reader can tell a quiet day from a busy one in the inbox.
 */
export function digestLetter(to: string, notices: Notice[], base: string): Letter {
  const n = notices.length;
  const sections = notices.map((notice, i) => {
    const heading = `${i + 1}. ${notice.subject} (${day(notice.createdAt)} ${time(notice.createdAt)} UTC)`;
    return `${heading}\n${"-".repeat(Math.min(heading.length, 72))}\n${notice.body}`;
  });
  return {
    to,
    subject: `Cordarium digest: ${n} ${n === 1 ? "notice" : "notices"}`,
    text: `What happened in Cordarium since your last letter (${n} ${n === 1 ? "notice" : "notices"}):\n\n${sections.join("\n\n")}${settings(base)}${signature}`,
  };
}
