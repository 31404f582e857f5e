import type { RemovalDraft } from "@/components/removal/form-state";
import type { CaseDetail } from "@/lib/cases/types";
import { fieldChecksSchema, BEARING_CLASSES } from "@/lib/cases/schemas";

/** The stored case as the removal form edits it. */
export function toDraft(c: CaseDetail): RemovalDraft {
  const checks = fieldChecksSchema.safeParse(c.fieldChecks);
  return {
    siteId: c.siteId,
    removedOn: c.removedOn,
    carMark: c.carMark,
    carNumber: c.carNumber,
    axle: c.axle,
    side: c.side,
    wheelDiameterIn: c.wheelDiameterIn,
    trigger: c.trigger,
    triggerDetail: c.triggerDetail as RemovalDraft["triggerDetail"],
    serial: c.serial,
    bearingClass: (BEARING_CLASSES as readonly string[]).includes(c.bearingClass)
      ? (c.bearingClass as RemovalDraft["bearingClass"])
      : undefined,
    bearingClassOther: c.bearingClassOther,
    makerCode: c.makerCode,
    manufacturedYm: c.manufacturedYm,
    lot: c.lot,
    timesReconditioned: c.timesReconditioned,
    mountedOn: c.mountedOn,
    serviceMiles: c.serviceMiles,
    fieldNotes: c.fieldNotes,
    fieldChecks: checks.success
      ? {
          ...checks.data,
          endPlay: checks.data.endPlay ?? { method: "dial", unit: "in", trials: [{ zero: "0", reading: "" }] },
          handRoll: checks.data.handRoll ?? { grid: {}, procedure: {} },
        }
      : { visual: [], confirmations: {} },
  };
}
