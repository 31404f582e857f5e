import { describe, expect, test } from "vitest";
import { QUEUES, QUEUE_LABELS, SCHEDULES, retryKey } from "../../../lib/jobs/queues";

describe("job queues", () => {
  test("mail failing within the same second shares one retry job; a later second gets its own", () => {
    const a = new Date("2026-12-03T10:00:00.100Z");
    const b = new Date("2026-12-03T10:00:00.900Z");
    const c = new Date("2026-12-03T10:00:01.200Z");
    expect(retryKey(a)).toBe(retryKey(b));
    expect(retryKey(c)).not.toBe(retryKey(a));
  });

  test("every queue has a label for the Outbox page and every schedule names a queue with a five-field cron", () => {
    for (const q of Object.values(QUEUES)) expect(QUEUE_LABELS[q]).toBeTruthy();
    for (const s of SCHEDULES) {
      expect(Object.values(QUEUES)).toContain(s.queue);
      expect(s.cron.split(" ")).toHaveLength(5);
    }
  });
});
