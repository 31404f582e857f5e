// One date spelling across the app: days and moments, in UTC (values worked out by hand: arithmetic).
import { expect, test } from "vitest";
import { formatDay, formatMoment } from "@/lib/dates";

test("a calendar day reads as day, short month, year", () => {
  expect(formatDay("2026-11-20")).toBe("20 Nov 2026");
  expect(formatDay("2026-01-05")).toBe("5 Jan 2026");
  expect(formatDay(new Date("2026-06-15T23:30:00Z"))).toBe("15 Jun 2026");
  expect(formatDay(null)).toBe("");
});

test("a moment reads as its UTC day and time, never as an ISO string", () => {
  expect(formatMoment("2026-11-20T14:05:09.123Z")).toBe("20 Nov 2026, 14:05 UTC");
  // 23:30 at UTC-5 is 04:30 the next day in UTC (arithmetic).
  expect(formatMoment("2026-11-20T23:30:00-05:00")).toBe("21 Nov 2026, 04:30 UTC");
  expect(formatMoment(undefined)).toBe("");
  expect(formatMoment("2026-11-20T14:05:00Z")).not.toMatch(/\d{4}-\d{2}-\d{2}T/);
});
