// The life of a case: which step may follow which, who may take it, and what it needs first.
import { can, type Permission, type Role } from "@/lib/auth/permissions";
import type { Stage } from "./stages";

export const ACTIONS = ["receive", "propose", "sign", "return", "reopen"] as const;
export type WorkflowAction = (typeof ACTIONS)[number];

type Rule = { from: Stage[]; to: Stage; permission: Permission; needsReason: boolean; label: string };

export const WORKFLOW: Record<WorkflowAction, Rule> = {
  receive: { from: ["field"], to: "bench", permission: "case:receive", needsReason: false, label: "Mark received at the lab" },
  propose: { from: ["bench"], to: "signoff", permission: "case:propose", needsReason: false, label: "Send verdict for sign-off" },
  sign: { from: ["signoff"], to: "signed", permission: "case:sign", needsReason: false, label: "Sign verdict" },
  return: { from: ["signoff"], to: "bench", permission: "case:return", needsReason: true, label: "Return to the bench" },
  reopen: { from: ["signed"], to: "bench", permission: "case:reopen", needsReason: true, label: "Reopen case" },
};

type VerdictFields = {
  primaryCause: string | null;
  confidence: string | null;
  removalConfirmed: string | null;
  findingCount: number;
};

/** What is still missing before a verdict can go for sign-off, in plain words. */
export function verdictProblems(v: VerdictFields): string[] {
  const problems: string[] = [];
  if (!v.primaryCause) problems.push("Choose the primary root cause.");
  if (!v.confidence) problems.push("Say how sure the verdict is (confirmed, probable or undetermined).");
  if (!v.removalConfirmed) problems.push("Say whether teardown confirmed the removal or found no defect.");
  if (v.primaryCause === "no-defect" && v.removalConfirmed === "confirmed") {
    problems.push("A 'no defect' cause cannot confirm the removal: mark it as no defect found.");
  }
  if (v.primaryCause && v.primaryCause !== "no-defect" && v.primaryCause !== "undetermined" && v.removalConfirmed === "no-defect") {
    problems.push("A root cause other than 'no defect' or 'undetermined' means teardown confirmed the removal.");
  }
  if (v.findingCount === 0) problems.push("Record at least one teardown finding (use 'No damage' for a clean part).");
  return problems;
}

export type TransitionCheck = { ok: true; to: Stage } | { ok: false; status: 403 | 409 | 400; message: string };

/** Who is acting, and who proposed the verdict now on the case. */
export type TransitionPeople = { actorId: string; proposedBy: string | null };

export function checkTransition(
  action: WorkflowAction,
  stage: Stage,
  role: Role,
  reason: string | undefined,
  verdict: VerdictFields,
  people: TransitionPeople,
): TransitionCheck {
  const rule = WORKFLOW[action];
  if (!can(role, rule.permission)) return { ok: false, status: 403, message: `Your role cannot ${rule.label.toLowerCase()}.` };
  // A signature is a second person's check: whoever proposed the verdict cannot also sign it.
  if (action === "sign" && people.proposedBy !== null && people.proposedBy === people.actorId) {
    return { ok: false, status: 403, message: "You proposed this verdict, so another engineer or an admin must sign it." };
  }
  if (!rule.from.includes(stage)) {
    return { ok: false, status: 409, message: `This case is ${stageWords[stage]}; "${rule.label}" is not possible now.` };
  }
  if (rule.needsReason && (!reason || reason.trim().length < 5)) {
    return { ok: false, status: 400, message: "Give a reason of at least a few words; it is kept in the case history." };
  }
  if (action === "propose") {
    const problems = verdictProblems(verdict);
    if (problems.length) return { ok: false, status: 400, message: `The verdict is not ready: ${problems.join(" ")}` };
  }
  return { ok: true, to: rule.to };
}

const stageWords: Record<Stage, string> = {
  field: "still a field report",
  bench: "on the bench",
  signoff: "awaiting sign-off",
  signed: "signed",
};

export type Section = "field" | "teardown" | "verdict";

/** The permission each section's save exercises (the field section at the bench is the lab's, see canEditSection). */
export const SECTION_PERMISSIONS: Record<Section, Permission> = {
  field: "case:edit-field",
  teardown: "case:edit-teardown",
  verdict: "case:propose",
};

/** Which stages let which roles edit which section. A signed case is read-only. */
export function canEditSection(section: Section, stage: Stage, role: Role): boolean {
  if (stage === "signed" || stage === "signoff") return false;
  if (section === "field") return stage === "field" ? can(role, "case:edit-field") : can(role, "case:edit-teardown");
  if (section === "teardown") return stage === "bench" && can(role, "case:edit-teardown");
  return stage === "bench" && can(role, "case:propose");
}

export function editRefusal(section: Section, stage: Stage): string {
  if (stage === "signed") return "This case is signed and read-only. An engineer can reopen it with a reason.";
  if (stage === "signoff") return "This verdict is awaiting sign-off; an engineer must return it to the bench before it can change.";
  if (section !== "field" && stage === "field") return "Teardown and verdict open once the lab marks the bearing received.";
  return "Your role cannot edit this part of the case at this stage.";
}
