// What a mechanic can see on a mounted bearing, and whether it takes the bearing out.

export type VisualFindingCode =
  | "welding-damage"
  | "cap-screw-loose"
  | "cap-screw-missing"
  | "seal-damaged"
  | "grease-loss"
  | "backing-ring-loose"
  | "cup-cracked"
  | "heat-discoloration"
  | "water"
  | "other";

export type VisualFindingDefinition = {
  code: VisualFindingCode;
  label: string;
  /** true: the finding alone removes; false: a person must judge it (free "other"). */
  removes: boolean;
  /** The removal trigger it records as. */
  trigger: "welding" | "cap-screws" | "seal-grease" | "backing-ring" | "visual-other";
};

export const VISUAL_FINDINGS: readonly VisualFindingDefinition[] = Object.freeze([
  { code: "welding-damage", label: "Welding (arc) damage", removes: true, trigger: "welding" },
  { code: "cap-screw-loose", label: "Cap screw loose", removes: true, trigger: "cap-screws" },
  { code: "cap-screw-missing", label: "Cap screw missing", removes: true, trigger: "cap-screws" },
  { code: "seal-damaged", label: "Seal damaged", removes: true, trigger: "seal-grease" },
  { code: "grease-loss", label: "Grease loss", removes: true, trigger: "seal-grease" },
  { code: "backing-ring-loose", label: "Backing ring loose", removes: true, trigger: "backing-ring" },
  { code: "cup-cracked", label: "Cup cracked", removes: true, trigger: "visual-other" },
  { code: "heat-discoloration", label: "Heat discoloration", removes: true, trigger: "visual-other" },
  { code: "water", label: "Water in or on the bearing", removes: true, trigger: "visual-other" },
  { code: "other", label: "Other (describe)", removes: false, trigger: "visual-other" },
] satisfies VisualFindingDefinition[]);

export type VisualFinding = { code: VisualFindingCode; note?: string };

export function visualFindingDefinition(code: VisualFindingCode): VisualFindingDefinition {
  const found = VISUAL_FINDINGS.find((f) => f.code === code);
  if (!found) throw new RangeError(`Unknown visual finding "${code}".`);
  return found;
}
