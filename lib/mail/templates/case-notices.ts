// Case notices: a verdict waits for sign-off, was signed, was returned, or a signed case was reopened.
import { renderMail } from "./layout";

type CaseRef = { caseNumber: string; url: string };

const PREFS_FOOTER =
  "You receive this notice because of your part in this case. Switch notices on or off under Notices on your profile page.";

export function signoffRequested(p: CaseRef & { analystName: string; primaryCauseLabel: string; trigger: string }) {
  return renderMail(
    `${p.caseNumber} waits for your sign-off`,
    `${p.caseNumber} is ready for sign-off`,
    [
      {
        kind: "p",
        text: `${p.analystName} finished the teardown and proposes a verdict. Please review the findings and sign it, or return it to the bench with a reason.`,
      },
      {
        kind: "facts",
        rows: [
          ["Case", p.caseNumber],
          ["Removed for", p.trigger],
          ["Proposed root cause", p.primaryCauseLabel],
          ["Proposed by", p.analystName],
        ],
      },
      { kind: "button", label: "Review the verdict", url: p.url },
    ],
    PREFS_FOOTER,
  );
}

export function verdictSigned(p: CaseRef & { signerName: string; primaryCauseLabel: string; confidence: string }) {
  return renderMail(
    `${p.caseNumber} signed: ${p.primaryCauseLabel}`,
    `The verdict on ${p.caseNumber} is signed`,
    [
      {
        kind: "p",
        text: `${p.signerName} signed the verdict. The case is now closed and read-only; its report can be printed or handed over.`,
      },
      {
        kind: "facts",
        rows: [
          ["Case", p.caseNumber],
          ["Root cause", p.primaryCauseLabel],
          ["Confidence", p.confidence],
          ["Signed by", p.signerName],
        ],
      },
      { kind: "button", label: "Open the case", url: p.url },
    ],
    PREFS_FOOTER,
  );
}

export function verdictReturned(p: CaseRef & { returnedBy: string; reason: string; primaryCauseLabel: string }) {
  return renderMail(
    `${p.caseNumber} returned to the bench`,
    `${p.caseNumber} needs more work`,
    [
      { kind: "p", text: `${p.returnedBy} returned the proposed verdict (${p.primaryCauseLabel}) to the bench. Their reason:` },
      { kind: "p", text: `“${p.reason}”` },
      { kind: "p", text: "Answer the point in the case, then propose the verdict again." },
      { kind: "button", label: "Open the case", url: p.url },
    ],
    PREFS_FOOTER,
  );
}

export function caseReopened(p: CaseRef & { reopenedBy: string; reason: string }) {
  return renderMail(
    `${p.caseNumber} was reopened`,
    `Signed case ${p.caseNumber} was reopened`,
    [
      { kind: "p", text: `${p.reopenedBy} reopened the signed case. The earlier verdict stays in the case history. Their reason:` },
      { kind: "p", text: `“${p.reason}”` },
      { kind: "button", label: "Open the case", url: p.url },
    ],
    PREFS_FOOTER,
  );
}
