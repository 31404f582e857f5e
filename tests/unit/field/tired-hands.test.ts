// Readings no bearing can show, the unit switch, and unticked safety confirmations.
import { describe, expect, it } from "vitest";
import {
  checkPlausibility,
  convertLengthText,
  DEFAULT_END_PLAY_POLICY,
  evaluateEndPlay,
  switchTrialUnit,
  unconfirmedSafety,
  unitSwitchNeedsChoice,
} from "@/lib/field";

const dial = (readings: (number | string)[], more: Record<string, unknown> = {}) =>
  evaluateEndPlay({ method: "dial", unit: "in", trials: readings.map((reading) => ({ reading })), rollersSeated: true, ...more });

describe("plausibility", () => {
  it("refuses a single 5 in (127 mm) trial until it is confirmed as typed", () => {
    // common practice: mounted end play is thousandths of an inch, never above 1/4 in; 5 in = 127 mm (arithmetic, 25.4 mm/in NIST SP 811)
    const r = dial([5]);
    expect(r.call).toBe("incomplete");
    const m = r.messages.find((x) => x.code === "implausible-reading");
    expect(m?.level).toBe("error");
    expect(m?.text).toContain("Trial 1: 5.0000 in (127.000 mm)");
    const confirmed = dial([5], { confirmedAsTyped: true });
    expect(confirmed.call).toBe("over-limit");
    expect(confirmed.messages.some((x) => x.code === "implausible-confirmed")).toBe(true);
  });

  it("names the implausible trial among 5 in and 0.071 in instead of averaging them to 2.5355 in", () => {
    // arithmetic: (5 + 0.071) / 2 = 2.5355, a number no bearing shows
    const r = dial([5, 0.071]);
    expect(r.call).toBe("incomplete");
    expect(r.messages.filter((x) => x.code === "implausible-reading").map((x) => x.text.slice(0, 8))).toEqual(["Trial 1:"]);
  });

  it("accepts readings up to the limit and lets the site policy move it", () => {
    // common practice default limit 0.25 in
    expect(dial([0.25]).messages.some((x) => x.code === "implausible-reading")).toBe(false);
    expect(dial([0.2], {}).call).toBe("over-limit");
    expect(
      evaluateEndPlay(
        { method: "dial", unit: "in", trials: [{ reading: 0.2 }], rollersSeated: true },
        { ...DEFAULT_END_PLAY_POLICY, plausibleMaxIn: 0.1 },
      ).call,
    ).toBe("incomplete");
  });

  it("names an outlier trial far from the others", () => {
    // common practice: a dial repeats to about 0.002 in; 0.090 among 0.020s is five spreads and more away
    const values = [0.02, 0.021, 0.09].map((v, i) => ({ trial: i + 1, in: v, mm: v * 25.4 }));
    const p = checkPlausibility(values, "dial", DEFAULT_END_PLAY_POLICY);
    expect(p.needsConfirmation).toBe(false);
    expect(p.messages.find((m) => m.code === "outlier-trial")?.text).toMatch(/^Trial 3 \(0\.0900 in/);
    expect(checkPlausibility(values.slice(0, 2), "dial", DEFAULT_END_PLAY_POLICY).messages).toEqual([]);
  });
});

describe("unit switch", () => {
  it("converts 0.070 in to 1.778 mm and back, leaving unreadable text as typed", () => {
    // arithmetic: 0.070 × 25.4 = 1.778 (NIST SP 811: 1 in = 25.4 mm exactly)
    expect(convertLengthText("0.070", "in", "mm")).toBe("1.778");
    expect(convertLengthText("1.778", "mm", "in")).toBe("0.07");
    expect(convertLengthText("3/64", "in", "mm")).toBe("1.191"); // arithmetic: 3/64 × 25.4 = 1.190625
    expect(convertLengthText("abc", "in", "mm")).toBe("abc");
    expect(convertLengthText("", "in", "mm")).toBe("");
  });

  it("keeps the call when converting and reads the numbers anew when asked to", () => {
    const trials = [{ zero: "0", reading: "0.070" }];
    const converted = switchTrialUnit(trials, "in", "mm", "convert");
    const before = evaluateEndPlay({ method: "dial", unit: "in", trials, rollersSeated: true });
    const after = evaluateEndPlay({ method: "dial", unit: "mm", trials: converted, rollersSeated: true });
    expect(before.call).toBe("over-limit");
    expect(after.call).toBe("over-limit");
    expect(switchTrialUnit(trials, "in", "mm", "reinterpret")).toEqual(trials);
  });

  it("asks only when there is a number to lose", () => {
    expect(unitSwitchNeedsChoice([{ zero: "0", reading: "" }])).toBe(false);
    expect(unitSwitchNeedsChoice([{ zero: "0", reading: "0.07" }])).toBe(true);
  });
});

describe("safety confirmations", () => {
  it("lists what was left unticked; the cooling check applies only after a hot-bearing alarm", () => {
    expect(unconfirmedSafety({ ppe: true, blueSignal: true }, "hand-roll").map((c) => c.key)).toEqual(["wheelsetSecured"]);
    expect(unconfirmedSafety({ ppe: true, blueSignal: true }, "wayside-hot").map((c) => c.key)).toEqual(["wheelsetSecured", "cooled"]);
    expect(unconfirmedSafety({ ppe: true, blueSignal: true, wheelsetSecured: true }, "hand-roll")).toEqual([]);
    expect(unconfirmedSafety(undefined, "hand-roll")[0].text).toMatch(/employer's procedures/);
  });
});
