import { describe, expect, it } from "vitest";
import { DEFAULT_END_PLAY_POLICY, evaluateEndPlay, ZERO_END_PLAY_IN, type EndPlayInput, type EndPlayResult } from "@/lib/field";

const dial = (readings: Array<number | string>, extra: Partial<EndPlayInput> = {}): EndPlayInput => ({
  method: "dial",
  unit: "in",
  trials: readings.map((reading) => ({ zero: 0, reading })),
  ...extra,
});
const codes = (r: EndPlayResult) => r.messages.map((m) => m.code);

describe("end-play limit", () => {
  it("defaults to 1/16 in", () => {
    // common practice, North American freight interchange: more than 1/16 in removes
    expect(DEFAULT_END_PLAY_POLICY.maxIn).toBe(1 / 16);
  });

  it("keeps exactly 0.0625 in within the limit", () => {
    // common practice: more than 1/16 in (0.0625 in) removes, so 0.0625 in itself does not
    const r = evaluateEndPlay(dial([0.0625]));
    expect(r.call).toBe("within");
    expect(r.removes).toBe(false);
  });

  it("removes at 0.0626 in", () => {
    // common practice: more than 1/16 in removes
    const r = evaluateEndPlay(dial([0.0626]));
    expect(r.call).toBe("over-limit");
    expect(r.removes).toBe(true);
    expect(r.messages[0]).toMatchObject({ level: "remove", code: "over-limit" });
    expect(r.messages[0].text).toContain("0.0626 in");
  });

  it("judges 1.5875 mm the same as 0.0625 in", () => {
    // NIST SP 811: 1.5875 mm = 0.0625 in exactly; common practice: within the limit
    const r = evaluateEndPlay({ method: "dial", unit: "mm", trials: [{ reading: "1,5875" }] });
    expect(r.call).toBe("within");
    if (r.call === "incomplete") throw new Error("expected a measurement");
    expect(r.meanIn).toBeCloseTo(0.0625, 12);
    expect(r.meanMm).toBe(1.5875);
  });

  it("takes the limit from the policy", () => {
    const r = evaluateEndPlay(dial([0.03]), { ...DEFAULT_END_PLAY_POLICY, maxIn: 0.025 });
    expect(r.call).toBe("over-limit");
  });

  it("refuses a policy that is not positive", () => {
    expect(() => evaluateEndPlay(dial([0.01]), { ...DEFAULT_END_PLAY_POLICY, maxIn: 0 })).toThrow(RangeError);
  });
});

describe("dial trials", () => {
  it("takes reading minus zero and gives mean and spread in both units", () => {
    const r = evaluateEndPlay({
      method: "dial",
      unit: "in",
      trials: [{ zero: 0.1, reading: 0.112 }, { zero: "0.100", reading: "0.113" }, { reading: 0.0115 }],
    });
    if (r.call === "incomplete") throw new Error("expected a measurement");
    expect(r.count).toBe(3);
    expect(r.trials.map((t) => t.in)).toEqual([expect.closeTo(0.012, 12), expect.closeTo(0.013, 12), 0.0115]);
    expect(r.meanIn).toBeCloseTo(0.0121666667, 9); // arithmetic: (0.012 + 0.013 + 0.0115) / 3
    expect(r.spreadIn).toBeCloseTo(0.0015, 12); // arithmetic: 0.013 − 0.0115
    expect(r.meanMm).toBeCloseTo(0.0121666667 * 25.4, 8); // NIST SP 811: 25.4 mm per inch
    expect(r.spreadMm).toBeCloseTo(0.0381, 12); // NIST SP 811: 0.0015 × 25.4
    expect(r.call).toBe("within");
    expect(codes(r)).not.toContain("spread-too-large");
  });

  it("accepts a spread of exactly 0.002 in but flags more", () => {
    expect(codes(evaluateEndPlay(dial([0.01, 0.012])))).not.toContain("spread-too-large");
    const r = evaluateEndPlay(dial([0.01, 0.0125]));
    const flag = r.messages.find((m) => m.code === "spread-too-large");
    expect(flag?.level).toBe("warn");
    expect(flag?.text).toMatch(/re-measure/i);
  });

  it("flags a trial over the limit even when the mean is within", () => {
    const r = evaluateEndPlay(dial([0.0615, 0.0635]));
    expect(r.call).toBe("within");
    expect(r.messages.find((m) => m.code === "trial-over-limit")?.text).toContain("trial 2");
  });

  it("refuses a reading below zero, naming the trial, and uses the rest", () => {
    const r = evaluateEndPlay({ method: "dial", unit: "in", trials: [{ zero: 0.01, reading: 0.008 }, { reading: 0.02 }] });
    const error = r.messages.find((m) => m.code === "trial-negative");
    expect(error).toMatchObject({ level: "error" });
    expect(error?.text).toMatch(/^Trial 1:.*below the zero/);
    expect(r.count).toBe(1);
    expect(r.call).toBe("within");
  });

  it("refuses a negative reading with no zero", () => {
    const r = evaluateEndPlay(dial(["-0.003"]));
    expect(r.call).toBe("incomplete");
    expect(codes(r)).toEqual(["no-usable-trial", "trial-negative"]);
  });

  it("names an unreadable trial, whether reading or zero", () => {
    const r = evaluateEndPlay({
      method: "dial",
      unit: "in",
      trials: [{ reading: "0.01" }, { reading: "abc" }, { zero: "x", reading: 0.01 }],
    });
    const errors = r.messages.filter((m) => m.code === "trial-unreadable").map((m) => m.text);
    expect(errors[0]).toMatch(/^Trial 2: the reading/);
    expect(errors[1]).toMatch(/^Trial 3: the zero/);
    expect(r.count).toBe(1);
  });

  it("is incomplete with no usable trial", () => {
    const r = evaluateEndPlay(dial([]));
    expect(r).toMatchObject({ call: "incomplete", count: 0, removes: false });
    expect(r.messages[0].level).toBe("error");
  });
});

describe("zero end play", () => {
  it("treats half a thousandth as zero", () => {
    // common practice: below the 0.001 in a dial indicator resolves
    expect(ZERO_END_PLAY_IN).toBe(0.0005);
    expect(evaluateEndPlay(dial([0.0005])).call).toBe("tight-unknown");
    expect(evaluateEndPlay(dial([0.0006])).call).toBe("within");
  });

  it("removes when it will not turn by hand", () => {
    // common practice: zero end play and cannot easily be turned by hand → remove
    const r = evaluateEndPlay(dial([0], { turnsByHand: false }));
    expect(r).toMatchObject({ call: "tight-remove", removes: true });
    expect(r.messages[0].level).toBe("remove");
  });

  it("asks for a re-measure, not a removal, when it turns freely", () => {
    const r = evaluateEndPlay(dial([0, 0.0002], { turnsByHand: true }));
    expect(r).toMatchObject({ call: "tight-remeasure", removes: false });
    expect(r.messages[0]).toMatchObject({ level: "warn", code: "tight-remeasure" });
  });

  it("asks whether it turns by hand when that is not stated", () => {
    const r = evaluateEndPlay(dial(["0"]));
    expect(r.call).toBe("tight-unknown");
    expect(r.messages[0].text).toMatch(/turns easily by hand/);
  });
});

describe("tape trials", () => {
  it("reads fractions, notes the dial is more precise and allows 1/64 in spread", () => {
    const r = evaluateEndPlay({ method: "tape", unit: "in", trials: [{ reading: "3/64" }, { reading: "1/32" }] });
    if (r.call === "incomplete") throw new Error("expected a measurement");
    expect(r.meanIn).toBe(0.0390625); // arithmetic: (3/64 + 2/64) / 2
    expect(r.messages.find((m) => m.code === "tape-less-precise")?.level).toBe("info");
    expect(codes(r)).not.toContain("spread-too-large"); // spread 1/64 in = the tape tolerance
    expect(r.messages[0].text).toContain("on the tape");
  });

  it("flags a tape spread over 1/64 in and removes over 1/16 in", () => {
    const r = evaluateEndPlay({ method: "tape", unit: "in", trials: [{ reading: "1/16" }, { reading: "3/32" }] });
    expect(codes(r)).toContain("spread-too-large"); // spread 1/32 in > 1/64 in
    expect(r.call).toBe("over-limit"); // mean 5/64 in > 1/16 in (common practice)
  });
});
