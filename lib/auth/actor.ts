import "server-only";
import { eq } from "drizzle-orm";
import { db } from "@/db/client";
import { users } from "@/db/schema";
import type { Actor } from "./policy";

// Role and disabled state come from the database on every request, cached for a few seconds at most,
// so that a role change or a disabled account takes effect at once across all app instances.
const TTL_MS = 3_000;
const cache = new Map<number, { at: number; actor: Actor | null }>();

export async function loadActor(userId: number): Promise<Actor | null> {
  const hit = cache.get(userId);
  if (hit && Date.now() - hit.at < TTL_MS) return hit.actor;
  const [row] = await db()
    .select({ id: users.id, role: users.role, email: users.email, name: users.name, disabledAt: users.disabledAt })
    .from(users)
    .where(eq(users.id, userId))
    .limit(1);
  const actor = row && !row.disabledAt ? { id: row.id, role: row.role, email: row.email, name: row.name } : null;
  cache.set(userId, { at: Date.now(), actor });
  return actor;
}

/** This instance forgets what it cached for a user (other instances expire within the TTL). */
export function forgetActor(userId: number): void {
  cache.delete(userId);
}
