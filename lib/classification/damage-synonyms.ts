// Shop words for each damage code (common practice: the words inspectors and
// analysts actually write). Search must find the code from any of them, so
// "rust" finds water etch and "flaking" finds a spall.
import type { DamageCode } from "./damage-codes";

export const DAMAGE_SYNONYMS: Record<DamageCode, readonly string[]> = {
  "fatigue.subsurface": [
    "spall", "spalls", "spalled", "spalling", "flaking", "flaked", "flake", "peeling",
    "shelling", "rolling contact fatigue", "RCF", "fatigue spall", "load zone spall", "chipped raceway",
  ],
  "fatigue.surface": [
    "pitting", "pitted", "pits", "frosting", "frosted", "micropitting", "micro-pitting", "micropits",
    "grey staining", "gray staining", "glazing", "surface fatigue", "grey patches",
  ],
  "wear.abrasive": [
    "wear", "worn", "abrasion", "lapped", "lapping", "dull", "dull finish", "grit wear",
    "three-body wear", "polished", "wear step",
  ],
  "wear.adhesive": [
    "smearing", "smeared", "smear", "scuffing", "scuffed", "galling", "galled", "scoring", "scored",
    "skidding", "skid marks", "material transfer", "rib scoring", "roller end scoring",
  ],
  "corrosion.moisture": [
    "rust", "rusty", "rusted", "stain", "stains", "staining", "etch", "etched", "etching",
    "water stain", "water marks", "black stain", "corrosion", "corroded", "oxidation", "moisture corrosion",
  ],
  "corrosion.fretting": [
    "fretting", "fretted", "fret", "fretting rust", "fretting corrosion", "red oxide", "cocoa",
    "red-brown", "bore rust", "friction oxidation",
  ],
  "corrosion.false-brinell": [
    "false brinell", "false brinelling", "shipping damage", "transport marks", "vibration marks",
    "standstill marks", "idle marks",
  ],
  "electrical.arc": [
    "weld", "welding", "weld burn", "arc", "arcing", "arc strike", "burn", "burn mark", "crater", "craters",
    "spark", "electric burn", "current damage", "fused spot",
  ],
  "electrical.fluting": [
    "washboard", "washboarding", "fluting", "fluted", "flutes", "corrugation", "corrugated",
    "grey bands", "gray bands", "ripples", "electrical erosion", "current leakage",
  ],
  "deformation.overload": [
    "brinell", "brinelling", "brinelled", "true brinell", "dent", "dents", "dented", "indentation",
    "impact", "impact marks", "overload", "roller marks",
  ],
  "deformation.debris": [
    "debris dents", "particle dents", "bruising", "bruised", "peppered", "peppering",
    "contamination dents", "dirt dents", "grit dents", "raised rims",
  ],
  "deformation.handling": [
    "nick", "nicks", "nicked", "scratch", "scratches", "scratched", "gouge", "gouged", "ding",
    "handling damage", "dropped", "mishandled", "tool marks",
  ],
  "fracture.forced": [
    "crack", "cracked", "cracks", "fracture", "fractured", "broken", "split", "split cone",
    "cracked cup", "cracked cone", "broken roller", "through crack",
  ],
  "fracture.fatigue": [
    "fatigue crack", "beach marks", "progression marks", "clamshell marks", "fatigue fracture", "growing crack",
  ],
  "fracture.thermal": [
    "heat checking", "heat checks", "heat check", "heat cracks", "thermal cracks", "crazing", "crazed", "crack network",
  ],
  "heat.discoloration": [
    "blue", "blued", "bluing", "straw", "temper colours", "temper colors", "heat tint", "discoloured",
    "discolored", "discolouration", "discoloration", "overheated", "overheating", "hot box", "hot bearing", "heat",
  ],
  "cage.deformed": [
    "bent cage", "dented cage", "cage bent", "distorted cage", "crushed cage", "retainer bent",
    "bent retainer", "cage damage",
  ],
  "cage.broken": [
    "broken cage", "cracked cage", "cage worn", "worn pockets", "pocket wear", "broken retainer",
    "cage failure", "cage bridge", "retainer",
  ],
  "seal.damaged": [
    "torn seal", "torn lip", "seal lip", "cut seal", "dented seal", "loose seal", "displaced seal",
    "cocked seal", "shifted seal", "seal damage", "seal out", "pushed in seal",
  ],
  "seal.leaking": [
    "leak", "leaking", "leaker", "grease leak", "purge", "purging", "purged", "grease loss",
    "slung grease", "thrown grease", "weeping", "seal leak",
  ],
  "lubricant.water": [
    "milky", "emulsified", "emulsion", "water in grease", "wet grease", "water", "moisture", "cloudy grease",
  ],
  "lubricant.debris": [
    "gritty", "grit", "sandy", "sand", "dirt", "dirty grease", "metal particles", "metallic",
    "particles", "contaminated grease", "swarf", "debris", "contamination",
  ],
  "lubricant.starved": [
    "dry", "dry bearing", "starved", "starvation", "no grease", "low grease", "lack of grease",
    "insufficient grease", "lube starved",
  ],
  "lubricant.degraded": [
    "dark grease", "black grease", "hard grease", "hardened grease", "caked", "burnt grease", "cooked grease",
    "varnish", "sludge", "coked", "oxidised grease", "oxidized grease", "broken down grease", "aged grease",
  ],
  "mounting.cap-screw": [
    "loose bolt", "loose bolts", "missing bolt", "cap screw", "cap screws", "loose cap screw",
    "missing cap screw", "backed out", "sheared bolt", "broken cap screw", "bolt torque", "locking plate",
  ],
  "mounting.backing-ring": [
    "loose backing ring", "backing ring", "backing ring movement", "fillet", "backing ring fretting",
  ],
  "mounting.fit": [
    "creep", "bore creep", "cone creep", "spun cone", "spun", "loose cone", "loose fit",
    "polished bore", "slipped on journal", "turned on journal",
  ],
  none: [
    "no damage", "no defect", "nothing found", "no fault found", "NFF", "ok",
    "serviceable", "non-verified", "not verified",
  ],
};
