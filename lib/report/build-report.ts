// Builds the case report model from plain case data. Pure: the same data always gives the same report.
import { monthsBetween, wheelRevolutions } from "@/lib/field";
import { TRIGGERS as TRIGGER_LIST } from "@/lib/classification";
import { componentSections, numberPhotos } from "./component-sections";
import { damageArcs } from "./damage-map";
import { buildFieldSection } from "./field-section";
import { causeLabel, confidenceLabel, damageLabel, lubricantLabel, triggerLabel } from "@/lib/classification/labels";
import { DASH, formatDate, formatDateTime, stageLabel, text } from "./format";
import { contentHash, groupedHash } from "@/lib/cases/signature-content";
import type { CaseReport, ReportSource, Revision, Row } from "./types";

/** The signature's meaning, its hash, and whether the case still holds exactly what was signed. */
function signatureRows(s: ReportSource): Row[] {
  const c = s.case;
  if (c.status !== "signed" || !c.signedContentHash) return [];
  const now = contentHash({
    caseNumber: c.number,
    verdict: {
      primaryCause: c.primaryCause,
      contributingCauses: c.contributingCauses,
      confidence: c.confidence,
      removalConfirmed: c.removalConfirmed,
      correctiveAction: c.correctiveAction,
      verdictNotes: c.verdictNotes,
    },
    findings: s.findings.map((f) => ({
      component: f.component,
      row: f.row,
      zone: f.zone,
      damageCode: f.damageCode,
      severity: f.severity,
      clockDeg: f.clockDeg,
      arcDeg: f.arcDeg,
      lengthMm: f.lengthMm,
      widthMm: f.widthMm,
      notes: f.notes,
    })),
    photoHashes: s.photos.map((p) => p.sha256),
  });
  return [
    ["Signature means", c.signedMeaning ?? DASH],
    ["Signed content (SHA-256)", groupedHash(c.signedContentHash)],
    [
      "Signature check",
      now === c.signedContentHash
        ? "Matches: the verdict, findings and photos are exactly as signed."
        : "Does not match: the verdict, findings or photos changed after signing.",
    ],
  ];
}

function revisionOf(s: ReportSource): Revision {
  const c = s.case;
  if (c.status === "signed" && c.signedAt) {
    const signedBy = s.people.signedBy ?? "an engineer";
    const signedAt = formatDateTime(c.signedAt);
    return { kind: "signed", title: `Signed revision — signed by ${signedBy} on ${signedAt}`, signedBy, signedAt };
  }
  return { kind: "draft", title: "Draft — not signed", stage: stageLabel(c.status) };
}

function triggerDetails(code: string, detail: Record<string, unknown>): Row[] {
  const info = TRIGGER_LIST.find((t) => t.code === code);
  const rows: Row[] = [];
  for (const field of info?.fields ?? []) {
    const value = detail?.[field.key];
    if (value === undefined || value === null || value === "") continue;
    const option = field.options?.find((o) => o.code === value)?.label;
    rows.push([field.label, option ?? `${value}${field.unit ? ` ${field.unit}` : ""}`]);
  }
  return rows;
}

function serviceRows(s: ReportSource): Row[] {
  const c = s.case;
  let months = c.serviceMonths;
  if (months === null && c.mountedOn && c.removedOn) {
    try {
      months = monthsBetween(c.mountedOn, c.removedOn);
    } catch {
      months = null;
    }
  }
  const rows: Row[] = [
    ["Months since mounting", months === null ? DASH : months.toFixed(1)],
    ["Miles since mounting", c.serviceMiles === null ? "Not known" : c.serviceMiles.toLocaleString("en-US")],
  ];
  if (c.serviceMiles !== null && c.wheelDiameterIn) {
    const revs = wheelRevolutions(c.serviceMiles, c.wheelDiameterIn);
    rows.push([
      "Wheel revolutions",
      `${(revs / 1e6).toFixed(1)} million (${c.serviceMiles.toLocaleString("en-US")} mi on a ${c.wheelDiameterIn} in wheel)`,
    ]);
  }
  return rows;
}

export function buildCaseReport(s: ReportSource): CaseReport {
  const c = s.case;
  const labels = s.labels ?? {};
  const photos = numberPhotos(s);
  const { arcs, offMap } = damageArcs(s.findings, (f) => damageLabel(f.damageCode, labels.damage));
  const cls = c.bearingClass === "other" ? `Other: ${c.bearingClassOther ?? DASH}` : text(c.bearingClass);
  const car = `${c.carMark} ${c.carNumber}`.trim() || DASH;
  const position = c.axle ? `Axle ${c.axle}${c.side ? `, ${c.side === "L" ? "left" : "right"} side` : ""}` : DASH;
  const trigger = triggerLabel(c.trigger, labels.trigger);
  const cause = c.primaryCause ? causeLabel(c.primaryCause, labels.cause) : "Not proposed yet";
  const removal =
    c.removalConfirmed === "confirmed" ? "Confirmed by teardown" : c.removalConfirmed === "no-defect" ? "No defect found" : DASH;

  return {
    number: c.number,
    caseId: c.id,
    revision: revisionOf(s),
    generatedAt: formatDateTime(s.generatedAt),
    headline: [
      ["Car and position", `${car} · ${position}`],
      ["Removed", `${formatDate(c.removedOn)}${s.site ? ` at ${s.site.name}` : ""}`],
      ["Trigger", trigger],
      ["Root cause", cause],
    ],
    bearing: [
      ["Serial", text(c.serial)],
      ["Class", cls],
      ["Maker code", text(c.makerCode)],
      ["Manufactured", text(c.manufacturedYm)],
      ["Lot", text(c.lot)],
      ["Times reconditioned", text(c.timesReconditioned)],
      ["Mounted on", formatDate(c.mountedOn)],
    ],
    removal: [
      ["Car", car],
      ["Position", position],
      ["Wheel diameter", text(c.wheelDiameterIn, " in")],
      ["Removed on", formatDate(c.removedOn)],
      ["Removal site", s.site ? `${s.site.name} (${s.site.code})` : DASH],
      ["Filed by", `${s.people.createdBy ?? DASH} · ${formatDateTime(c.createdAt)}`],
    ],
    trigger: { label: trigger, details: triggerDetails(c.trigger, c.triggerDetail) },
    service: serviceRows(s),
    field: buildFieldSection(c.fieldChecks ?? {}, s.site, { fieldCall: c.fieldCall, fieldNotes: c.fieldNotes ?? "", trigger: c.trigger }),
    teardown: {
      rows: [
        ["Lab", s.lab ? `${s.lab.name} (${s.lab.code})` : DASH],
        [
          "Received",
          c.receivedAt ? `${formatDateTime(c.receivedAt)}${s.people.receivedBy ? ` by ${s.people.receivedBy}` : ""}` : "Not received yet",
        ],
        ["Lubricant", c.lubricant?.conditions?.length ? c.lubricant.conditions.map((x) => lubricantLabel(x)).join(", ") : DASH],
        ["Lubricant notes", text(c.lubricant?.notes?.trim())],
      ],
      notes: c.teardownNotes.trim(),
    },
    components: componentSections(s, photos),
    damageArcs: arcs,
    offMap,
    verdict: {
      rows: [
        ["Primary root cause", cause],
        [
          "Contributing causes",
          c.contributingCauses.length ? c.contributingCauses.map((x) => causeLabel(x, labels.cause)).join(", ") : DASH,
        ],
        ["Confidence", confidenceLabel(c.confidence)],
        ["Removal", removal],
        ["Proposed by", s.people.proposedBy ? `${s.people.proposedBy} · ${formatDateTime(c.proposedAt)}` : "Not proposed yet"],
        ["Signed by", c.status === "signed" && s.people.signedBy ? `${s.people.signedBy} · ${formatDateTime(c.signedAt)}` : "Not signed"],
        ...signatureRows(s),
      ],
      correctiveAction: c.correctiveAction.trim(),
      notes: c.verdictNotes.trim(),
      returnReason: c.status !== "signed" && c.returnReason ? c.returnReason : null,
    },
    related: s.related.map((r) => ({
      number: r.number,
      status: stageLabel(r.status),
      cause: r.primaryCause ? causeLabel(r.primaryCause, labels.cause) : DASH,
      removedOn: formatDate(r.removedOn),
      note: r.note,
    })),
    photos,
  };
}
