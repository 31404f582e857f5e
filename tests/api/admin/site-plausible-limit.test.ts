// A site's largest believable end-play reading is the site's to set: what the admin changes is what
// filing a removal there refuses; a limit that makes no sense is refused with a clear message.
import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { as } from "../../support/api";
import { db, t } from "../../support/db";
import { siteId } from "../../support/factories";
import { fieldReport } from "../cases/fixtures";

type Answer = {
  error?: string;
  fields?: Record<string, string>;
  details?: { fields?: Record<string, string> };
  site?: { plausibleMaxIn: number };
};
/** Zod refusals carry `fields`, service refusals `details.fields`. */
const fieldsOf = (a: Answer) => a.fields ?? a.details?.fields ?? {};

let mjc: string;
let before: typeof t.sites.$inferSelect;
const stored = async () => (await db.select().from(t.sites).where(eq(t.sites.id, mjc)))[0];

beforeAll(async () => {
  mjc = await siteId("MJC");
  before = await stored();
});
afterAll(async () => {
  await db.update(t.sites).set({ plausibleMaxIn: before.plausibleMaxIn, endPlayMaxIn: before.endPlayMaxIn }).where(eq(t.sites.id, mjc));
});

// 0.18 in: over the 1/16 in removal limit, under the 0.25 in starting plausibility limit (arithmetic).
const reading = () =>
  fieldReport({
    fieldChecks: {
      ...baseChecks(),
      endPlay: {
        method: "dial",
        unit: "in",
        trials: [
          { zero: "0", reading: "0.180" },
          { zero: "0", reading: "0.181" },
        ],
      },
    },
  });
const baseChecks = () => ({
  handRoll: {
    grid: {
      "0": { pull: { feel: "smooth", revolutions: 2 }, push: { feel: "smooth", revolutions: 2 } },
      "120": { pull: { feel: "smooth", revolutions: 2 }, push: { feel: "smooth", revolutions: 2 } },
      "240": { pull: { feel: "smooth", revolutions: 2 }, push: { feel: "smooth", revolutions: 2 } },
    },
    procedure: { turnedBy: "hand", oneDirection: true, judgedBy: "feel" },
  },
  visual: [],
  confirmations: { ppe: true, blueSignal: true, wheelsetSecured: true },
});

describe("the largest believable reading in the site policy", () => {
  it("starts at 0.25 in", async () => {
    // 0.25 in: Tearline's starting value (common practice, lib/field/plausibility.ts).
    expect(before.plausibleMaxIn).toBe(0.25);
  });

  it("a lowered limit makes filing refuse a reading the starting limit let through", async () => {
    const inspector = await as("inspector");
    const admin = await as("admin");
    expect((await inspector.json("POST", "/api/cases", await reading())).status).toBe(201);
    try {
      await lowered(inspector, admin);
    } finally {
      await db.update(t.sites).set({ plausibleMaxIn: 0.25 }).where(eq(t.sites.id, mjc));
    }
  });

  async function lowered(inspector: Awaited<ReturnType<typeof as>>, admin: Awaited<ReturnType<typeof as>>) {
    const patched = await admin.json<Answer>("PATCH", `/api/admin/sites/${mjc}`, { plausibleMaxIn: 0.15 });
    expect(patched.status).toBe(200);
    expect(patched.body.site?.plausibleMaxIn).toBe(0.15);

    const refused = await inspector.json<Answer>("POST", "/api/cases", await reading());
    expect(refused.status).toBe(400);
    expect(fieldsOf(refused.body).endPlay).toMatch(/more than a journal bearing can show \(limit 0\.15/);

    // Raised again, the same reading files.
    expect((await admin.json("PATCH", `/api/admin/sites/${mjc}`, { plausibleMaxIn: 0.25 })).status).toBe(200);
    expect((await inspector.json("POST", "/api/cases", await reading())).status).toBe(201);
  }

  const bad: [string, Record<string, unknown>, RegExp][] = [
    ["under the removal limit", { plausibleMaxIn: 0.05 }, /must be at least the end-play limit \(0\.0625 in\)/],
    ["above 1 in", { plausibleMaxIn: 1.5 }, /at most 1 in \(25\.4 mm\)/],
    ["zero", { plausibleMaxIn: 0 }, /more than zero/],
    ["sent as text", { plausibleMaxIn: "0.2" }, /number of inches/],
  ];
  for (const [what, body, message] of bad) {
    it(`refuses a limit ${what} with a clear message and changes nothing`, async () => {
      const res = await (await as("admin")).json<Answer>("PATCH", `/api/admin/sites/${mjc}`, body);
      expect(res.status).toBe(400);
      expect(JSON.stringify(res.body)).toMatch(message);
      expect((await stored()).plausibleMaxIn).toBe(0.25);
    });
  }

  it("refuses a removal limit above the believable limit", async () => {
    const res = await (await as("admin")).json<Answer>("PATCH", `/api/admin/sites/${mjc}`, { endPlayMaxIn: 0.2, plausibleMaxIn: 0.15 });
    expect(res.status).toBe(400);
    expect(fieldsOf(res.body).plausibleMaxIn).toMatch(/must be at least the end-play limit \(0\.2 in\)/);
    expect((await stored()).endPlayMaxIn).toBe(before.endPlayMaxIn);
  });
});
