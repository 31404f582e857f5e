import { describe, expect, it } from "vitest";
import { nextDelayMs } from "@/lib/mail/outbox";
import { mailRetryIntervalMs } from "@/lib/mail/retry-interval";

describe("mail retry timing", () => {
  it("reads MAIL_RETRY_MS and falls back to 30 s for missing or silly values", () => {
    expect(mailRetryIntervalMs("2000")).toBe(2000);
    expect(mailRetryIntervalMs("")).toBe(30_000);
    expect(mailRetryIntervalMs("fast")).toBe(30_000);
    expect(mailRetryIntervalMs("10")).toBe(30_000);
  });

  it("doubles the pause after each failed attempt and never waits more than an hour", () => {
    expect([1, 2, 3, 4].map((a) => nextDelayMs(a, 30_000))).toEqual([30_000, 60_000, 120_000, 240_000]);
    expect(nextDelayMs(1, 2000)).toBe(2000);
    expect(nextDelayMs(20, 30_000)).toBe(3_600_000);
  });
});
