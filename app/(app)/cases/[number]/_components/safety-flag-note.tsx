// The safety flag on a case: which confirmations were left unticked at filing, with their cautions.
import { SAFETY_FLAG_DEFERRAL, SAFETY_FLAG_TITLE, type SafetyFlag } from "@/lib/cases/safety-flag";

export function SafetyFlagNote({ flag, signing = false }: { flag: SafetyFlag; signing?: boolean }) {
  if (!flag.length) return null;
  return (
    <div
      role="note"
      data-testid={signing ? "sign-safety-flag" : "safety-flag"}
      className="rounded-lg border-2 border-warn/60 bg-warn-soft px-3 py-2.5 text-sm text-ink"
    >
      <p className="font-semibold">{SAFETY_FLAG_TITLE}</p>
      <ul className="mt-1 list-disc pl-5">
        {flag.map((f) => (
          <li key={f.key}>Not confirmed: {f.text}</li>
        ))}
      </ul>
      <p className="mt-1 text-ink-2">
        {signing ? `Before signing: ${SAFETY_FLAG_DEFERRAL.charAt(0).toLowerCase()}${SAFETY_FLAG_DEFERRAL.slice(1)}` : SAFETY_FLAG_DEFERRAL}
      </p>
    </div>
  );
}
