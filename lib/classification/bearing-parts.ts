// Parts of a freight-car journal bearing and the scales a teardown finding uses.
// Each list is the starting set that the database seed and the screens share;
// admins may extend lists later, so consumers must tolerate codes not listed here.

export const ZONES = [
  { code: "raceway", label: "Raceway" },
  { code: "rib", label: "Rib" },
  { code: "roller-end", label: "Roller end" },
  { code: "roller-body", label: "Roller body" },
  { code: "bore", label: "Bore" },
  { code: "outside-surface", label: "Outside surface" },
  { code: "other", label: "Other" },
] as const;
export type ZoneCode = (typeof ZONES)[number]["code"];

export const ROWS = [
  { code: "inboard", label: "Inboard" },
  { code: "outboard", label: "Outboard" },
] as const;
export type RowCode = (typeof ROWS)[number]["code"];

export interface ComponentInfo {
  readonly code: string;
  readonly label: string;
  /** Words that fit in a sentence: "Spall on the inboard cone". */
  readonly phrase: string;
  /** Carries a rolling-contact raceway (cup and cones). */
  readonly hasRaceway: boolean;
  /** The part spans both rows, so a finding on it should name the row (the one-piece cup). */
  readonly hasRow?: boolean;
  /** The row the part belongs to, where it belongs to one. */
  readonly fixedRow?: RowCode;
  /** Zones a finding on this part is usually placed in (a suggestion for the picker). */
  readonly zones: readonly ZoneCode[];
}

const RING_ZONES = ["raceway", "rib", "bore", "other"] as const;
const ROLLER_ZONES = ["roller-body", "roller-end", "other"] as const;
const PLAIN_ZONES = ["bore", "outside-surface", "other"] as const;

const COMPONENT_LIST = [
  { code: "cup", label: "Cup", phrase: "the cup", hasRaceway: true, hasRow: true, zones: ["raceway", "outside-surface", "other"] },
  { code: "cone-inboard", label: "Cone, inboard", phrase: "the inboard cone", hasRaceway: true, fixedRow: "inboard", zones: RING_ZONES },
  {
    code: "cone-outboard",
    label: "Cone, outboard",
    phrase: "the outboard cone",
    hasRaceway: true,
    fixedRow: "outboard",
    zones: RING_ZONES,
  },
  {
    code: "rollers-inboard",
    label: "Rollers, inboard row",
    phrase: "the inboard rollers",
    hasRaceway: false,
    fixedRow: "inboard",
    zones: ROLLER_ZONES,
  },
  {
    code: "rollers-outboard",
    label: "Rollers, outboard row",
    phrase: "the outboard rollers",
    hasRaceway: false,
    fixedRow: "outboard",
    zones: ROLLER_ZONES,
  },
  { code: "cage-inboard", label: "Cage, inboard", phrase: "the inboard cage", hasRaceway: false, fixedRow: "inboard", zones: ["other"] },
  {
    code: "cage-outboard",
    label: "Cage, outboard",
    phrase: "the outboard cage",
    hasRaceway: false,
    fixedRow: "outboard",
    zones: ["other"],
  },
  {
    code: "seal-inboard",
    label: "Seal, inboard",
    phrase: "the inboard seal",
    hasRaceway: false,
    fixedRow: "inboard",
    zones: ["outside-surface", "other"],
  },
  {
    code: "seal-outboard",
    label: "Seal, outboard",
    phrase: "the outboard seal",
    hasRaceway: false,
    fixedRow: "outboard",
    zones: ["outside-surface", "other"],
  },
  { code: "spacer", label: "Spacer", phrase: "the spacer", hasRaceway: false, zones: PLAIN_ZONES },
  { code: "backing-ring", label: "Backing ring", phrase: "the backing ring", hasRaceway: false, fixedRow: "inboard", zones: PLAIN_ZONES },
  { code: "end-cap", label: "End cap", phrase: "the end cap", hasRaceway: false, zones: ["outside-surface", "other"] },
  { code: "cap-screws", label: "Cap screws", phrase: "the cap screws", hasRaceway: false, zones: ["other"] },
  { code: "locking-plate", label: "Locking plate", phrase: "the locking plate", hasRaceway: false, zones: ["other"] },
  { code: "lubricant", label: "Lubricant (grease fill)", phrase: "the grease", hasRaceway: false, zones: ["other"] },
  { code: "journal", label: "Journal (axle end)", phrase: "the journal", hasRaceway: false, zones: ["outside-surface", "other"] },
] as const satisfies readonly ComponentInfo[];

export type ComponentCode = (typeof COMPONENT_LIST)[number]["code"];
export const COMPONENTS: readonly (ComponentInfo & { readonly code: ComponentCode })[] = COMPONENT_LIST;

export const DISPOSITIONS = [
  { code: "reuse", label: "Reuse", description: "Serviceable as it is" },
  { code: "recondition", label: "Recondition", description: "Returned to service after reconditioning" },
  { code: "scrap", label: "Scrap", description: "Not fit to return to service" },
] as const;
export type DispositionCode = (typeof DISPOSITIONS)[number]["code"];

// Tearline's own 0–4 scale.
export const SEVERITIES = [
  { code: 0, label: "None" },
  { code: 1, label: "Cosmetic" },
  { code: 2, label: "Minor, part can be reconditioned" },
  { code: 3, label: "Part condemned" },
  { code: 4, label: "Bearing condemned / safety-relevant" },
] as const;
export type SeverityCode = (typeof SEVERITIES)[number]["code"];

export const CONFIDENCES = [
  { code: "confirmed", label: "Confirmed", description: "The evidence settles the cause" },
  { code: "probable", label: "Probable", description: "The evidence points to the cause but does not settle it" },
  { code: "undetermined", label: "Undetermined", description: "Not enough evidence to decide" },
] as const;
export type ConfidenceCode = (typeof CONFIDENCES)[number]["code"];

export const LUBRICANT_CONDITIONS = [
  { code: "normal", label: "Normal", description: "Clean grease, normal colour and amount" },
  { code: "water", label: "Water in it", description: "Milky or emulsified" },
  { code: "debris", label: "Particles in it", description: "Gritty, sandy or metallic" },
  { code: "starved", label: "Too little", description: "Dry parts, little grease left" },
  { code: "degraded", label: "Degraded", description: "Dark, hardened or broken down" },
  { code: "overheated", label: "Overheated", description: "Burnt, charred or run out from heat" },
  { code: "mixed", label: "Mixed or other", description: "More than one of these, or something else (say what in the notes)" },
] as const;
export type LubricantConditionCode = (typeof LUBRICANT_CONDITIONS)[number]["code"];
