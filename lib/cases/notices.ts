// Who hears about a workflow step. Mail is queued after the step is saved and never blocks it.
import "server-only";
import type { Case } from "@/db/schema";
import type { CurrentUser } from "@/lib/auth/session";
import type { WorkflowAction } from "./workflow";

export function afterTransition(action: WorkflowAction, row: Case, by: CurrentUser, reason?: string) {
  void send(action, row, by, reason).catch((err) => console.error(`notice for ${action} on ${row.number} failed`, err));
}

async function send(action: WorkflowAction, row: Case, by: CurrentUser, reason?: string) {
  const notify = await import("@/lib/notify/case-notices");
  if (action === "propose") await notify.notifySignoffRequested(row);
  if (action === "sign") await notify.notifyVerdictSigned(row, by);
  if (action === "return") await notify.notifyVerdictReturned(row, by, reason ?? "");
  if (action === "reopen") await notify.notifyCaseReopened(row, by, reason ?? "");
}
