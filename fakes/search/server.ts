// A local stand-in for the Meilisearch HTTP server, good enough for the
// official `meilisearch` client: same routes, JSON shapes, error codes, async
// tasks and on-disk persistence under dataDir. Built on node:http only.

import http from "node:http";
import type { AddressInfo } from "node:net";
import { asMeiliError, MeiliError } from "./errors.js";
import { Engine } from "./engine.js";
import { KeyStore, keyRoutes } from "./keys.js";
import { Router, type Ctx } from "./router.js";
import { documentRoutes } from "./routes-documents.js";
import { indexRoutes } from "./routes-indexes.js";
import { searchRoutes } from "./routes-search.js";
import { taskRoutes } from "./routes-tasks.js";
import { Store } from "./store.js";
import { TaskQueue } from "./tasks.js";

export interface SearchFakeOptions {
  host?: string;
  /** 0 picks a free port; the returned url has the real one. */
  port: number;
  dataDir: string;
  masterKey?: string;
}

export interface SearchFake {
  url: string;
  close(): Promise<void>;
}

const MAX_BODY = 100 * 1024 * 1024;

function readBody(req: http.IncomingMessage): Promise<string> {
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = [];
    let size = 0;
    req.on("data", (chunk: Buffer) => {
      size += chunk.length;
      if (size <= MAX_BODY) chunks.push(chunk);
    });
    req.on("end", () => {
      if (size > MAX_BODY) reject(new MeiliError(413, "payload_too_large", "The provided payload reached the size limit. The maximum accepted payload size is 100 MiB."));
      else resolve(Buffer.concat(chunks).toString("utf8"));
    });
    req.on("error", reject);
  });
}

function send(res: http.ServerResponse, status: number, body: unknown): void {
  if (body === undefined || status === 204) {
    res.writeHead(status).end();
    return;
  }
  const json = JSON.stringify(body);
  res.writeHead(status, { "Content-Type": "application/json", "Content-Length": Buffer.byteLength(json) }).end(json);
}

export async function startSearchFake(opts: SearchFakeOptions): Promise<SearchFake> {
  const host = opts.host ?? "127.0.0.1";
  const store = new Store(opts.dataDir);
  await store.init();
  const engine = new Engine();
  for (const index of await store.loadIndexes()) engine.indexes.set(index.uid, index);

  // Full-text indexes, then filter and facet columns, are (re)built in the background whenever writes settle.
  const warmAll = () => {
    for (const index of engine.indexes.values()) {
      index.warm().catch((err: unknown) => console.error("search fake: indexing failed", err));
    }
  };

  // Task history is rewritten at most every 50 ms; index files are written by the queue itself.
  let tasksTimer: NodeJS.Timeout | null = null;
  const saveTasks = () => store.saveTasks(() => queue.all()).catch((err: unknown) => console.error("search fake: cannot save tasks", err));
  const queue: TaskQueue = new TaskQueue({
    async persistIndexes(uids) {
      for (const uid of uids) {
        const index = engine.find(uid);
        if (index) await store.saveIndex(index);
        else await store.removeIndex(uid);
      }
    },
    tasksChanged() {
      tasksTimer ??= setTimeout(() => {
        tasksTimer = null;
        void saveTasks();
      }, 50);
    },
    idle: warmAll,
  });
  queue.restore(await store.loadTasks());
  warmAll();

  const keys = new KeyStore(opts.masterKey);
  const router = new Router();
  const deps = { engine, queue };
  indexRoutes(router, deps);
  documentRoutes(router, deps);
  searchRoutes(router, deps);
  taskRoutes(router, deps);
  keyRoutes(router, keys);

  const server = http.createServer((req, res) => {
    void (async () => {
      try {
        const url = new URL(req.url ?? "/", "http://fake");
        const method = req.method ?? "GET";
        const raw = await readBody(req);
        const { handler, params, access } = router.match(method, url.pathname);
        const searchRules = keys.authorize(req.headers.authorization, access);
        const ctx: Ctx = { method, params, query: url.searchParams, raw, contentType: req.headers["content-type"], searchRules };
        const reply = await handler(ctx);
        send(res, reply.status, reply.body);
      } catch (err) {
        const e = asMeiliError(err);
        if (e.status >= 500) console.error("search fake:", err);
        send(res, e.status, e.toJSON());
      }
    })();
  });

  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(opts.port, host, () => {
      server.off("error", reject);
      resolve();
    });
  });
  const { port } = server.address() as AddressInfo;
  const url = `http://${host.includes(":") ? `[${host}]` : host}:${port}`;

  let closing: Promise<void> | null = null;
  return {
    url,
    close() {
      closing ??= (async () => {
        const closed = new Promise<void>((resolve) => server.close(() => resolve()));
        server.closeIdleConnections();
        // Finish what was accepted, then flush the task history.
        await queue.idle();
        if (tasksTimer) clearTimeout(tasksTimer), (tasksTimer = null);
        await saveTasks();
        for (const index of engine.indexes.values()) index.text.cancel(), index.columns.cancel();
        server.closeAllConnections();
        await closed;
      })();
      return closing;
    },
  };
}
