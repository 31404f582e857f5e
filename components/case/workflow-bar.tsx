"use client";
// The next steps a person may take on this case, with the reason box where one is required.
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Textarea } from "@/components/ui/field";
import { WORKFLOW, type WorkflowAction } from "@/lib/cases/workflow";
import { SignatureCeremony } from "./signature-ceremony";
import { ActionError, useCaseAction } from "./use-case-action";

type Props = { caseId: string; version: number; actions: WorkflowAction[]; verdictProblems: string[] };

export function WorkflowBar({ caseId, version, actions, verdictProblems }: Props) {
  const { run, error, busy } = useCaseAction();
  const [asking, setAsking] = useState<WorkflowAction | null>(null);
  const [reason, setReason] = useState("");
  const [signing, setSigning] = useState(false);
  if (!actions.length) return null;

  const go = async (action: WorkflowAction) => {
    // a signature is never one click: it opens the ceremony
    if (action === "sign") return setSigning(true);
    if (WORKFLOW[action].needsReason && asking !== action) return setAsking(action);
    const ok = await run("POST", `/api/cases/${caseId}/transitions`, {
      version,
      action,
      reason: WORKFLOW[action].needsReason ? reason : undefined,
    });
    if (ok) {
      setAsking(null);
      setReason("");
    }
  };

  return (
    <div className="flex flex-col gap-3" data-testid="workflow">
      <div className="flex flex-wrap gap-2">
        {actions.map((a) => (
          <Button
            key={a}
            variant={a === "return" || a === "reopen" ? "secondary" : "primary"}
            disabled={busy || (a === "propose" && verdictProblems.length > 0)}
            onClick={() => void go(a)}
            title={a === "propose" && verdictProblems.length ? verdictProblems.join(" ") : undefined}
          >
            {WORKFLOW[a].label}
          </Button>
        ))}
      </div>
      {actions.includes("propose") && verdictProblems.length ? (
        <ul className="list-disc pl-5 text-sm text-muted">
          {verdictProblems.map((p) => (
            <li key={p}>{p}</li>
          ))}
        </ul>
      ) : null}
      {asking ? (
        <div className="flex flex-col gap-2 rounded-lg border border-line bg-surface-2 p-3">
          <label htmlFor="reason" className="text-sm font-medium">
            Reason for “{WORKFLOW[asking].label.toLowerCase()}” (kept in the history and sent to the people on the case)
          </label>
          <Textarea id="reason" rows={3} value={reason} onChange={(e) => setReason(e.target.value)} />
          <div className="flex gap-2">
            <Button onClick={() => void go(asking)} disabled={busy}>
              {WORKFLOW[asking].label}
            </Button>
            <Button variant="ghost" onClick={() => setAsking(null)}>
              Cancel
            </Button>
          </div>
        </div>
      ) : null}
      {signing ? <SignatureCeremony caseId={caseId} onCancel={() => setSigning(false)} /> : null}
      <ActionError error={error} />
    </div>
  );
}
