// Why a bearing came out of service, and what detail each reason asks for.
// Detector readings are recorded exactly as given: Tearline never applies a
// temperature or alarm threshold of its own, because each owner sets its own.

export type TriggerFieldKind = "number" | "text" | "choice";

export interface TriggerDetailField {
  readonly key: string;
  readonly label: string;
  readonly kind: TriggerFieldKind;
  readonly required: boolean;
  readonly unit?: "°F" | "in";
  readonly options?: readonly { readonly code: string; readonly label: string }[];
  readonly help?: string;
}

export interface TriggerInfo {
  readonly code: string;
  readonly label: string;
  readonly description: string;
  readonly fields: readonly TriggerDetailField[];
}

const DETECTOR_FIELDS = [
  { key: "detectorId", label: "Detector id", kind: "text", required: false },
  { key: "detectorLocation", label: "Detector location (milepost, site)", kind: "text", required: false },
] as const satisfies readonly TriggerDetailField[];

const NOTE: TriggerDetailField = { key: "note", label: "Note", kind: "text", required: false };

const TRIGGER_LIST = [
  {
    code: "wayside-hot",
    label: "Wayside hot-bearing alarm",
    description: "A wayside hot-bearing detector alarmed. Record the reading and the owner's threshold as given.",
    fields: [
      {
        key: "readingF",
        label: "Detector reading",
        kind: "number",
        unit: "°F",
        required: true,
        help: "As reported; detector readings can be well below the bearing's true temperature.",
      },
      {
        key: "thresholdF",
        label: "Owner's alarm threshold",
        kind: "number",
        unit: "°F",
        required: true,
        help: "The threshold the owner applied, as given.",
      },
      {
        key: "readingBasis",
        label: "Reading is",
        kind: "choice",
        required: false,
        options: [
          { code: "above-ambient", label: "Above ambient" },
          { code: "axle-difference", label: "Difference between the two bearings of the axle" },
          { code: "absolute", label: "Absolute temperature" },
        ],
      },
      ...DETECTOR_FIELDS,
    ],
  },
  {
    code: "wayside-acoustic",
    label: "Wayside acoustic alarm",
    description: "A wayside acoustic detector alarmed. Record the alarm level as given.",
    fields: [{ key: "alarmLevel", label: "Alarm level", kind: "text", required: true }, ...DETECTOR_FIELDS],
  },
  {
    code: "hand-roll",
    label: "Rough on hand roll",
    description: "Roughness or a catch was felt when the bearing was turned by hand.",
    fields: [
      {
        key: "felt",
        label: "What was felt",
        kind: "choice",
        required: false,
        options: [
          { code: "roughness", label: "Roughness" },
          { code: "catch", label: "A catch" },
          { code: "both", label: "Both" },
        ],
      },
      NOTE,
    ],
  },
  {
    code: "end-play-high",
    label: "End play over the limit",
    description: "Mounted end play measured over the limit.",
    fields: [
      { key: "endPlayIn", label: "Measured end play", kind: "number", unit: "in", required: true },
      {
        key: "method",
        label: "Measured with",
        kind: "choice",
        required: false,
        options: [
          { code: "dial-indicator", label: "Dial indicator" },
          { code: "tape", label: "Metal tape" },
        ],
      },
    ],
  },
  {
    code: "end-play-tight",
    label: "Zero end play, will not turn",
    description: "No end play, and the bearing cannot easily be turned by hand.",
    fields: [NOTE],
  },
  {
    code: "seal-grease",
    label: "Seal damage or grease loss",
    description: "A damaged or displaced seal, or grease purged from the bearing.",
    fields: [
      {
        key: "side",
        label: "Side",
        kind: "choice",
        required: false,
        options: [
          { code: "inboard", label: "Inboard" },
          { code: "outboard", label: "Outboard" },
          { code: "both", label: "Both" },
        ],
      },
      NOTE,
    ],
  },
  { code: "welding", label: "Welding arc burns", description: "Arc burns from welding current through the bearing.", fields: [NOTE] },
  {
    code: "cap-screws",
    label: "Loose or missing cap screws",
    description: "One or more cap screws loose or missing.",
    fields: [{ key: "count", label: "How many loose or missing", kind: "number", required: false }, NOTE],
  },
  { code: "backing-ring", label: "Loose backing ring", description: "The backing ring is loose on the journal.", fields: [NOTE] },
  {
    code: "wheel-removal",
    label: "Removed with the wheelset",
    description: "Came out with a wheelset removed for a wheel or axle defect.",
    fields: [{ key: "wheelsetDefect", label: "Wheel or axle defect", kind: "text", required: false }],
  },
  {
    code: "accident",
    label: "Derailment or accident",
    description: "The car was involved in a derailment or accident.",
    fields: [{ key: "reference", label: "Incident reference", kind: "text", required: false }, NOTE],
  },
  {
    code: "visual-other",
    label: "Other visible condition",
    description: "Another condition seen on the bearing, such as a cracked cup, heat discoloration or water.",
    fields: [{ key: "description", label: "What was seen", kind: "text", required: true }],
  },
  {
    code: "scheduled",
    label: "Scheduled removal",
    description: "Removed for age, mileage or a scheduled program.",
    fields: [{ key: "program", label: "Program or rule", kind: "text", required: false }],
  },
  {
    code: "other",
    label: "Other",
    description: "Any other reason, described.",
    fields: [{ key: "description", label: "Reason", kind: "text", required: true }],
  },
] as const satisfies readonly TriggerInfo[];

export type TriggerCode = (typeof TRIGGER_LIST)[number]["code"];
export const TRIGGERS: readonly (TriggerInfo & { readonly code: TriggerCode })[] = TRIGGER_LIST;

export function requiredTriggerFields(code: string): readonly string[] {
  const trigger = TRIGGERS.find((t) => t.code === code);
  return trigger ? trigger.fields.filter((f) => f.required).map((f) => f.key) : [];
}
