import "server-only";
import { notFound } from "next/navigation";
import { currentActor } from "@/lib/auth/session";
import { getDossier } from "@/lib/dossiers/queries";
import { NotFoundError } from "@/lib/errors";

/** The dossier for its page and its print page: whoever may not read it gets the not-found page. */
export async function loadDossier(id: string) {
  const actor = await currentActor();
  const n = Number(id);
  if (!Number.isInteger(n) || n <= 0) notFound();
  try {
    return { actor, dossier: await getDossier(actor, n) };
  } catch (error) {
    if (error instanceof NotFoundError) notFound();
    throw error;
  }
}
