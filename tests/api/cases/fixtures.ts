// A complete field report as an inspector at Marrow Junction would file it.
import { siteId } from "../../support/factories";

export async function fieldReport(overrides: Record<string, unknown> = {}) {
  return {
    siteId: await siteId("MJC"),
    removedOn: "2026-10-20",
    carMark: "CWTX",
    carNumber: String(200000 + Math.floor(Math.random() * 99999)),
    axle: 2,
    side: "R",
    wheelDiameterIn: 36,
    trigger: "hand-roll",
    triggerDetail: { felt: "roughness" },
    serial: `CW${Math.floor(Math.random() * 1e8)}`,
    bearingClass: "F",
    makerCode: "MK-T",
    mountedOn: "2020-04-20",
    serviceMiles: 420000,
    fieldChecks: {
      handRoll: {
        grid: {
          "0": { pull: { feel: "smooth", revolutions: 2 }, push: { feel: "smooth", revolutions: 2 } },
          "120": { pull: { feel: "rough", revolutions: 2 }, push: { feel: "smooth", revolutions: 2 } },
          "240": { pull: { feel: "smooth", revolutions: 2 }, push: { feel: "smooth", revolutions: 2 } },
        },
        procedure: { turnedBy: "hand", oneDirection: true, judgedBy: "feel" },
      },
      endPlay: { method: "dial", unit: "in", trials: [{ zero: "0", reading: "0.020" }, { zero: "0", reading: "0.021" }] },
      visual: [],
      confirmations: { ppe: true, blueSignal: true, wheelsetSecured: true },
    },
    fieldNotes: "Rough at 120 degrees pulled, felt twice.",
    ...overrides,
  };
}
