// The analyst's and engineer's words: teardown narrative, verdict notes and corrective actions.
import type { RootCauseCode } from "../../lib/classification";
import type { CaseSpec } from "./case-spec";
import type { Rng } from "./prng";

const OPENINGS = [
  "Cleaned and taken down in the usual order.",
  "Received on the journal end; end cap and cap screws off, bearing pressed off.",
  "Received boxed from the shop; washed in solvent and split.",
  "Taken down with the end cap marked so clock positions hold.",
  "Photographed as received, then cleaned and split.",
];

const BY_CAUSE: Record<RootCauseCode, readonly string[]> = {
  "no-defect": [
    "No defect found on any raceway, roller or rib; turned smooth once cleaned.",
    "Nothing to explain the removal: raceways bright, rollers clean, grease normal.",
    "Roller paths even and grease fresh; what was felt in the field was likely seal drag on a cold bearing.",
    "Clean bearing, and end play on the bench well inside the limit.",
  ],
  "end-of-life": [
    "Load-zone spalling on the cup, fatigue pits that joined up.",
    "Spalled raceway after a long life; the rest of the bearing shows ordinary wear.",
    "Fatigue spall, deep and sharp-edged, right where the load sits. Frosted bands on the cones too.",
  ],
  "water-ingress": [
    "Grease milky throughout; water etch at roller spacing on the lower half of the cup.",
    "Water got in past the seal: emulsified grease and rusty etch lines.",
    "Stained and etched raceways with milky grease, the usual water picture.",
  ],
  "debris-ingress": [
    "Raceways peppered with debris dents and the grease gritty.",
    "Hard particles went through the rollers; dents all round and lapped rollers.",
  ],
  lubrication: [
    "Ran short of grease: heat tint on the ribs, roller ends scored.",
    "Starved bearing, burnt grease and blue ribs; it was close to seizing.",
  ],
  seal: [
    "The seal failed first; grease loss and some contamination followed.",
    "Damaged seal let grease out and dirt in; raceways only lightly marked.",
  ],
  electrical: [
    "Arc burns on the raceway and rollers: current went through the bearing.",
    "Fused craters at roller spacing, typical of welding current returned through the bearing.",
  ],
  impact: [
    "True brinell dents at roller spacing in the load zone from a hard hit.",
    "Dents with raised edges, consistent with the wheel defect pounding the bearing.",
  ],
  mounting: [
    "Fastening was not right: loose parts and fretting where they moved.",
    "Creep and fretting on the journal, a mounting fault rather than rolling damage.",
  ],
  handling: [
    "Marks at roller spacing without raised metal: vibration while standing, not running damage.",
    "Handling nicks and standstill marks; no running damage.",
  ],
  reconditioning: [
    "Rib scoring and a bent cage point to the last reconditioning.",
    "Assembly marks from the last shop visit; the spacer did not match the cones.",
  ],
  material: [
    "Early spall from a subsurface inclusion, well short of a normal life.",
    "Crack grew from a flaw in the steel; beach marks visible under the glass.",
  ],
  undetermined: [
    "Light marks only, nothing that settles why it came out.",
    "Mixed light damage; not enough to name a cause with confidence.",
  ],
};

const CLOSINGS = [
  "Photos of each raceway attached.",
  "Parts kept in the quarantine rack for a month.",
  "Cup and cones tagged with the case number.",
  "Spall sectioned for the metallurgist.",
];

const STORY_LINES: Record<string, readonly string[]> = {
  "water-run": ["Another water case from this spring's run.", "Same water picture as the other spring removals."],
  "arc-cluster": ["Same burn pattern as the other cars from the track 4 welding.", "Matches the other arc burns from the shop welding."],
  "bad-lot": ["Lot C-2207 again.", "Another one from lot C-2207."],
  "repeat-car": ["Same car as an earlier removal; worth a look at the truck."],
  "pellham-hand-roll": ["Pellham called it rough; nothing on the bench supports that."],
};

export function teardownNotesFor(rng: Rng, spec: CaseSpec): string {
  const lines = [rng.pick(OPENINGS), rng.pick(BY_CAUSE[spec.cause])];
  if (spec.cause === "electrical" && spec.trigger !== "welding")
    lines[1] = "Washboard fluting across the raceway: current leaking through the bearing over a long time.";
  if (spec.cause === "mounting" && spec.trigger === "cap-screws")
    lines[1] = "Cap screws had backed off, so the end cap no longer clamped the cones; threads fretted.";
  if (spec.cause === "mounting" && spec.trigger === "backing-ring")
    lines[1] = "Backing ring not seated on the fillet and fretted where it moved.";
  if (spec.story && STORY_LINES[spec.story]) lines.push(rng.pick(STORY_LINES[spec.story]));
  if (lines.length < 4 && rng.chance(0.5))
    lines.push(rng.pick(spec.cause === "end-of-life" || spec.cause === "material" ? CLOSINGS : CLOSINGS.slice(0, 3)));
  return lines.join(" ");
}

const ACTIONS: Record<RootCauseCode, readonly string[]> = {
  "no-defect": ["None for the bearing; back to reconditioning stock.", "Share with the shop as a no-defect removal."],
  "end-of-life": ["None beyond replacement; normal end of life.", "Watch cars of this age in the fleet list."],
  "water-ingress": ["Check seals on cars standing on the low tracks; drain track 2.", "Seal inspection on cars stored in the wet yard."],
  "debris-ingress": ["Check seal condition at the next inspection of cars in this service.", "Keep wheelsets covered in the yard."],
  lubrication: ["Check the grease fill at reconditioning.", "Flag the reconditioner about short fills."],
  seal: ["Seal installation check at the reconditioning shop.", "Replace seals on the other bearings of the car."],
  electrical: ["Ground clamp on the car body, never on the truck; welders briefed.", "Remind contract shops about welding ground returns."],
  impact: ["Wheel defect limits reviewed with the wheel shop.", "None for the bearing; impact from the wheel."],
  mounting: ["Torque check of cap screws added to the mounting sheet.", "Mounting crew refresher on backing ring seating."],
  handling: ["Store wheelsets off vibrating tracks; block bearings in transport.", "Handling reminder for the wheel shop crane crew."],
  reconditioning: ["Feedback to the reconditioning shop with photos.", "Spacer check added to reconditioning inspection."],
  material: ["Maker told; lot under watch.", "Pull the rest of the lot at next shopping."],
  undetermined: ["Keep the parts; revisit if a similar case appears.", "None until more evidence."],
};

export function correctiveActionFor(rng: Rng, spec: CaseSpec): string {
  if (spec.story === "arc-cluster") return "Ground clamps moved to the car body on track 4; welders briefed and the clamp point marked.";
  if (spec.story === "bad-lot") return "Lot C-2207 reported to the maker; remaining bearings of the lot to be pulled at next shopping.";
  if (spec.story === "pellham-hand-roll")
    return "Hand-roll refresher for the Pellham crew: by hand, one direction, by feel, cup pulled and pushed.";
  return rng.pick(ACTIONS[spec.cause]);
}

const CONTRIBUTING: Partial<Record<RootCauseCode, readonly (readonly string[])[]>> = {
  "water-ingress": [[], ["seal"], ["seal"]],
  lubrication: [[], ["seal"], ["reconditioning"]],
  "debris-ingress": [[], ["seal"]],
  "end-of-life": [[], [], ["debris-ingress"]],
  mounting: [[], ["reconditioning"]],
  seal: [[], ["handling"]],
  impact: [[], []],
};

export function contributingFor(rng: Rng, cause: RootCauseCode): string[] {
  return [...rng.pick(CONTRIBUTING[cause] ?? [[]])];
}

export function verdictNotesFor(rng: Rng, spec: CaseSpec, label: string): string {
  if (spec.cause === "no-defect") return rng.pick(["Removal not confirmed by teardown.", "No defect found; the removal was not needed."]);
  if (spec.cause === "undetermined") return "Evidence not enough to name a cause.";
  return rng.pick([`${label}, as the findings show.`, `Teardown confirms the removal: ${label.toLowerCase()}.`, `${label}; see findings.`]);
}
