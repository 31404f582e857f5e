// Damage families. The first six follow the failure modes of ISO 15243:2017
// clause 5; the rest cover heat, cage, seal, grease and fastening findings that
// railway journal bearings need and the rolling-contact modes do not name.

export interface DamageFamilyInfo {
  readonly code: string;
  readonly label: string;
  /** ISO 15243:2017 mode name, where the family is one of its modes. */
  readonly isoMode: string | null;
  /** ISO 15243:2017 clause of that mode. */
  readonly isoClause: string | null;
}

const FAMILY_LIST = [
  { code: "fatigue", label: "Fatigue", isoMode: "Fatigue", isoClause: "5.1" },
  { code: "wear", label: "Wear", isoMode: "Wear", isoClause: "5.2" },
  { code: "corrosion", label: "Corrosion", isoMode: "Corrosion", isoClause: "5.3" },
  { code: "electrical", label: "Electrical damage", isoMode: "Electrical erosion", isoClause: "5.4" },
  { code: "deformation", label: "Deformation", isoMode: "Plastic deformation", isoClause: "5.5" },
  { code: "fracture", label: "Cracking", isoMode: "Fracture and cracking", isoClause: "5.6" },
  { code: "heat", label: "Heat damage", isoMode: null, isoClause: null },
  { code: "cage", label: "Cage damage", isoMode: null, isoClause: null },
  { code: "seal", label: "Seal damage", isoMode: null, isoClause: null },
  { code: "lubricant", label: "Grease condition", isoMode: null, isoClause: null },
  { code: "mounting", label: "Mounting or fastening", isoMode: null, isoClause: null },
  { code: "none", label: "No damage", isoMode: null, isoClause: null },
] as const satisfies readonly DamageFamilyInfo[];

export type DamageFamily = (typeof FAMILY_LIST)[number]["code"];
export const DAMAGE_FAMILIES: readonly (DamageFamilyInfo & { readonly code: DamageFamily })[] = FAMILY_LIST;

/** The family of any damage code, including codes admins add later ("family.detail"). */
export function familyOfCode(code: string): string {
  const dot = code.indexOf(".");
  return dot < 0 ? code : code.slice(0, dot);
}
