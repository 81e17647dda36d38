"use client";

// One way for the dossier's small controls to call the API: busy while it runs, the server's own words
// when it refuses, and the page's data fetched again afterwards either way (so a 409 shows what is
// stored now).
import { useRouter } from "next/navigation";
import { useState } from "react";
import { ApiError } from "@/lib/client/api";

export function refusalOf(error: unknown): string {
  if (!(error instanceof ApiError)) return "The server could not be reached. Nothing was changed.";
  if (error.code === "version_conflict") return `${error.message} The page now shows the dossier as it is stored.`;
  const fields = Object.values(error.fields).flat();
  return fields.length && !fields.every((f) => error.message.includes(f)) ? `${error.message} ${fields.join(" ")}` : error.message;
}

export function useDossierCall() {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);

  async function run<T>(work: () => Promise<T>): Promise<T | null> {
    setBusy(true);
    setProblem(null);
    try {
      return await work();
    } catch (error) {
      setProblem(refusalOf(error));
      return null;
    } finally {
      setBusy(false);
      router.refresh();
    }
  }

  return { busy, problem, run, clear: () => setProblem(null) };
}
