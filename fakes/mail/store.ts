// The mail fake's mailbox: one JSON file per message, so that messages survive a restart.
import { randomUUID } from "node:crypto";
import { mkdirSync, readdirSync, readFileSync, rmSync, writeFileSync, renameSync } from "node:fs";
import { join } from "node:path";

export type StoredMessage = {
  id: string;
  receivedAt: string;
  envelopeFrom: string;
  envelopeTo: string[];
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string | null;
  links: string[];
};

export class Mailbox {
  constructor(private readonly dir: string) {
    mkdirSync(dir, { recursive: true });
  }

  add(message: Omit<StoredMessage, "id" | "receivedAt">): StoredMessage {
    const receivedAt = new Date().toISOString();
    // Time-ordered ids keep the listing in arrival order without an index.
    const id = `${Date.now().toString(36).padStart(10, "0")}-${randomUUID().slice(0, 8)}`;
    const stored = { id, receivedAt, ...message };
    const tmp = join(this.dir, `.${id}.tmp`);
    writeFileSync(tmp, JSON.stringify(stored));
    renameSync(tmp, join(this.dir, `${id}.json`));
    return stored;
  }

  list(filter: { to?: string } = {}): StoredMessage[] {
    const all = readdirSync(this.dir)
      .filter((f) => f.endsWith(".json"))
      .sort()
      .reverse()
      .map((f) => JSON.parse(readFileSync(join(this.dir, f), "utf8")) as StoredMessage);
    if (!filter.to) return all;
    const to = filter.to.toLowerCase();
    return all.filter((m) => [...m.to, ...m.envelopeTo].some((a) => a.toLowerCase().includes(to)));
  }

  get(id: string): StoredMessage | null {
    if (!/^[a-z0-9-]+$/.test(id)) return null;
    try {
      return JSON.parse(readFileSync(join(this.dir, `${id}.json`), "utf8")) as StoredMessage;
    } catch {
      return null;
    }
  }

  clear(): number {
    const files = readdirSync(this.dir).filter((f) => f.endsWith(".json"));
    for (const f of files) rmSync(join(this.dir, f));
    return files.length;
  }
}
