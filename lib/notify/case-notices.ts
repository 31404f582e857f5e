// Case notices by e-mail. Given the workflow step's transaction (`into`), a notice is queued in it, so
// the step and its mail are saved together or not at all; without one a notice never throws back to
// its caller. The outbox sends (and retries) through the job queue.
import "server-only";
import { causeLabel as labelOfCause, confidenceLabel, triggerLabel as labelOfTrigger } from "@/lib/classification/labels";
import { codeLabel, peopleByIds, peopleWithRoles } from "@/db/queries/notices";
import { env } from "@/lib/env";
import type { Tx } from "@/db";
import { enqueueMail } from "@/lib/mail/outbox";
import { caseReopened, signoffRequested, verdictReturned, verdictSigned } from "@/lib/mail/templates/case-notices";
import { pickRecipients, type NoticeKind } from "./notice-kinds";

/** The parts of a case row a notice needs; a full `cases` row fits. */
export type NoticeCase = {
  id: string;
  number: string;
  trigger: string;
  primaryCause: string | null;
  confidence?: string | null;
  proposedBy: string | null;
  createdBy: string | null;
  signedBy?: string | null;
};
export type NoticeActor = { id: string; name: string };

const caseUrl = (c: NoticeCase) => `${env().APP_URL}/cases/${encodeURIComponent(c.number)}`;

async function causeLabel(code: string | null): Promise<string> {
  if (!code) return "not given";
  return (await codeLabel("cause", code)) ?? labelOfCause(code);
}

async function triggerLabel(code: string): Promise<string> {
  return (await codeLabel("trigger", code)) ?? labelOfTrigger(code);
}

/** Runs a notice so that no failure reaches the caller; returns the outbox id, or null when nothing was queued. */
async function safely(kind: NoticeKind, c: NoticeCase, work: () => Promise<string | null>, into?: Tx): Promise<string | null> {
  if (into) return work(); // inside a step's transaction a failure must undo the step too
  try {
    return await work();
  } catch (err) {
    console.error(`notice ${kind} for ${c?.number ?? "a case"} failed:`, err);
    return null;
  }
}

/** To every engineer who wants it: a verdict on this case waits for sign-off. */
export function notifySignoffRequested(c: NoticeCase, proposer?: NoticeActor, into?: Tx): Promise<string | null> {
  return safely(
    "signoff-requested",
    c,
    async () => {
      const analyst = proposer ?? (await peopleByIds([c.proposedBy]))[0];
      const to = pickRecipients(await peopleWithRoles(["engineer"]), "signoff-requested", analyst?.id ?? c.proposedBy);
      const mail = signoffRequested({
        caseNumber: c.number,
        url: caseUrl(c),
        analystName: analyst?.name ?? "An analyst",
        primaryCauseLabel: await causeLabel(c.primaryCause),
        trigger: await triggerLabel(c.trigger),
      });
      return enqueueMail("signoff-requested", to, mail, into);
    },
    into,
  );
}

/** To the analyst who proposed and the inspector who filed: the verdict is signed. */
export function notifyVerdictSigned(c: NoticeCase, signer: NoticeActor, into?: Tx): Promise<string | null> {
  return safely(
    "verdict-signed",
    c,
    async () => {
      const to = pickRecipients(await peopleByIds([c.proposedBy, c.createdBy]), "verdict-signed", signer.id);
      const confidence = c.confidence ? confidenceLabel(c.confidence) : "not given";
      const mail = verdictSigned({
        caseNumber: c.number,
        url: caseUrl(c),
        signerName: signer.name,
        primaryCauseLabel: await causeLabel(c.primaryCause),
        confidence,
      });
      return enqueueMail("verdict-signed", to, mail, into);
    },
    into,
  );
}

/** To the analyst who proposed and the inspector who filed: the verdict went back to the bench. */
export function notifyVerdictReturned(c: NoticeCase, by: NoticeActor, reason: string, into?: Tx): Promise<string | null> {
  return safely(
    "verdict-returned",
    c,
    async () => {
      const to = pickRecipients(await peopleByIds([c.proposedBy, c.createdBy]), "verdict-returned", by.id);
      const mail = verdictReturned({
        caseNumber: c.number,
        url: caseUrl(c),
        returnedBy: by.name,
        reason,
        primaryCauseLabel: await causeLabel(c.primaryCause),
      });
      return enqueueMail("verdict-returned", to, mail, into);
    },
    into,
  );
}

/** To the analyst, the inspector and the engineer who had signed: a signed case was reopened. */
export function notifyCaseReopened(c: NoticeCase, by: NoticeActor, reason: string, into?: Tx): Promise<string | null> {
  return safely(
    "case-reopened",
    c,
    async () => {
      const to = pickRecipients(await peopleByIds([c.proposedBy, c.createdBy, c.signedBy]), "case-reopened", by.id);
      return enqueueMail("case-reopened", to, caseReopened({ caseNumber: c.number, url: caseUrl(c), reopenedBy: by.name, reason }), into);
    },
    into,
  );
}
