// GET /api/health: one entry each for database, storage, search and mail; 200 when all are ok, else 503.
import { NextResponse } from "next/server";
import { checkHealth } from "@/lib/health/check";

export const dynamic = "force-dynamic";

export async function GET() {
  const health = await checkHealth();
  return NextResponse.json(health, { status: health.ok ? 200 : 503, headers: { "cache-control": "no-store" } });
}
