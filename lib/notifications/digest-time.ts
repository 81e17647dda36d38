// When the daily digest goes out. Pure, so that the arithmetic is tested without a clock.

/**
 * 06:00 UTC: early morning in Europe, where most of the archive's editors work, and before the working
 * day in the Americas; one fixed hour for everyone keeps the schedule a single queued job.
 */
export const DIGEST_HOUR_UTC = 6;

/** The first digest time strictly after `now`: today at the hour if it is still to come, else tomorrow. */
export function nextDigestAt(now: Date, hourUtc = DIGEST_HOUR_UTC): Date {
  const at = new Date(Date.UTC(now.getUTCFullYear(), now.getUTCMonth(), now.getUTCDate(), hourUtc, 0, 0, 0));
  if (at.getTime() <= now.getTime()) at.setUTCDate(at.getUTCDate() + 1);
  return at;
}
