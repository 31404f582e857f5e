// The background jobs Tearline runs through pg-boss, and when the scheduled ones run (UTC cron).
// A schedule fires once across every server on the database, however many are up.
export const QUEUES = {
  /** Send every mail that is due (nudged after each mail is stored, and once a minute as a net). */
  mailSend: "mail-send",
  /** The same, at the time the earliest waiting retry is due. */
  mailRetry: "mail-retry",
  /** Send the weekly digest if it is due (the digest keeps its own "last sent"). */
  weeklyDigest: "weekly-digest",
  /** Remove photo objects that have no row (left by a crash mid-upload). */
  photoSweep: "photo-sweep",
} as const;
export type QueueName = (typeof QUEUES)[keyof typeof QUEUES];

export const SCHEDULES: { queue: QueueName; cron: string }[] = [
  { queue: QUEUES.mailSend, cron: "* * * * *" },
  { queue: QUEUES.weeklyDigest, cron: "5 * * * *" },
  { queue: QUEUES.photoSweep, cron: "17 * * * *" },
];

export const QUEUE_LABELS: Record<QueueName, string> = {
  "mail-send": "Send due mail",
  "mail-retry": "Retry mail",
  "weekly-digest": "Weekly digest",
  "photo-sweep": "Photo object sweep",
};

/** A retry job per distinct second, so mails failing together share one job and none waits behind a later one. */
export function retryKey(at: Date): string {
  return `retry-${Math.ceil(at.getTime() / 1000)}`;
}
