// The demo casebook generator, without a database: every planned case obeys the app's own rules.
import { describe, expect, it } from "vitest";
import { fieldChecksSchema, findingSchema } from "@/lib/cases/schemas";
import { summariseFieldChecks } from "@/lib/cases/compute";
import { verdictProblems } from "@/lib/cases/workflow";
import { DAMAGE_CODES, ROOT_CAUSES, TRIGGERS, requiredTriggerFields } from "@/lib/classification";
import { DEFAULT_END_PLAY_POLICY, evaluateEndPlay } from "@/lib/field";
import { buildCase, type SeedContext } from "../../../scripts/seed/case-builder";
import { planDemoCases } from "../../../scripts/seed/demo-plan";
import { buildHistory } from "../../../scripts/seed/history";
import { createRng } from "../../../scripts/seed/prng";

const policy = { ...DEFAULT_END_PLAY_POLICY };
const ctx: SeedContext = {
  sites: { MJC: { id: "site-mjc", policy }, PYC: { id: "site-pyc", policy }, OSW: { id: "site-osw", policy } },
  labId: "site-cfl",
  filer: { MJC: "u-insp", PYC: "u-insp2", OSW: "u-analyst" },
  analyst: "u-analyst",
  engineer: "u-engineer",
};

function buildAll(seed = 42) {
  const rng = createRng(seed);
  const plan = planDemoCases(rng);
  return { plan, built: plan.specs.map((spec) => ({ spec, c: buildCase(rng, spec, ctx), rng })) };
}

describe("demo plan", () => {
  it("comes out the same for the same seed", () => {
    const strip = (s: ReturnType<typeof planDemoCases>) => s.specs.map((x) => [x.key, x.removedOn, x.site, x.status]);
    expect(strip(planDemoCases(createRng(7)))).toEqual(strip(planDemoCases(createRng(7))));
  });

  it("covers every trigger, cause, stage and removal shop", () => {
    const { specs } = planDemoCases(createRng(42));
    expect(specs.length).toBeGreaterThanOrEqual(140); // demo scenario: about 150 cases
    expect(new Set(specs.map((s) => s.trigger))).toEqual(new Set(TRIGGERS.map((t) => t.code)));
    expect(new Set(specs.map((s) => s.cause))).toEqual(new Set(ROOT_CAUSES.map((c) => c.code)));
    expect(new Set(specs.map((s) => s.status))).toEqual(new Set(["field", "bench", "signoff", "signed"]));
    expect(new Set(specs.map((s) => s.site))).toEqual(new Set(["MJC", "PYC", "OSW"]));
  });

  it("keeps the newest removals in the early stages and most cases signed", () => {
    const { specs } = planDemoCases(createRng(42));
    const latestSigned = specs
      .filter((s) => s.status === "signed")
      .map((s) => s.removedOn)
      .sort()
      .at(-1)!;
    const earliestField = specs
      .filter((s) => s.status === "field")
      .map((s) => s.removedOn)
      .sort()[0];
    expect(earliestField > latestSigned).toBe(true);
    expect(specs.filter((s) => s.status === "signed").length / specs.length).toBeGreaterThan(0.7); // demo scenario: most signed
  });
});

describe("built demo cases", () => {
  const { built } = buildAll();

  it("store field checks the schema accepts, with the computed call beside them", () => {
    for (const { c } of built) {
      const parsed = fieldChecksSchema.safeParse(c.values.fieldChecks);
      expect(parsed.success, c.values.trigger).toBe(true);
      const again = summariseFieldChecks(parsed.data!, policy, c.values.trigger);
      expect(c.values.fieldCall).toBe(again.fieldCall);
      expect(c.values.endPlayMeanIn).toBe(again.endPlayMeanIn);
    }
  });

  it("give each trigger the detail it requires and checks that match it", () => {
    for (const { spec, c } of built) {
      for (const key of requiredTriggerFields(spec.trigger)) expect(c.values.triggerDetail?.[key], `${spec.trigger}.${key}`).toBeDefined();
      const checks = fieldChecksSchema.parse(c.values.fieldChecks);
      if (spec.trigger === "hand-roll") {
        const feels = Object.values(checks.handRoll!.grid).flatMap((d) => [d?.pull?.feel, d?.push?.feel]);
        expect(feels.some((f) => f === "rough" || f === "catch")).toBe(true);
      }
      if (spec.trigger === "end-play-high") {
        // More than 1/16 in = 0.0625 in removes (common practice for North American freight interchange).
        const ep = evaluateEndPlay(checks.endPlay!, policy);
        expect(ep.call).toBe("over-limit");
        expect(ep.call === "over-limit" && ep.meanIn).toBeGreaterThan(0.0625);
      }
      if (spec.trigger === "end-play-tight") expect(evaluateEndPlay(checks.endPlay!, policy).call).toBe("tight-remove");
      if (spec.trigger === "wayside-hot") expect(c.values.triggerDetail?.readingBasis).toBe("above-ambient");
    }
  });

  it("record findings the finding form would accept, with known damage codes", () => {
    const known = new Set(DAMAGE_CODES.map((d) => d.code));
    for (const { spec, c } of built) {
      if (spec.status === "signoff" || spec.status === "signed") expect(c.findings.length).toBeGreaterThan(0);
      for (const f of c.findings) {
        expect(known.has(f.damageCode as never), f.damageCode).toBe(true);
        expect(findingSchema.safeParse(f).success, JSON.stringify(f)).toBe(true);
      }
    }
  });

  it("propose only verdicts the sign-off rules accept", () => {
    for (const { spec, c } of built) {
      if (spec.status !== "signoff" && spec.status !== "signed") continue;
      const v = c.values;
      expect(
        verdictProblems({
          primaryCause: v.primaryCause ?? null,
          confidence: v.confidence ?? null,
          removalConfirmed: v.removalConfirmed ?? null,
          findingCount: c.findings.length,
        }),
      ).toEqual([]);
      if (spec.cause === "no-defect") expect(v.removalConfirmed).toBe("no-defect");
      else if (spec.cause !== "undetermined") expect(v.removalConfirmed).toBe("confirmed");
      if (spec.status === "signed") expect(v.signedBy && v.signedAt).toBeTruthy();
    }
  });

  it("wears out late and fails early by cause (Weibull shape above and below 1)", () => {
    const months = (cause: string) => built.filter(({ spec }) => spec.cause === cause).map(({ c }) => c.values.serviceMonths!);
    const mean = (xs: number[]) => xs.reduce((a, b) => a + b, 0) / xs.length;
    const early = [...months("reconditioning"), ...months("mounting")];
    // End-of-life fatigue comes after years; workmanship faults within the first year or two (common practice).
    expect(mean(months("end-of-life"))).toBeGreaterThan(84);
    expect(mean(early)).toBeLessThan(24);
  });

  it("writes a history whose steps follow the stages in time order", () => {
    for (const { spec, c, rng } of built) {
      const events = buildHistory(rng, spec, c, ctx);
      const times = events.map((e) => e.at.getTime());
      expect(times).toEqual([...times].sort((a, b) => a - b));
      expect(events[0].action).toBe("created");
      const steps = events.map((e) => e.action).filter((a) => ["receive", "propose", "sign", "return", "reopen"].includes(a));
      const expected = {
        field: [],
        bench: spec.returned ? ["receive", "propose", "return"] : ["receive"],
        signoff: ["receive", "propose"],
      } as Record<string, string[]>;
      if (spec.status !== "signed") expect(steps).toEqual(expected[spec.status]);
      else expect(steps.at(-1)).toBe("sign");
      if (c.values.signedAt) expect(c.values.signedAt.getTime()).toBeLessThanOrEqual(Date.parse("2026-11-30T16:00:00Z"));
    }
  });
});
