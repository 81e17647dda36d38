"use client";

// One way for the small vocabulary buttons to call the API: busy while it runs, the server's own
// words when it refuses, and the page's data fetched again afterwards either way.
import { useRouter } from "next/navigation";
import { useState } from "react";
import { ApiError } from "@/lib/client/api";

export function refusalOf(error: unknown): string {
  if (!(error instanceof ApiError)) return "The server could not be reached. Nothing was changed.";
  if (error.code === "version_conflict") return "Someone changed this since the page was loaded. The page now shows the current version; look again and retry.";
  return error.message;
}

export function useVocabularyCall() {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);

  async function run(work: () => Promise<unknown>): Promise<boolean> {
    setBusy(true);
    setProblem(null);
    try {
      await work();
      return true;
    } catch (error) {
      setProblem(refusalOf(error));
      return false;
    } finally {
      setBusy(false);
      router.refresh();
    }
  }

  return { busy, problem, run, clear: () => setProblem(null) };
}
