// The case history a demo case would have if people had worked it through the app:
// created, teardown entries, verdict, and each stage step (with returns and reopenings).
import type { FieldChange } from "../../db/schema/history";
import { DAY_MS, DEMO_NOW, laterTime } from "./calendar";
import type { BuiltCase, SeedContext } from "./case-builder";
import type { CaseSpec } from "./case-spec";
import type { Rng } from "./prng";

/** The action words Tearline's own case writes record (db/queries/case-write.ts, lib/cases/workflow.ts). */
export const HISTORY_ACTIONS = {
  created: "created",
  received: "receive",
  proposed: "propose",
  signed: "sign",
  returned: "return",
  reopened: "reopen",
  teardown: "teardown-saved",
  verdict: "verdict-saved",
  finding: "finding-added",
} as const;

export type EventDraft = { at: Date; userId: string; action: string; changes: FieldChange[]; reason: string | null };

const RETURN_REASONS = [
  "The spall photos do not give the clock position; add it and the cup row.",
  "Cause reads as water but the seal is not described; check both seals and say which side.",
  "Lubricant notes are empty; fill them in before I sign.",
  "Please add the end play measured on the bench.",
];
const REOPEN_REASONS = [
  "Maker's lab report came back; recheck the cause against it.",
  "Second removal on the same car; reopening to recheck the findings.",
  "Photos of the cone bore were missing from the record.",
];

const iso = (d: Date | null | undefined) => (d ? d.toISOString() : null);
const between = (a: Date, b: Date, f: number) => new Date(a.getTime() + (b.getTime() - a.getTime()) * f);

/** Builds the events and moves the case's own times to match the last steps. Mutates `built.values`. */
export function buildHistory(rng: Rng, spec: CaseSpec, built: BuiltCase, ctx: SeedContext): EventDraft[] {
  const v = built.values;
  const t = built.times;
  const events: EventDraft[] = [];
  const add = (at: Date, userId: string, action: string, changes: FieldChange[], reason: string | null = null) =>
    events.push({ at, userId, action, changes, reason });
  const status = (from: string | null, to: string): FieldChange => ({ field: "status", from, to });

  add(t.created, v.createdBy!, HISTORY_ACTIONS.created, [
    ...[
      "serial",
      "bearingClass",
      "makerCode",
      "carMark",
      "carNumber",
      "axle",
      "side",
      "removedOn",
      "siteId",
      "trigger",
      "triggerDetail",
      "fieldChecks",
      "fieldCall",
      "endPlayMeanIn",
      "serviceMonths",
    ]
      .map((field) => ({ field, from: null, to: (v as Record<string, unknown>)[field] ?? null }))
      .filter((c) => c.to !== null && c.to !== ""),
  ]);
  if (!t.received) return events;

  add(t.received, ctx.analyst, HISTORY_ACTIONS.received, [
    status("field", "bench"),
    { field: "receivedAt", from: null, to: iso(t.received) },
    { field: "receivedBy", from: null, to: ctx.analyst },
  ]);
  // A verdict returned before signing was first proposed earlier than the final proposal.
  const firstProposal = t.proposed && spec.returned && spec.status === "signed" ? between(t.received, t.proposed, 0.45) : t.proposed;
  const benchEnd = firstProposal ?? new Date(Math.min(DEMO_NOW.getTime(), t.received.getTime() + 5 * DAY_MS));
  built.findings.forEach((f, i) => {
    const at = between(t.received!, benchEnd, (0.15 + (0.5 * i) / Math.max(1, built.findings.length)) * 0.9);
    f.createdAt = at;
    add(at, ctx.analyst, HISTORY_ACTIONS.finding, [
      { field: `finding ${f.component}`, from: null, to: `${f.damageCode} (severity ${f.severity})` },
    ]);
  });
  if (v.teardownNotes) {
    add(between(t.received, benchEnd, 0.75), ctx.analyst, HISTORY_ACTIONS.teardown, [
      { field: "lubricant", from: {}, to: v.lubricant },
      { field: "dispositions", from: {}, to: v.dispositions },
      { field: "teardownNotes", from: "", to: v.teardownNotes },
    ]);
  }
  if (!t.proposed) return events;

  const verdictChanges = ["primaryCause", "contributingCauses", "confidence", "removalConfirmed", "correctiveAction"].map((field) => ({
    field,
    from: field === "contributingCauses" ? [] : field === "correctiveAction" ? "" : null,
    to: (v as Record<string, unknown>)[field],
  }));
  const proposedAt = firstProposal!;
  add(between(t.received, proposedAt, 0.9), ctx.analyst, HISTORY_ACTIONS.verdict, verdictChanges);
  add(proposedAt, ctx.analyst, HISTORY_ACTIONS.proposed, [
    status("bench", "signoff"),
    { field: "proposedAt", from: null, to: iso(proposedAt) },
    { field: "proposedBy", from: null, to: ctx.analyst },
  ]);

  if (spec.returned) {
    const reason = rng.pick(RETURN_REASONS);
    const returnedAt = spec.status === "signed" ? between(proposedAt, t.proposed, 0.4) : laterTime(rng, proposedAt, 1, 5);
    add(
      returnedAt,
      ctx.engineer,
      HISTORY_ACTIONS.returned,
      [status("signoff", "bench"), { field: "returnReason", from: null, to: reason }],
      reason,
    );
    if (spec.status !== "signed") {
      Object.assign(v, { status: "bench", returnReason: reason, updatedBy: ctx.engineer, updatedAt: returnedAt });
      return events;
    }
    add(t.proposed, ctx.analyst, HISTORY_ACTIONS.proposed, [
      status("bench", "signoff"),
      { field: "proposedAt", from: iso(proposedAt), to: iso(t.proposed) },
      { field: "returnReason", from: reason, to: null },
    ]);
  }
  if (!t.signed) return events;
  add(t.signed, ctx.engineer, HISTORY_ACTIONS.signed, [
    status("signoff", "signed"),
    { field: "signedAt", from: null, to: iso(t.signed) },
    { field: "signedBy", from: null, to: ctx.engineer },
  ]);

  if (spec.reopened) {
    const reason = rng.pick(REOPEN_REASONS);
    const reopenedAt = laterTime(rng, t.signed, 15, 60);
    add(
      reopenedAt,
      ctx.engineer,
      HISTORY_ACTIONS.reopened,
      [
        status("signed", "bench"),
        { field: "signedAt", from: iso(t.signed), to: null },
        { field: "signedBy", from: ctx.engineer, to: null },
      ],
      reason,
    );
    const again = laterTime(rng, reopenedAt, 2, 8);
    add(again, ctx.analyst, HISTORY_ACTIONS.proposed, [
      status("bench", "signoff"),
      { field: "proposedAt", from: iso(t.proposed), to: iso(again) },
    ]);
    const signedAgain = laterTime(rng, again, 1, 4);
    add(signedAgain, ctx.engineer, HISTORY_ACTIONS.signed, [
      status("signoff", "signed"),
      { field: "signedAt", from: null, to: iso(signedAgain) },
      { field: "signedBy", from: null, to: ctx.engineer },
    ]);
    Object.assign(v, { proposedAt: again, signedAt: signedAgain, updatedAt: signedAgain });
  }
  return events;
}
