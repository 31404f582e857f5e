// Turns one planned case into the row Tearline stores, with its findings and the stage times.
import { randomUUID } from "node:crypto";
import type { NewCase } from "../../db/schema";
import { serviceMonthsOf, summariseFieldChecks } from "../../lib/cases/compute";
import { ROOT_CAUSES } from "../../lib/classification";
import type { EndPlayPolicy } from "../../lib/field";
import { laterTime, workTime } from "./calendar";
import type { CaseSpec, RemovalSite } from "./case-spec";
import { buildFieldReport } from "./field-checks";
import { dispositionsFor, drawFindings, lubricantFor, type FindingDraft } from "./findings";
import { pickBearing, pickCar, pickClass, pickWheelDiameter, serviceMilesFor, serviceMonthsFor } from "./fleet";
import type { Rng } from "./prng";
import { contributingFor, correctiveActionFor, teardownNotesFor, verdictNotesFor } from "./teardown-words";

export type SiteRef = { id: string; policy: EndPlayPolicy };
export type SeedContext = {
  sites: Record<RemovalSite, SiteRef>;
  labId: string;
  /** Who files removals at each site (a wheel shop without its own inspector files through the lab). */
  filer: Record<RemovalSite, string>;
  analyst: string;
  engineer: string;
};

export type StageTimes = { created: Date; received?: Date; proposed?: Date; signed?: Date };
export type BuiltCase = { values: NewCase & { id: string }; findings: FindingDraft[]; times: StageTimes };

function stageTimes(rng: Rng, spec: CaseSpec): StageTimes {
  const created = workTime(rng, spec.removedOn);
  if (spec.status === "field") return { created };
  const received = laterTime(rng, created, 3, 14);
  if (spec.status === "bench" && !spec.returned) return { created, received };
  const proposed = laterTime(rng, received, 4, 20);
  if (spec.status !== "signed") return { created, received, proposed };
  return { created, received, proposed, signed: laterTime(rng, proposed, 1, 9) };
}

/** Builds a case; `teardownDone` says whether a case on the bench already has its findings. */
export function buildCase(rng: Rng, spec: CaseSpec, ctx: SeedContext, teardownDone = true): BuiltCase {
  const site = ctx.sites[spec.site];
  const months = serviceMonthsFor(rng, spec.cause);
  const bearing = pickBearing(rng, spec.cause, spec.removedOn, months, spec.bearing);
  const car = spec.car ?? pickCar(rng);
  const field = buildFieldReport(rng, spec, spec.status === "field");
  const computed = summariseFieldChecks(field.fieldChecks, site.policy, spec.trigger);
  const times = stageTimes(rng, spec);
  const atBench = spec.status !== "field";
  const tornDown = atBench && (spec.status !== "bench" || teardownDone || !!spec.returned);
  const hasVerdict = spec.status === "signoff" || spec.status === "signed" || !!spec.returned;
  const found = tornDown ? drawFindings(rng, spec.cause, spec.trigger) : [];
  const cause = ROOT_CAUSES.find((c) => c.code === spec.cause)!;
  const removalConfirmed =
    spec.cause === "no-defect" ? "no-defect" : spec.cause === "undetermined" && rng.chance(0.4) ? "no-defect" : "confirmed";
  const last = times.signed ?? times.proposed ?? times.received ?? times.created;

  const values: BuiltCase["values"] = {
    id: randomUUID(),
    number: "",
    status: spec.status,
    ...pickClass(rng),
    ...bearing,
    serviceMonths: serviceMonthsOf(bearing.mountedOn, spec.removedOn),
    serviceMiles: serviceMilesFor(rng, months),
    carMark: car.mark,
    carNumber: car.number,
    axle: spec.position?.axle ?? rng.int(1, 4),
    side: spec.position?.side ?? rng.pick(["L", "R"] as const),
    wheelDiameterIn: pickWheelDiameter(rng),
    removedOn: spec.removedOn,
    siteId: site.id,
    labSiteId: atBench || rng.chance(0.5) ? ctx.labId : null,
    trigger: spec.trigger,
    triggerDetail: field.triggerDetail,
    fieldChecks: field.fieldChecks as Record<string, unknown>,
    fieldCall: computed.fieldCall,
    fieldCallReasons: computed.fieldCallReasons,
    endPlayMeanIn: computed.endPlayMeanIn,
    fieldNotes: field.fieldNotes,
    receivedAt: times.received ?? null,
    receivedBy: times.received ? ctx.analyst : null,
    lubricant: tornDown ? lubricantFor(rng, spec.cause, found) : {},
    dispositions: tornDown ? dispositionsFor(rng, found) : {},
    teardownNotes: tornDown ? teardownNotesFor(rng, spec) : "",
    primaryCause: hasVerdict ? spec.cause : null,
    contributingCauses: hasVerdict ? contributingFor(rng, spec.cause) : [],
    confidence: hasVerdict
      ? spec.cause === "undetermined"
        ? "undetermined"
        : spec.cause === "no-defect"
          ? "confirmed"
          : rng.chance(0.68)
            ? "confirmed"
            : "probable"
      : null,
    removalConfirmed: hasVerdict ? removalConfirmed : null,
    correctiveAction: hasVerdict ? correctiveActionFor(rng, spec) : "",
    verdictNotes: hasVerdict ? verdictNotesFor(rng, spec, cause.label) : "",
    proposedBy: times.proposed ? ctx.analyst : null,
    proposedAt: times.proposed ?? null,
    signedBy: times.signed ? ctx.engineer : null,
    signedAt: times.signed ?? null,
    createdBy: ctx.filer[spec.site],
    createdAt: times.created,
    updatedBy: times.signed ? ctx.engineer : times.received ? ctx.analyst : ctx.filer[spec.site],
    updatedAt: last,
  };
  return { values, findings: found, times };
}
