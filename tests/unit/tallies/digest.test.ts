import { describe, expect, it } from "vitest";
import { buildDigest } from "@/lib/digest/build";
import { digestDue, lastDigestSlot } from "@/lib/digest/schedule-time";
import { causeSiteTally } from "@/lib/tallies/shape-cause-site";
import { confirmationTable } from "@/lib/tallies/shape-confirmation";
import { monthlyTally } from "@/lib/tallies/shape-monthly";
import { causePareto, triggerVerdictRows, verdictTotals } from "@/lib/tallies/shape-verdicts";
import type { TalliesData, VerdictCell } from "@/lib/tallies/types";

const cells: VerdictCell[] = [
  { siteId: "a", trigger: "wayside-hot", cause: "water-ingress", outcome: "confirmed", count: 30 },
  { siteId: "a", trigger: "wayside-hot", cause: "no-defect", outcome: "no-defect", count: 70 },
  { siteId: "b", trigger: "hand-roll", cause: "seal", outcome: "confirmed", count: 12 },
  { siteId: "b", trigger: "hand-roll", cause: "end-of-life", outcome: "confirmed", count: 6 },
  { siteId: "b", trigger: "hand-roll", cause: "<b>odd</b>", outcome: "confirmed", count: 1 },
];
const names: Record<string, string> = { a: "Alder shop", b: "Birch shop" };

function tallies(): TalliesData {
  return {
    filters: { from: "2025-04", to: "2026-03", cluster: "site", window: 30 },
    siteLimit: null,
    generatedAt: "2026-03-30T07:00:00Z",
    totals: verdictTotals(cells, 90),
    pareto: causePareto(cells),
    triggerVerdict: triggerVerdictRows(cells),
    byTrigger: confirmationTable(
      cells,
      (c) => c.trigger,
      (id) => id,
    ),
    byShop: confirmationTable(
      cells,
      (c) => c.siteId,
      (id) => names[id],
    ),
    monthly: monthlyTally([{ month: "2026-03", signed: true, cause: "seal", count: 3 }], "2025-04", "2026-03", "2026-03"),
    causeSite: causeSiteTally(cells, (id) => names[id]),
    clusters: { keyKind: "site", windowDays: 30, minSize: 3, total: 0, items: [] },
    damage: { sectorDeg: 10, sectors: [], placed: 0 },
  };
}

describe("weekly digest", () => {
  const mail = buildDigest({
    tallies: tallies(),
    week: { removals: 7, signed: 1, awaitingSignoff: 2, from: "2026-03-23", to: "2026-03-30" },
    tallyUrl: "http://127.0.0.1:3000/tallies?from=2025-04&to=2026-03",
  });

  it("leads with the week's counts and links to the tallies", () => {
    expect(mail.subject).toBe("Tearline weekly digest: 7 removals, 1 verdict signed");
    expect(mail.text).toContain(
      "This week (2026-03-23 to 2026-03-30): 7 removals logged and 1 verdict signed. 2 verdicts wait for sign-off.",
    );
    expect(mail.text).toContain("Open the tallies: http://127.0.0.1:3000/tallies?from=2025-04&to=2026-03");
  });

  it("gives the top three causes with their shares and the confirmation rate (49 of 119 = 41%, arithmetic)", () => {
    expect(mail.text).toContain("1. No defect found: 70 (59%)"); // 70 of 119 signed
    expect(mail.text).toContain("2. Water ingress: 30 (25%)");
    expect(mail.text).toContain("3. Seal: 12 (10%)");
    expect(mail.text).not.toContain("4.");
    expect(mail.text).toMatch(/Removal confirmed by teardown: 41% of 119/);
  });

  it("names a shop whose calls are confirmed less often than the rest", () => {
    // Alder: 30 of 100 confirmed, Wilson upper bound about 0.40, below the overall 0.41 (arithmetic)
    expect(mail.text).toMatch(/Removals from Alder shop are confirmed less often than across all shops: 30%/);
    expect(mail.text).not.toMatch(/Birch shop are confirmed less often/);
  });

  it("escapes codes in the HTML version", () => {
    expect(mail.html).not.toContain("<b>odd</b>");
  });
});

describe("weekly digest schedule", () => {
  it("is due from Monday 07:00 until one has been sent (server local time)", () => {
    const wednesday = new Date(2026, 3, 1, 12, 0); // 1 April 2026 was a Wednesday (calendar)
    const monday = lastDigestSlot(wednesday);
    expect([monday.getFullYear(), monday.getMonth(), monday.getDate(), monday.getHours()]).toEqual([2026, 2, 30, 7]);
    expect(digestDue(wednesday, null)).toBe(true);
    expect(digestDue(wednesday, new Date(2026, 2, 30, 7, 5))).toBe(false);
    expect(digestDue(wednesday, new Date(2026, 2, 29, 9, 0))).toBe(true);
  });

  it("counts a Monday before 07:00 as the previous week", () => {
    const early = new Date(2026, 2, 30, 6, 59);
    expect(lastDigestSlot(early).getDate()).toBe(23);
  });
});
