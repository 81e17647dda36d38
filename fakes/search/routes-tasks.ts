// Task and batch routes: listing with Meilisearch's filters and `from`/`next`
// paging, one task by uid, cancelation and deletion (themselves tasks).

import { bad, MeiliError } from "./errors.js";
import { accepted, ok, type Router } from "./router.js";
import { intParam, type Deps } from "./routes-indexes.js";
import { isoDuration, TASK_STATUSES, TASK_TYPES, type TaskView } from "./tasks.js";

const FILTER_PARAMS = ["uids", "batchUids", "canceledBy", "types", "statuses", "indexUids", "afterEnqueuedAt", "beforeEnqueuedAt", "afterStartedAt", "beforeStartedAt", "afterFinishedAt", "beforeFinishedAt"];
const snake = (k: string) => k.replace(/[A-Z]/g, (c) => `_${c.toLowerCase()}`);

/** Builds a predicate from the task filter query parameters. */
export function taskFilter(query: URLSearchParams): { match: (t: TaskView) => boolean; used: boolean } {
  const tests: ((t: TaskView) => boolean)[] = [];
  let used = false;
  for (const name of FILTER_PARAMS) {
    const raw = query.get(name);
    if (raw === null) continue;
    used = true;
    const code = `invalid_task_${snake(name)}`;
    if (raw === "*") continue;
    const items = raw.split(",").map((s) => s.trim()).filter(Boolean);
    if (name === "uids" || name === "batchUids" || name === "canceledBy") {
      const nums = items.map((s) => {
        if (!/^\d+$/.test(s)) throw bad(code, `Invalid value in parameter \`${name}\`: could not parse \`${s}\` as a positive integer`);
        return Number(s);
      });
      const field = name === "uids" ? "uid" : name === "batchUids" ? "batchUid" : "canceledBy";
      tests.push((t) => nums.includes(t[field] as number));
    } else if (name === "types" || name === "statuses") {
      const allowed: string[] = name === "types" ? TASK_TYPES : TASK_STATUSES;
      for (const s of items)
        if (!allowed.includes(s))
          throw bad(code, `Invalid value in parameter \`${name}\`: \`${s}\` is not a valid task ${name === "types" ? "type" : "status"}. Available ${name} are ${allowed.map((a) => `\`${a}\``).join(", ")}.`);
      tests.push(name === "types" ? (t) => items.includes(t.type) : (t) => items.includes(t.status));
    } else if (name === "indexUids") tests.push((t) => t.indexUid !== null && items.includes(t.indexUid));
    else {
      const date = Date.parse(raw);
      if (Number.isNaN(date)) throw bad(code, `Invalid value in parameter \`${name}\`: \`${raw}\` is an invalid date-time. It should follow the YYYY-MM-DD or RFC 3339 date-time format.`);
      const field = name.endsWith("EnqueuedAt") ? "enqueuedAt" : name.endsWith("StartedAt") ? "startedAt" : "finishedAt";
      const after = name.startsWith("after");
      tests.push((t) => {
        const v = t[field];
        if (!v) return false;
        const ms = Date.parse(v);
        return after ? ms > date : ms < date;
      });
    }
  }
  return { match: (t) => tests.every((f) => f(t)), used };
}

function page<T extends { uid: number }>(items: T[], query: URLSearchParams, prefix: string) {
  const limit = intParam(query, "limit", `invalid_${prefix}_limit`, 20);
  const from = query.has("from") ? intParam(query, "from", `invalid_${prefix}_from`, 0) : null;
  const reverse = query.get("reverse") === "true";
  const sorted = items.sort((a, b) => (reverse ? a.uid - b.uid : b.uid - a.uid));
  const start = from === null ? sorted : sorted.filter((t) => (reverse ? t.uid >= from : t.uid <= from));
  const results = start.slice(0, limit);
  return { results, total: sorted.length, limit, from: results[0]?.uid ?? null, next: start[limit]?.uid ?? null };
}

export function taskRoutes(r: Router, { queue }: Deps): void {
  r.add("GET", "/tasks", (ctx) => {
    const { match } = taskFilter(ctx.query);
    return ok(page(queue.all().filter(match), ctx.query, "task"));
  });

  r.add("GET", "/tasks/:uid", (ctx) => {
    const uid = ctx.params.uid!;
    const task = /^\d+$/.test(uid) ? queue.get(Number(uid)) : undefined;
    if (!task) throw new MeiliError(404, "task_not_found", `Task \`${uid}\` not found.`);
    return ok(task);
  });

  const control = (type: "taskCancelation" | "taskDeletion") => (ctx: { query: URLSearchParams }) => {
    const { match, used } = taskFilter(ctx.query);
    if (!used)
      throw bad(
        "missing_task_filters",
        `Query parameters to filter the tasks to ${type === "taskCancelation" ? "cancel" : "delete"} are missing. Available query parameters are: ${FILTER_PARAMS.map((p) => `\`${p}\``).join(", ")}.`,
      );
    const originalFilter = `?${ctx.query.toString()}`;
    const details = type === "taskCancelation" ? { matchedTasks: null, canceledTasks: null, originalFilter } : { matchedTasks: null, deletedTasks: null, originalFilter };
    return accepted(
      queue.enqueue(type, null, details, (view) => {
        if (type === "taskCancelation") {
          const { matched, canceled } = queue.cancel(match, view.uid);
          return { matchedTasks: matched, canceledTasks: canceled };
        }
        const { matched, deleted } = queue.delete(match, view.uid);
        return { matchedTasks: matched, deletedTasks: deleted };
      }),
    );
  };
  r.add("POST", "/tasks/cancel", control("taskCancelation"));
  r.add("DELETE", "/tasks", control("taskDeletion"));

  const batches = () => {
    const groups = new Map<number, TaskView[]>();
    for (const t of queue.all()) if (t.batchUid !== null) groups.set(t.batchUid, [...(groups.get(t.batchUid) ?? []), t]);
    return [...groups].map(([uid, tasks]) => {
      const count = (key: (t: TaskView) => string | null) =>
        tasks.reduce<Record<string, number>>((acc, t) => {
          const k = key(t);
          if (k !== null) acc[k] = (acc[k] ?? 0) + 1;
          return acc;
        }, {});
      const startedAt = tasks[0]!.startedAt;
      const finishedAt = tasks.every((t) => t.finishedAt) ? tasks[0]!.finishedAt : null;
      return {
        uid,
        progress: null,
        details: Object.assign({}, ...tasks.map((t) => t.details)) as Record<string, unknown>,
        stats: { totalNbTasks: tasks.length, status: count((t) => t.status), types: count((t) => t.type), indexUids: count((t) => t.indexUid) },
        duration: startedAt && finishedAt ? isoDuration(Date.parse(finishedAt) - Date.parse(startedAt)) : null,
        startedAt,
        finishedAt,
      };
    });
  };
  r.add("GET", "/batches", (ctx) => ok(page(batches(), ctx.query, "batch")));
  r.add("GET", "/batches/:uid", (ctx) => {
    const batch = batches().find((b) => String(b.uid) === ctx.params.uid);
    if (!batch) throw new MeiliError(404, "batch_not_found", `Batch \`${ctx.params.uid}\` not found.`);
    return ok(batch);
  });
}
