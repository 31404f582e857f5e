// Tearline's damage classification: what the analyst sees, named by mode.
// The cause belongs in the verdict, not here (ISO 15243 classifies by appearance).
import { DAMAGE_FAMILIES, type DamageFamily } from "./damage-families";
import { DAMAGE_SYNONYMS } from "./damage-synonyms";

interface BaseDamageCode {
  readonly code: string;
  readonly label: string;
  readonly family: DamageFamily;
  /** ISO 15243:2017 mode wording, where the code is one of its modes. */
  readonly isoMode: string | null;
  readonly looksLike: string;
}

const BASE_LIST = [
  {
    code: "fatigue.subsurface",
    label: "Subsurface spall",
    family: "fatigue",
    isoMode: "Fatigue, subsurface initiated",
    looksLike: "Metal flaked out of the raceway in the load zone, deep, sharp-edged",
  },
  {
    code: "fatigue.surface",
    label: "Surface distress",
    family: "fatigue",
    isoMode: "Fatigue, surface initiated",
    looksLike: "Frosted grey patches, shallow micro-pits",
  },
  {
    code: "wear.abrasive",
    label: "Abrasive wear",
    family: "wear",
    isoMode: "Wear, abrasive",
    looksLike: "Dull lapped surfaces, grown end play",
  },
  {
    code: "wear.adhesive",
    label: "Smearing / scoring",
    family: "wear",
    isoMode: "Wear, adhesive",
    looksLike: "Material transfer; scored roller ends and cone rib",
  },
  {
    code: "corrosion.moisture",
    label: "Water etch",
    family: "corrosion",
    isoMode: "Corrosion, moisture",
    looksLike: "Dark stains or etching, often at roller spacing",
  },
  {
    code: "corrosion.fretting",
    label: "Fretting",
    family: "corrosion",
    isoMode: "Corrosion, frictional (fretting)",
    looksLike: "Red-brown oxide on the cone bore or cup outside",
  },
  {
    code: "corrosion.false-brinell",
    label: "False brinelling",
    family: "corrosion",
    isoMode: "Corrosion, frictional (false brinelling)",
    looksLike: "Shallow marks at roller spacing without displaced metal; vibration at standstill",
  },
  {
    code: "electrical.arc",
    label: "Arc burn",
    family: "electrical",
    isoMode: "Electrical erosion, excessive current",
    looksLike: "Craters, fused or re-hardened spots",
  },
  {
    code: "electrical.fluting",
    label: "Fluting",
    family: "electrical",
    isoMode: "Electrical erosion, current leakage",
    looksLike: "Evenly spaced grey bands across the raceway",
  },
  {
    code: "deformation.overload",
    label: "True brinelling",
    family: "deformation",
    isoMode: "Plastic deformation, overload",
    looksLike: "Dents at roller spacing with displaced metal; impact",
  },
  {
    code: "deformation.debris",
    label: "Debris dents",
    family: "deformation",
    isoMode: "Plastic deformation, indentation from particles",
    looksLike: "Many small dents with raised rims",
  },
  {
    code: "deformation.handling",
    label: "Handling nicks",
    family: "deformation",
    isoMode: "Plastic deformation (handling)",
    looksLike: "Isolated nicks and scratches",
  },
  {
    code: "fracture.forced",
    label: "Forced fracture",
    family: "fracture",
    isoMode: "Cracking, forced fracture",
    looksLike: "Crack through a cone, cup or roller",
  },
  {
    code: "fracture.fatigue",
    label: "Fatigue crack",
    family: "fracture",
    isoMode: "Cracking, fatigue fracture",
    looksLike: "Crack with progression marks",
  },
  {
    code: "fracture.thermal",
    label: "Heat checking",
    family: "fracture",
    isoMode: "Cracking, thermal cracking",
    looksLike: "Fine crack network from rubbing heat",
  },
  {
    code: "heat.discoloration",
    label: "Heat discoloration",
    family: "heat",
    isoMode: null,
    looksLike: "Straw, brown, blue or black temper colours",
  },
  { code: "cage.deformed", label: "Cage deformed", family: "cage", isoMode: null, looksLike: "Bent or dented cage" },
  { code: "cage.broken", label: "Cage worn or broken", family: "cage", isoMode: null, looksLike: "Worn or cracked pockets" },
  {
    code: "seal.damaged",
    label: "Seal damaged or displaced",
    family: "seal",
    isoMode: null,
    looksLike: "Torn lip, dented or shifted casing",
  },
  { code: "seal.leaking", label: "Seal leaking", family: "seal", isoMode: null, looksLike: "Grease purged past the seal" },
  { code: "lubricant.water", label: "Grease with water", family: "lubricant", isoMode: null, looksLike: "Milky, emulsified grease" },
  { code: "lubricant.debris", label: "Grease with particles", family: "lubricant", isoMode: null, looksLike: "Gritty or metallic grease" },
  { code: "lubricant.starved", label: "Too little grease", family: "lubricant", isoMode: null, looksLike: "Dry parts, little grease left" },
  { code: "lubricant.degraded", label: "Grease degraded", family: "lubricant", isoMode: null, looksLike: "Dark, hardened or burnt grease" },
  {
    code: "mounting.cap-screw",
    label: "Cap screw loose or missing",
    family: "mounting",
    isoMode: null,
    looksLike: "Cap screw turns by hand, backed out, broken or gone",
  },
  {
    code: "mounting.backing-ring",
    label: "Backing ring loose",
    family: "mounting",
    isoMode: null,
    looksLike: "Backing ring moves on the journal fillet",
  },
  {
    code: "mounting.fit",
    label: "Cone loose on journal",
    family: "mounting",
    isoMode: null,
    looksLike: "Bore creep, polished or fretted bore",
  },
  { code: "none", label: "No damage", family: "none", isoMode: null, looksLike: "Nothing found on this part" },
] as const satisfies readonly BaseDamageCode[];

export type DamageCode = (typeof BASE_LIST)[number]["code"];

export interface DamageCodeInfo extends BaseDamageCode {
  readonly code: DamageCode;
  /** ISO 15243:2017 clause of the mode (5.1 … 5.6), or null outside its modes. */
  readonly isoClause: string | null;
  /** Shop words that must find this code in search. */
  readonly synonyms: readonly string[];
}

export const DAMAGE_CODES: readonly DamageCodeInfo[] = BASE_LIST.map((base) => ({
  ...base,
  isoClause: base.isoMode ? (DAMAGE_FAMILIES.find((f) => f.code === base.family)?.isoClause ?? null) : null,
  synonyms: DAMAGE_SYNONYMS[base.code],
}));

export function damageCodeInfo(code: string): DamageCodeInfo | undefined {
  return DAMAGE_CODES.find((d) => d.code === code);
}

/** The damage codes in the shape the code picker searches. */
export function damageSearchEntries() {
  return DAMAGE_CODES.map((d) => ({
    code: d.code,
    label: d.label,
    description: d.isoMode ? `${d.looksLike}. ${d.isoMode}` : d.looksLike,
    synonyms: d.synonyms,
  }));
}
