// Who hears about a workflow step. The notice is queued in the step's own transaction (a
// transactional outbox): the step and its mail are saved together or not at all.
import "server-only";
import type { Tx } from "@/db";
import type { Case } from "@/db/schema";
import type { CurrentUser } from "@/lib/auth/session";
import { notifyCaseReopened, notifySignoffRequested, notifyVerdictReturned, notifyVerdictSigned } from "@/lib/notify/case-notices";
import type { WorkflowAction } from "./workflow";

export async function queueStepNotice(tx: Tx, action: WorkflowAction, row: Case, by: CurrentUser, reason?: string): Promise<void> {
  if (action === "propose") await notifySignoffRequested(row, undefined, tx);
  if (action === "sign") await notifyVerdictSigned(row, by, tx);
  if (action === "return") await notifyVerdictReturned(row, by, reason ?? "", tx);
  if (action === "reopen") await notifyCaseReopened(row, by, reason ?? "", tx);
}
