// How often unsent mail is retried: MAIL_RETRY_MS, 30 s unless set (the test command sets 2 s).
export function mailRetryIntervalMs(raw = process.env.MAIL_RETRY_MS): number {
  const ms = Number(raw);
  // Anything unreadable or silly falls back to 30 s; below half a second would hammer the database.
  return Number.isFinite(ms) && ms >= 500 ? ms : 30_000;
}
