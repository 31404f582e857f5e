// Loads the invented demo casebook: about 150 cases over two years, with findings, history and links.
// Seeded random draws make it the same on every run.
import type { Db } from "../../db";
import { caseEvents, caseLinks, cases, findings } from "../../db/schema";
import { nextCaseNumber } from "../../db/queries/case-number";
import { buildCase, type BuiltCase } from "./case-builder";
import { planDemoCases } from "./demo-plan";
import { buildHistory, type EventDraft } from "./history";
import { buildYieldStories } from "./demo-yield-stories";
import { createRng } from "./prng";
import { loadSeedContext } from "./seed-context";

export const DEMO_SEED = 20261130;

export type DemoSeedResult = { cases: number; findings: number; events: number; links: number };

export async function seedDemoCases(db: Db, seed = DEMO_SEED): Promise<DemoSeedResult> {
  const ctx = await loadSeedContext(db);
  const rng = createRng(seed);
  const { specs, links } = planDemoCases(rng);

  const built: { key: string; c: BuiltCase; events: EventDraft[] }[] = [];
  let benchSeen = 0;
  for (const spec of specs) {
    // Half the bearings on the bench are still waiting to be taken down.
    const teardownDone = spec.status !== "bench" || benchSeen++ % 2 === 0;
    const c = buildCase(rng, spec, ctx, teardownDone);
    const events = buildHistory(rng, spec, c, ctx);
    c.values.version = events.length;
    built.push({ key: spec.key, c, events });
  }
  // The removal-yield stories draw on their own, so the cases above stay as they were.
  const storyRng = createRng(seed + 17);
  for (const { spec, built: c } of buildYieldStories(storyRng, ctx)) {
    const events = buildHistory(storyRng, spec, c, ctx);
    c.values.version = events.length;
    built.push({ key: spec.key, c, events });
  }
  const byKey = new Map(built.map((b) => [b.key, b.c.values]));

  return db.transaction(async (tx) => {
    // Numbers in removal order, through the same counter the app uses.
    for (const b of built) b.c.values.number = await nextCaseNumber(tx, Number(b.c.values.removedOn!.slice(0, 4)));
    await tx.insert(cases).values(built.map((b) => b.c.values));
    const findingRows = built.flatMap((b) =>
      b.c.findings.map((f) => ({ ...f, caseId: b.c.values.id, createdBy: ctx.analyst, createdAt: f.createdAt ?? b.c.values.updatedAt })),
    );
    if (findingRows.length) await tx.insert(findings).values(findingRows);
    const eventRows = built.flatMap((b) => b.events.map((e) => ({ ...e, caseId: b.c.values.id })));
    await tx.insert(caseEvents).values(eventRows);
    const linkRows = links.flatMap((l) => {
      const a = byKey.get(l.from)!;
      const z = byKey.get(l.to)!;
      // Linked when the later case reached the lab.
      const base = { note: l.note, createdBy: ctx.engineer, createdAt: z.receivedAt ?? z.createdAt };
      return [
        { caseId: a.id, relatedId: z.id, ...base },
        { caseId: z.id, relatedId: a.id, ...base },
      ];
    });
    if (linkRows.length) await tx.insert(caseLinks).values(linkRows);
    return { cases: built.length, findings: findingRows.length, events: eventRows.length, links: linkRows.length / 2 };
  });
}
