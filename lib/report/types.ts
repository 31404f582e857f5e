// The case report's input (plain data loaded from the database) and its output model, which the
// PDF and the printable page both draw from, so the two always say the same thing.
import type { FieldMessageLevel } from "@/lib/field";

type DateLike = Date | string | null;

export type ReportSourceCase = {
  id: string;
  number: string;
  status: "field" | "bench" | "signoff" | "signed";
  serial: string;
  bearingClass: string;
  bearingClassOther: string | null;
  makerCode: string;
  manufacturedYm: string | null;
  lot: string | null;
  timesReconditioned: number | null;
  mountedOn: string | null;
  carMark: string;
  carNumber: string;
  axle: number | null;
  side: "L" | "R" | null;
  wheelDiameterIn: number | null;
  removedOn: string | null;
  trigger: string;
  triggerDetail: Record<string, unknown>;
  serviceMonths: number | null;
  serviceMiles: number | null;
  fieldChecks: Record<string, unknown>;
  fieldCall: string | null;
  fieldNotes: string;
  receivedAt: DateLike;
  lubricant: { conditions?: string[]; notes?: string };
  dispositions: Record<string, string>;
  teardownNotes: string;
  primaryCause: string | null;
  contributingCauses: string[];
  confidence: string | null;
  removalConfirmed: string | null;
  correctiveAction: string;
  verdictNotes: string;
  proposedAt: DateLike;
  signedAt: DateLike;
  /** What the signer confirmed and the SHA-256 of the signed content (absent on older signatures). */
  signedMeaning?: string | null;
  signedContentHash?: string | null;
  returnReason: string | null;
  createdAt: DateLike;
  updatedAt: DateLike;
};

export type ReportSourceFinding = {
  id: string;
  component: string;
  row: string | null;
  damageCode: string;
  severity: number;
  clockDeg: number | null;
  arcDeg: number | null;
  zone: string | null;
  lengthMm: number | null;
  widthMm: number | null;
  notes: string;
};

export type ReportSourcePhoto = {
  id: string;
  component: string | null;
  row: string | null;
  findingId: string | null;
  clockDeg: number | null;
  caption: string;
  sha256: string;
  contentType: string;
  bytes: number;
  width: number;
  height: number;
  fileName: string;
  takenAt: DateLike;
};

export type ReportSourceSite = {
  code: string;
  name: string;
  endPlayMaxIn: number;
  dialSpreadIn: number;
  tapeSpreadIn: number;
  plausibleMaxIn?: number;
};

export type ReportSource = {
  case: ReportSourceCase;
  site: ReportSourceSite | null;
  lab: { code: string; name: string } | null;
  /** Names of the people who filed, received, proposed and signed. */
  people: { createdBy?: string | null; receivedBy?: string | null; proposedBy?: string | null; signedBy?: string | null };
  findings: ReportSourceFinding[];
  photos: ReportSourcePhoto[];
  related: { number: string; status: string; primaryCause: string | null; removedOn: string | null; note: string }[];
  /** Labels an admin gave codes in the database; the built-in lists fill any gap. */
  labels?: { cause?: Record<string, string>; trigger?: Record<string, string>; damage?: Record<string, string> };
  generatedAt: Date;
};

export type Row = [label: string, value: string];
export type Note = { level: FieldMessageLevel; text: string };

export type Revision =
  | { kind: "signed"; title: string; signedBy: string; signedAt: string }
  | { kind: "draft"; title: string; stage: string };

export type EndPlaySection = {
  method: string;
  unitNote: string;
  trials: { trial: number; zero: string; reading: string; endPlayIn: string; endPlayMm: string }[];
  arithmetic: Row[];
  call: string;
  removes: boolean;
  notes: Note[];
};

export type HandRollSection = {
  /** One row per axle position: position, cup pulled, cup pushed. */
  grid: [string, string, string][];
  procedure: Row[];
  result: string;
  notes: Note[];
};

export type FieldSection = {
  handRoll: HandRollSection | null;
  endPlay: EndPlaySection | null;
  visual: Row[];
  confirmations: Row[];
  call: { call: "keep" | "remove" | "undecided"; label: string; reasons: Note[] };
  /** The call stored with the case, when it differs from the one recomputed here. */
  storedCallDiffers: string | null;
  notes: string;
  /** Safety confirmations that applied and were left unticked at filing, each with its caution. */
  safetyFlag: string[];
};

export type ReportFinding = {
  id: string;
  damage: string;
  code: string;
  isoMode: string | null;
  severity: number;
  severityLabel: string;
  where: string;
  size: string;
  notes: string;
  photoNumbers: number[];
};

export type ReportPhoto = {
  id: string;
  number: number;
  caption: string;
  component: string;
  sha256: string;
  fileName: string;
  contentType: string;
  bytes: number;
};

export type ComponentSection = {
  code: string;
  label: string;
  disposition: string | null;
  findings: ReportFinding[];
  photos: ReportPhoto[];
};

export type DamageArc = {
  ring: "cup" | "cone";
  row: "inboard" | "outboard";
  startDeg: number;
  endDeg: number;
  severity: number;
  label: string;
  estimated: boolean;
};

export type CaseReport = {
  number: string;
  caseId: string;
  revision: Revision;
  generatedAt: string;
  headline: Row[];
  bearing: Row[];
  removal: Row[];
  trigger: { label: string; details: Row[] };
  service: Row[];
  field: FieldSection;
  teardown: { rows: Row[]; notes: string };
  components: ComponentSection[];
  damageArcs: DamageArc[];
  /** Findings with no place on the raceway map (rollers, seals, or no clock position). */
  offMap: number;
  verdict: { rows: Row[]; correctiveAction: string; notes: string; returnReason: string | null };
  related: { number: string; status: string; cause: string; removedOn: string; note: string }[];
  photos: ReportPhoto[];
};
