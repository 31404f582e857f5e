// The read rule exists twice on purpose: as SQL (db/queries/case-scope.ts) for every query, and as a
// pure function (lib/cases/access.ts) for rows in hand. Here both judge every case in the database
// for each kind of reader, and must agree case by case (and the SQL over the list's count cells in sum).
import { describe, expect, test } from "vitest";
import { eq, sql } from "drizzle-orm";
import { readableCases, readableIn } from "../../../db/queries/case-scope";
import { canReadCase } from "../../../lib/cases/access";
import { db, t } from "../../support/db";
import { createCase, siteId } from "../../support/factories";

type Viewer = { id: string; role: string; siteId: string | null };

async function viewers(): Promise<[string, Viewer][]> {
  const people = await db.select({ id: t.user.id, role: t.user.role, siteId: t.user.siteId, email: t.user.email }).from(t.user);
  const inspector = people.find((p) => p.role === "inspector")!;
  return [
    ...people.map((p): [string, Viewer] => [p.email, { id: p.id, role: p.role, siteId: p.siteId }]),
    ["inspector without a home shop", { id: inspector.id, role: "inspector", siteId: null }],
    ["a role that does not exist", { id: inspector.id, role: "visitor", siteId: inspector.siteId }],
  ];
}

describe("one read rule, two forms", () => {
  test("the SQL rule and the pure rule pick the same cases for every reader", async () => {
    // Cases at every shop, filed by an inspector, by an analyst and by nobody on record.
    const [inspectorRow] = await db.select({ id: t.user.id }).from(t.user).where(eq(t.user.role, "inspector"));
    for (const code of ["MJC", "PYC", "OSW"]) {
      await createCase({ siteId: await siteId(code), createdBy: inspectorRow.id });
      await createCase({ siteId: await siteId(code), createdBy: null });
    }
    await createCase({ siteId: null, createdBy: inspectorRow.id });
    const all = await db.select({ id: t.cases.id, createdBy: t.cases.createdBy, siteId: t.cases.siteId }).from(t.cases);
    expect(all.length).toBeGreaterThan(7);

    for (const [who, viewer] of await viewers()) {
      const bySql = new Set((await db.select({ id: t.cases.id }).from(t.cases).where(readableCases(viewer))).map((r) => r.id));
      const byAlias = new Set(
        ((await db.execute(sql`select id from cases "c" where ${readableIn(viewer, "c") ?? sql`true`}`)).rows as { id: string }[]).map(
          (r) => r.id,
        ),
      );
      const byRule = new Set(all.filter((c) => canReadCase(viewer, c)).map((c) => c.id));
      expect([...bySql].sort(), who).toEqual([...byRule].sort());
      expect([...byAlias].sort(), who).toEqual([...byRule].sort());
      // The list's total: the same rule over the count cells' columns sums to the same cases.
      const cells = t.caseListCounts;
      const [summed] = await db
        .select({ n: sql<number>`coalesce(sum(${cells.n}), 0)`.mapWith(Number) })
        .from(cells)
        .where(readableCases(viewer, { createdBy: cells.createdBy, siteId: cells.siteId }));
      expect(summed.n, who).toBe(byRule.size);
    }
  });
});
