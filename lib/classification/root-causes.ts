// The verdict: why the bearing came to need removal (or that it did not).

export interface RootCauseInfo {
  readonly code: string;
  readonly label: string;
  readonly description: string;
  /** False only when teardown found nothing: the removal was not confirmed. */
  readonly confirmsRemoval: boolean;
}

const ROOT_CAUSE_LIST = [
  { code: "water-ingress", label: "Water ingress", description: "Grease contaminated by water", confirmsRemoval: true },
  { code: "debris-ingress", label: "Debris ingress", description: "Grease contaminated by particles", confirmsRemoval: true },
  { code: "lubrication", label: "Lubrication", description: "Too little or degraded grease", confirmsRemoval: true },
  { code: "seal", label: "Seal", description: "Seal damage or failure", confirmsRemoval: true },
  {
    code: "electrical",
    label: "Electrical current",
    description: "Electric current through the bearing (welding, return current)",
    confirmsRemoval: true,
  },
  {
    code: "impact",
    label: "Impact or overload",
    description: "Impact or overload from wheel or track (flats, shelled tread, derailment)",
    confirmsRemoval: true,
  },
  { code: "mounting", label: "Mounting", description: "Improper mounting or fastening", confirmsRemoval: true },
  {
    code: "handling",
    label: "Handling",
    description: "Handling or transport damage, including vibration at standstill",
    confirmsRemoval: true,
  },
  { code: "reconditioning", label: "Reconditioning", description: "Reconditioning or assembly workmanship", confirmsRemoval: true },
  { code: "material", label: "Material or manufacture", description: "Material or manufacturing defect", confirmsRemoval: true },
  { code: "end-of-life", label: "End of life", description: "Rolling-contact fatigue at the end of a normal life", confirmsRemoval: true },
  {
    code: "no-defect",
    label: "No defect found",
    description: "Teardown found no defect: the removal was not confirmed",
    confirmsRemoval: false,
  },
  { code: "undetermined", label: "Undetermined", description: "Evidence not enough to decide", confirmsRemoval: true },
] as const satisfies readonly RootCauseInfo[];

export type RootCauseCode = (typeof ROOT_CAUSE_LIST)[number]["code"];
export const ROOT_CAUSES: readonly (RootCauseInfo & { readonly code: RootCauseCode })[] = ROOT_CAUSE_LIST;
