import "server-only";
import { getServerSession } from "next-auth";
import { cache } from "react";
import { loadActor } from "./actor";
import { authOptions } from "./options";
import type { Actor } from "./policy";

/** The signed-in person as the database sees them now, or null (signed out, unknown or disabled). */
export const currentActor = cache(async (): Promise<Actor | null> => {
  const session = await getServerSession(authOptions());
  const id = session?.user?.id;
  return typeof id === "number" ? loadActor(id) : null;
});
