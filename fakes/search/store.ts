// Persistence under dataDir, per index: `indexes/UID.json` (snapshot: meta,
// settings, documents) plus `indexes/UID.log` (NDJSON journal of later changes).
// Small writes append to the journal so updating one document of a 100k index
// stays cheap; when the journal grows past half the snapshot, the snapshot is
// rewritten (temp file + rename, documents streamed in chunks). Journal lines
// carry the snapshot's generation, so lines older than the snapshot are ignored,
// as is a torn last line after a crash. tasks.json keeps the task history.

import { appendFile, mkdir, open, readdir, readFile, rename, rm } from "node:fs/promises";
import path from "node:path";
import { SearchIndex, type IndexSnapshot, type JournalOp } from "./engine.js";
import type { TaskView } from "./tasks.js";

const CHUNK = 1000;
const MIN_JOURNAL = 4 * 1024 * 1024;

interface FileState {
  gen: number;
  snapshotBytes: number;
  journalBytes: number;
}

export class Store {
  private counter = 0;
  private tasksWrite: Promise<void> = Promise.resolve();
  private readonly files = new Map<string, FileState>();

  constructor(readonly dir: string) {}

  private get indexDir(): string {
    return path.join(this.dir, "indexes");
  }

  private file(uid: string, ext: "json" | "log"): string {
    return path.join(this.indexDir, `${uid}.${ext}`);
  }

  async init(): Promise<void> {
    await mkdir(this.indexDir, { recursive: true });
  }

  async loadIndexes(): Promise<SearchIndex[]> {
    const out: SearchIndex[] = [];
    for (const name of await readdir(this.indexDir)) {
      if (!name.endsWith(".json")) continue;
      const uid = name.slice(0, -5);
      const text = await readFile(this.file(uid, "json"), "utf8");
      const data = JSON.parse(text) as IndexSnapshot & { gen?: number };
      const index = SearchIndex.restore(data);
      const gen = data.gen ?? 0;
      let journalBytes = 0;
      try {
        const journal = await readFile(this.file(uid, "log"), "utf8");
        journalBytes = journal.length;
        for (const line of journal.split("\n")) {
          let op: (JournalOp & { g?: number }) | undefined;
          try {
            op = line ? (JSON.parse(line) as JournalOp & { g?: number }) : undefined;
          } catch {
            continue; // torn write at the end of the journal
          }
          if (op && op.g === gen) index.replay(op);
        }
      } catch (err) {
        if ((err as NodeJS.ErrnoException).code !== "ENOENT") throw err;
      }
      index.markSaved();
      this.files.set(uid, { gen, snapshotBytes: text.length, journalBytes });
      out.push(index);
    }
    return out;
  }

  async loadTasks(): Promise<TaskView[]> {
    try {
      const data = JSON.parse(await readFile(path.join(this.dir, "tasks.json"), "utf8")) as { tasks: TaskView[] };
      return data.tasks;
    } catch (err) {
      if ((err as NodeJS.ErrnoException).code === "ENOENT") return [];
      throw err;
    }
  }

  private tmpName(file: string): string {
    return `${file}.${process.pid}.${++this.counter}.tmp`;
  }

  /** Saves what changed since the last save: a journal append, or a new snapshot. */
  async saveIndex(index: SearchIndex): Promise<void> {
    const state = this.files.get(index.uid);
    if (!state || index.unsavedAll) return this.writeSnapshot(index);
    const g = state.gen;
    const room = Math.max(MIN_JOURNAL, state.snapshotBytes / 2) - state.journalBytes;
    const lines = [JSON.stringify({ g, t: "meta", meta: index.meta(), settings: index.settings })];
    let size = lines[0]!.length + 1;
    for (const id of index.unsaved) {
      const doc = index.docs.get(id);
      const line = JSON.stringify(doc ? { g, t: "put", doc } : { g, t: "del", id });
      lines.push(line);
      size += line.length + 1;
      // A big batch goes to a new snapshot: no need to serialise the rest of it twice.
      if (size > room) return this.writeSnapshot(index);
    }
    if (size > room) return this.writeSnapshot(index);
    const text = `${lines.join("\n")}\n`;
    await appendFile(this.file(index.uid, "log"), text);
    state.journalBytes += text.length;
    index.markSaved();
  }

  private async writeSnapshot(index: SearchIndex): Promise<void> {
    const file = this.file(index.uid, "json");
    const tmp = this.tmpName(file);
    const gen = Date.now() * 1000 + (this.counter % 1000);
    const fh = await open(tmp, "w");
    let bytes = 0;
    const write = async (s: string) => {
      bytes += s.length;
      await fh.write(s);
    };
    try {
      const header = JSON.stringify({ version: 1, gen, ...index.meta(), settings: index.settings });
      await write(`${header.slice(0, -1)},"documents":[`);
      let chunk: string[] = [];
      let first = true;
      const flush = async () => {
        await write((first ? "" : ",") + chunk.join(","));
        first = false;
        chunk = [];
      };
      for (const doc of index.docs.values()) {
        chunk.push(JSON.stringify(doc));
        if (chunk.length >= CHUNK) await flush();
      }
      if (chunk.length) await flush();
      await write("]}\n");
      await fh.sync();
    } catch (err) {
      await fh.close();
      await rm(tmp, { force: true });
      throw err;
    }
    await fh.close();
    await rename(tmp, file);
    // The old journal's lines carry the previous generation, so removing it is only tidying.
    await rm(this.file(index.uid, "log"), { force: true });
    this.files.set(index.uid, { gen, snapshotBytes: bytes, journalBytes: 0 });
    index.markSaved();
  }

  async removeIndex(uid: string): Promise<void> {
    await rm(this.file(uid, "json"), { force: true });
    await rm(this.file(uid, "log"), { force: true });
    this.files.delete(uid);
  }

  /** Queues a write of the task history; writes never overlap and the last one wins. */
  saveTasks(tasks: () => TaskView[]): Promise<void> {
    this.tasksWrite = this.tasksWrite.then(async () => {
      const file = path.join(this.dir, "tasks.json");
      const tmp = this.tmpName(file);
      const fh = await open(tmp, "w");
      await fh.write(JSON.stringify({ version: 1, tasks: tasks() }));
      await fh.close();
      await rename(tmp, file);
    });
    return this.tasksWrite;
  }
}
