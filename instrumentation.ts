// Starts this instance's job worker with the server (not during the build, not in the edge runtime).
export async function register() {
  if (process.env.NEXT_RUNTIME !== "nodejs" || process.env.NEXT_PHASE === "phase-production-build") return;
  const { startJobWorker } = await import("./lib/jobs/start");
  await startJobWorker();
}
