// The report renders for the seeded demo casebook as people will first see it, one case per stage.
import { eq, sql } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { as } from "../../support/api";
import { db, t } from "../../support/db";
import { pdfPageCount, pdfPages } from "../../support/pdf-text";

describe("reports of the demo casebook", () => {
  it("render for a seeded case in each stage, with the right revision and numbered pages", async () => {
    const admin = await as("admin");
    for (const status of ["field", "bench", "signoff", "signed"] as const) {
      // The demo seed's case with the most findings in this stage (test factories use TST serials).
      const [c] = await db
        .select({
          id: t.cases.id,
          number: t.cases.number,
          n: sql<number>`(select count(*) from findings f where f.case_id = cases.id)::int`.as("n"),
        })
        .from(t.cases)
        .where(sql`${eq(t.cases.status, status)} and ${t.cases.serial} not like 'TST%'`)
        .orderBy(sql`n desc`, t.cases.number)
        .limit(1);
      expect(c, `a seeded case in stage ${status}`).toBeDefined();
      const res = await admin.get(`/api/cases/${c.id}/report.pdf`);
      expect(res.status).toBe(200);
      const pdf = new Uint8Array(await res.arrayBuffer());
      const pages = pdfPages(pdf);
      const count = pdfPageCount(pdf);
      expect(pages).toHaveLength(count);
      pages.forEach((p, i) => expect(p).toContain(`${c.number} · page ${i + 1} of ${count}`));
      const text = pages.join("\n");
      if (status === "signed") expect(text).toContain("Signed revision — signed by");
      else expect(text).toContain("Draft — not signed");
    }
  });
});
