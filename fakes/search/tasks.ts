// The asynchronous task queue. Writes are enqueued and processed in order on a
// later tick, in batches like Meilisearch's autobatcher: every task of a batch is
// applied, the touched indexes are persisted, and only then do the tasks turn
// succeeded/failed, so a finished task is already on disk.

import { asMeiliError, bad, type ErrorBody } from "./errors.js";

export type TaskStatus = "enqueued" | "processing" | "succeeded" | "failed" | "canceled";
export const TASK_STATUSES: TaskStatus[] = ["enqueued", "processing", "succeeded", "failed", "canceled"];
export const TASK_TYPES = [
  "documentAdditionOrUpdate", "documentEdition", "documentDeletion", "settingsUpdate", "indexCreation",
  "indexDeletion", "indexUpdate", "indexSwap", "taskCancelation", "taskDeletion", "dumpCreation",
  "snapshotCreation", "upgradeDatabase",
];

export interface TaskView {
  uid: number;
  batchUid: number | null;
  indexUid: string | null;
  status: TaskStatus;
  type: string;
  canceledBy: number | null;
  details: Record<string, unknown>;
  error: ErrorBody | null;
  duration: string | null;
  enqueuedAt: string;
  startedAt: string | null;
  finishedAt: string | null;
}

/** Runs a task; may return details to merge (e.g. indexedDocuments); throws to fail it. */
export type TaskRun = (task: TaskView) => Record<string, unknown> | void;

export interface QueueHooks {
  /** Persists the indexes touched by a batch, before its tasks are reported finished. */
  persistIndexes(uids: Set<string>): Promise<void>;
  /** Called after task statuses changed, to persist the task history. */
  tasksChanged(): void;
  /** Called when the queue has drained. */
  idle?(): void;
}

const BATCH_SIZE = 200;
const CONTROL_TYPES = new Set(["taskCancelation", "taskDeletion"]);

export function isoDuration(ms: number): string {
  return `PT${Number((ms / 1000).toFixed(6))}S`;
}

export class TaskQueue {
  private readonly tasks = new Map<number, TaskView>();
  private queue: { view: TaskView; run: TaskRun }[] = [];
  private nextUid = 0;
  private nextBatch = 0;
  private running = false;
  private idleWaiters: (() => void)[] = [];
  private touched: Set<string> | null = null;

  constructor(private readonly hooks: QueueHooks) {}

  /** Restores history; tasks that were still pending when the fake stopped are failed. */
  restore(tasks: TaskView[]): void {
    const now = new Date().toISOString();
    for (const t of tasks) {
      if (t.status === "enqueued" || t.status === "processing") {
        Object.assign(t, { status: "failed", finishedAt: now, error: asMeiliError(new Error("The search fake stopped before this task was processed.")).toJSON() });
      }
      this.tasks.set(t.uid, t);
      this.nextUid = Math.max(this.nextUid, t.uid + 1);
      if (t.batchUid !== null) this.nextBatch = Math.max(this.nextBatch, t.batchUid + 1);
    }
  }

  all(): TaskView[] {
    return [...this.tasks.values()];
  }

  enqueue(type: string, indexUid: string | null, details: Record<string, unknown>, run: TaskRun) {
    const view: TaskView = {
      uid: this.nextUid++, batchUid: null, indexUid, status: "enqueued", type, canceledBy: null,
      details, error: null, duration: null, enqueuedAt: new Date().toISOString(), startedAt: null, finishedAt: null,
    };
    this.tasks.set(view.uid, view);
    this.queue.push({ view, run });
    this.hooks.tasksChanged();
    this.kick();
    return { taskUid: view.uid, indexUid, status: view.status, type, enqueuedAt: view.enqueuedAt };
  }

  get(uid: number): TaskView | undefined {
    return this.tasks.get(uid);
  }

  isIndexing(indexUid: string): boolean {
    return this.queue.some((t) => t.view.indexUid === indexUid) || [...this.tasks.values()].some((t) => t.status === "processing" && t.indexUid === indexUid);
  }

  /** Resolves once nothing is enqueued or processing. */
  idle(): Promise<void> {
    if (!this.running && this.queue.length === 0) return Promise.resolve();
    return new Promise((resolve) => this.idleWaiters.push(resolve));
  }

  /** Marks an index as changed by the running task, so it gets persisted (e.g. swaps). */
  touch(indexUid: string): void {
    this.touched?.add(indexUid);
  }

  /** Cancels enqueued tasks matching `match`; used by taskCancelation tasks. */
  cancel(match: (t: TaskView) => boolean, by: number): { matched: number; canceled: number } {
    const now = new Date().toISOString();
    const matched = [...this.tasks.values()].filter(match);
    let canceled = 0;
    this.queue = this.queue.filter(({ view }) => {
      if (view.uid === by || !matched.includes(view)) return true;
      Object.assign(view, { status: "canceled", canceledBy: by, startedAt: null, finishedAt: now });
      canceled++;
      return false;
    });
    return { matched: matched.length, canceled };
  }

  /** Deletes finished tasks matching `match`; used by taskDeletion tasks. */
  delete(match: (t: TaskView) => boolean, by: number): { matched: number; deleted: number } {
    const matched = [...this.tasks.values()].filter(match);
    let deleted = 0;
    for (const t of matched) {
      if (t.uid === by || t.status === "enqueued" || t.status === "processing") continue;
      this.tasks.delete(t.uid);
      deleted++;
    }
    return { matched: matched.length, deleted };
  }

  private kick(): void {
    if (this.running || this.queue.length === 0) return;
    this.running = true;
    setImmediate(() => void this.loop());
  }

  /** Next batch: control tasks (cancel/delete) go first and alone, like in Meilisearch. */
  private takeBatch() {
    const controlIdx = this.queue.findIndex((t) => CONTROL_TYPES.has(t.view.type));
    if (controlIdx >= 0) return this.queue.splice(controlIdx, 1);
    const end = this.queue.findIndex((t, i) => i >= BATCH_SIZE || CONTROL_TYPES.has(t.view.type));
    return this.queue.splice(0, end === -1 ? this.queue.length : end);
  }

  private async loop(): Promise<void> {
    try {
      while (this.queue.length) {
        const batch = this.takeBatch();
        const batchUid = this.nextBatch++;
        const startedAt = new Date();
        for (const { view } of batch) Object.assign(view, { status: "processing", startedAt: startedAt.toISOString(), batchUid });
        this.hooks.tasksChanged();
        // Yield so pollers can observe `processing`.
        await new Promise((r) => setImmediate(r));
        const outcomes: { view: TaskView; error: ErrorBody | null; started: number }[] = [];
        const touched = new Set<string>();
        this.touched = touched;
        for (const { view, run } of batch) {
          const started = performance.now();
          try {
            const extra = run(view);
            if (extra) Object.assign(view.details, extra);
            outcomes.push({ view, error: null, started });
          } catch (err) {
            outcomes.push({ view, error: asMeiliError(err).toJSON(), started });
          }
          if (view.indexUid) touched.add(view.indexUid);
        }
        this.touched = null;
        try {
          await this.hooks.persistIndexes(touched);
        } catch (err) {
          const error = bad("io_error", `The search fake could not persist its data: ${(err as Error).message}`).toJSON();
          outcomes.forEach((o) => (o.error ??= { ...error, type: "system" }));
        }
        const finishedAt = new Date();
        for (const { view, error } of outcomes) {
          // A failed task processed nothing: pending counters read 0, as in Meilisearch.
          if (error) for (const k of ["indexedDocuments", "deletedDocuments"]) if (view.details[k] === null) view.details[k] = 0;
          Object.assign(view, {
            status: error ? "failed" : "succeeded",
            error,
            finishedAt: finishedAt.toISOString(),
            duration: isoDuration(finishedAt.getTime() - startedAt.getTime()),
          });
        }
        this.hooks.tasksChanged();
      }
    } finally {
      this.running = false;
      if (this.queue.length) this.kick();
      else {
        this.hooks.idle?.();
        this.idleWaiters.splice(0).forEach((w) => w());
      }
    }
  }
}
