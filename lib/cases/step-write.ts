// Writing a workflow step: the case row, its history line and its notice in one transaction.
// The version a step was asked at, with the step and the person, is its idempotency key: a doubled
// or retried request answers with the step already taken, never a second one or a 409.
import "server-only";
import { stepAlreadyTaken, updateCase } from "@/db/queries/case-write";
import type { Case } from "@/db/schema";
import type { CurrentUser } from "@/lib/auth/session";
import { WriteRefused } from "@/db/refusals";
import { nudgeMail } from "@/lib/jobs/nudge";
import { queueStepNotice } from "./notices";
import type { WorkflowAction } from "./workflow";

/** The case as the step left it, when this person already took this step at this version. */
export async function stepReplay(c: Case, version: number, action: WorkflowAction, user: CurrentUser): Promise<Case | null> {
  return c.version === version ? null : stepAlreadyTaken(c.id, version, action, user.id);
}

export async function writeStep(
  c: Case,
  version: number,
  action: WorkflowAction,
  patch: Partial<Case>,
  user: CurrentUser,
  reason?: string,
): Promise<Case> {
  try {
    const row = await updateCase(c.id, version, patch, user, action, reason, (tx, saved) =>
      queueStepNotice(tx, action, saved, user, reason),
    );
    nudgeMail();
    return row;
  } catch (err) {
    const done = err instanceof WriteRefused ? await stepAlreadyTaken(c.id, version, action, user.id) : null;
    if (done) return done;
    throw err;
  }
}
