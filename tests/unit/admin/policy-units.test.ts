import { describe, expect, it } from "vitest";
import { bothUnits, formatIn, formatMmFromIn, limitText, readLimit, tapeFraction } from "@/lib/admin/policy-units";
import { PLAUSIBLE_MAX_CEILING_IN, policyOrderProblems, sitePolicySchema } from "@/lib/validation/site";
import checks from "../../fixtures/field-check-values.json";

// 1 in = 25.4 mm exactly (NIST SP 811; from memory), cases copied into tests/fixtures/field-check-values.json.
const inToMmCases = checks.units.cases;

describe("end-play limits in either unit", () => {
  it("shows the common 1/16 in limit as 0.0625 in and 1.5875 mm", () => {
    // 1/16 in = 0.0625 in = 1.5875 mm (fixture units.cases, NIST SP 811 exact inch)
    const sixteenth = inToMmCases.find((c) => c.in === "1/16")!;
    expect(formatIn(1 / 16)).toBe("0.0625");
    expect(Number(formatMmFromIn(1 / 16))).toBe(sixteenth.mm);
    expect(bothUnits(0.0625)).toBe("0.0625 in · 1.5875 mm");
  });

  it("converts each fixture length both ways", () => {
    for (const c of inToMmCases) {
      const inches = typeof c.in === "number" ? c.in : 1 / 16;
      expect(Number(limitText(inches, "mm"))).toBeCloseTo(c.mm, 10);
      const back = readLimit(String(c.mm), "mm");
      expect(back.ok && back.inches).toBeCloseTo(inches, 12);
    }
  });

  it("reads a tape fraction typed in inches", () => {
    // 1/64 in = 0.015625 in (arithmetic)
    expect(readLimit("1/64", "in")).toEqual({ ok: true, inches: 0.015625 });
    expect(readLimit("1,5875", "mm")).toEqual({ ok: true, inches: 0.0625 });
  });

  it("names the 64th of an inch a stored limit sits on", () => {
    // 0.0625 in = 4/64 = 1/16; 0.01563 in is 1/64 (0.015625) kept to 5 places; 0.002 in is no 64th (arithmetic)
    expect(tapeFraction(0.0625)).toBe("1/16");
    expect(tapeFraction(0.01563)).toBe("1/64");
    expect(tapeFraction(0.002)).toBeNull();
    expect(tapeFraction(0.25)).toBe("1/4");
  });

  it("refuses text that is not a length", () => {
    expect(readLimit("about a sixteenth", "in").ok).toBe(false);
  });
});

describe("site policy validation", () => {
  // 1/16 in removal limit, 0.002 in dial spread, 1/64 in tape spread, 1/4 in believable ceiling (common practice)
  const good = { endPlayMaxIn: 0.0625, dialSpreadIn: 0.002, tapeSpreadIn: 0.015625, plausibleMaxIn: 0.25 };

  it("accepts the common defaults and keeps 5 decimal places", () => {
    // 0.015625 rounds half away from zero to 0.01563 at the column's 5 decimals (arithmetic)
    expect(sitePolicySchema.parse(good)).toEqual({
      endPlayMaxIn: 0.0625,
      dialSpreadIn: 0.002,
      tapeSpreadIn: 0.01563,
      plausibleMaxIn: 0.25,
    });
  });

  it("accepts the 1/4 in ceiling and refuses anything above it, zero or below", () => {
    expect(sitePolicySchema.safeParse({ ...good, endPlayMaxIn: 0.25 }).success).toBe(true);
    for (const bad of [0.2501, 0, -0.01, Number.NaN]) {
      expect(sitePolicySchema.safeParse({ ...good, endPlayMaxIn: bad }).success).toBe(false);
    }
  });

  it("refuses spreads of zero and limits too small to keep", () => {
    expect(sitePolicySchema.safeParse({ ...good, dialSpreadIn: 0 }).success).toBe(false);
    expect(sitePolicySchema.safeParse({ ...good, tapeSpreadIn: 0.000001 }).success).toBe(false);
  });

  it("keeps the believable-reading limit between zero and 1 in", () => {
    expect(PLAUSIBLE_MAX_CEILING_IN).toBe(1);
    expect(sitePolicySchema.safeParse({ ...good, plausibleMaxIn: 1 }).success).toBe(true);
    for (const bad of [1.0001, 0, -0.25, Number.NaN]) {
      expect(sitePolicySchema.safeParse({ ...good, plausibleMaxIn: bad }).success).toBe(false);
    }
  });

  it("refuses a believable-reading limit below the removal limit, naming the field", () => {
    // 0.05 in < 1/16 in (0.0625 in): a true over-limit reading would be refused as a slip (arithmetic)
    expect(policyOrderProblems({ endPlayMaxIn: 0.0625, plausibleMaxIn: 0.05 })).toHaveProperty("plausibleMaxIn");
    expect(policyOrderProblems({ endPlayMaxIn: 0.0625, plausibleMaxIn: 0.0625 })).toEqual({});
    expect(policyOrderProblems({ endPlayMaxIn: 0.0625, plausibleMaxIn: 0.25 })).toEqual({});
  });
});
