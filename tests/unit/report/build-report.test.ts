import { describe, expect, it } from "vitest";
import { buildCaseReport } from "@/lib/report/build-report";
import { demoReportSource } from "../../fixtures/report-demo-case";

describe("case report model", () => {
  it("states a signed revision with who signed and when", () => {
    const r = buildCaseReport(demoReportSource());
    expect(r.revision).toMatchObject({ kind: "signed", signedBy: "Tomasz Wielgus", signedAt: "2 Apr 2026, 09:30 UTC" });
    expect(r.revision.title).toBe("Signed revision — signed by Tomasz Wielgus on 2 Apr 2026, 09:30 UTC");
  });

  it("is a draft until the case is signed, whatever signedAt says", () => {
    const r = buildCaseReport(demoReportSource({ status: "signoff", signedAt: null }));
    expect(r.revision).toEqual({ kind: "draft", title: "Draft — not signed", stage: "Awaiting sign-off" });
    expect(r.verdict.rows.find(([k]) => k === "Signed by")?.[1]).toBe("Not signed");
  });

  it("recomputes the dial end play: each trial, the mean, the spread and the call", () => {
    const ep = buildCaseReport(demoReportSource()).field.endPlay!;
    expect(ep.trials.map((t) => t.endPlayIn)).toEqual(["0.0200 in", "0.0210 in", "0.0190 in"]);
    // 0.020 in × 25.4 mm/in = 0.508 mm (1 in = 25.4 mm exactly, NIST SP 811).
    expect(ep.trials[0].endPlayMm).toBe("0.508 mm");
    // Mean (0.020 + 0.021 + 0.019) / 3 = 0.020 in; spread 0.021 − 0.019 = 0.002 in (arithmetic).
    expect(ep.arithmetic[0][1]).toBe("0.0200 in = 0.508 mm (3 trials)");
    expect(ep.arithmetic[1][1]).toMatch(/^0\.0020 in = 0\.051 mm/);
    // Limit 1/16 in = 0.0625 in = 1.5875 mm (common practice for North American freight interchange).
    expect(ep.arithmetic[2][1]).toBe("0.0625 in = 1.588 mm (1/16 in)");
    expect(ep.call).toBe("Within the limit");
    expect(ep.removes).toBe(false);
  });

  it("calls an end play over 1/16 in a removal", () => {
    const src = demoReportSource();
    // 0.070 in is over the 0.0625 in limit (common practice for North American freight interchange).
    src.case.fieldChecks = {
      endPlay: {
        method: "dial",
        unit: "in",
        trials: [
          { zero: 0, reading: 0.07 },
          { zero: 0, reading: 0.071 },
        ],
      },
    };
    const field = buildCaseReport(src).field;
    expect(field.endPlay!.removes).toBe(true);
    expect(field.endPlay!.call).toBe("Over the limit: remove");
    expect(field.call.call).toBe("remove");
  });

  it("turns roughness felt on a valid hand roll into a remove call with the reason", () => {
    const field = buildCaseReport(demoReportSource()).field;
    expect(field.handRoll!.grid[0]).toEqual(["0°", "Smooth · 2 rev", "Rough · 2 rev"]);
    expect(field.call.label).toBe("Remove from service");
    expect(field.call.reasons.some((r) => r.level === "remove" && r.text.includes("0° push"))).toBe(true);
    expect(field.storedCallDiffers).toBeNull();
  });

  it("groups findings by part in teardown order and numbers photos to match", () => {
    const r = buildCaseReport(demoReportSource());
    expect(r.components.map((c) => c.code)).toEqual(["cup", "cone-inboard", "seal-inboard"]);
    expect(r.components[0].disposition).toBe("Scrap");
    expect(r.components[0].findings[0]).toMatchObject({
      damage: "Water etch",
      where: "Inboard row, Raceway, at 12 o'clock (0°), over 40°",
      size: "22 × 9 mm",
    });
    // The cup photo comes first (cup before seal), so it is photo 1 and the seal photo is 2.
    expect(r.components[0].findings[0].photoNumbers).toEqual([1]);
    expect(r.components[2].findings[0].photoNumbers).toEqual([2]);
    expect(r.photos.map((p) => p.caption)).toEqual(["cup-12.jpg", "Torn seal lip"]);
  });

  it("places raceway findings on the damage map and counts the rest as off the map", () => {
    const r = buildCaseReport(demoReportSource());
    expect(r.damageArcs).toEqual([
      { ring: "cup", row: "inboard", startDeg: -20, endDeg: 20, severity: 3, label: "Water etch", estimated: false },
      { ring: "cone", row: "inboard", startDeg: 86, endDeg: 94, severity: 2, label: "Surface distress", estimated: true },
    ]);
    expect(r.offMap).toBe(1);
  });

  it("works out months in service and wheel revolutions", () => {
    const rows = Object.fromEntries(buildCaseReport(demoReportSource()).service);
    // 2021-03-10 to 2026-03-14 is 1830 days; / 30.436875 days per mean month = 60.1 (arithmetic).
    expect(rows["Months since mounting"]).toBe("60.1");
    // 412 000 mi × 63 360 / (π × 36) ≈ 230.8 million revolutions (arithmetic; about 560 rev/mi on a 36 in wheel).
    expect(rows["Wheel revolutions"]).toMatch(/^230\.8 million/);
  });

  it("uses an admin's label for a code and lists related cases", () => {
    const src = demoReportSource();
    src.labels = { cause: { "water-ingress": "Water got in" } };
    const r = buildCaseReport(src);
    expect(r.headline.find(([k]) => k === "Root cause")?.[1]).toBe("Water got in");
    expect(r.related[0]).toMatchObject({ number: "TL-26-00031", status: "Signed", cause: "Water got in" });
  });
});
