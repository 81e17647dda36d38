// GET /api/admin/reindex: the last rebuild of the search indexes and the outbox backlog.
// POST: queue a rebuild of the search indexes from the database. Admins only.
import { NextResponse } from "next/server";
import { route } from "@/lib/api/handler";
import { reindexStatus, requestReindex } from "@/lib/search/reindex-job";

export const GET = route("system.reindex", async ({ actor }) => reindexStatus(actor));

export const POST = route("system.reindex", async ({ actor }) => NextResponse.json(await requestReindex(actor), { status: 202 }));
