// A signed case's signature: its meaning, the fingerprint of what was signed, and whether the
// case still holds exactly that.
import { groupedHash } from "@/lib/cases/signature-content";
import type { SignatureCheck } from "@/lib/cases/signature-service";

export function SignatureCheckLine({ check }: { check: SignatureCheck }) {
  return (
    <div
      className={`rounded-lg border px-3 py-2 text-sm ${check.matches ? "border-line bg-surface" : "border-danger/40 bg-danger-soft"}`}
      data-testid="signature-check"
    >
      <p className="text-ink-2">{check.meaning}</p>
      <p className="mt-1 text-xs text-muted">
        Signed content, SHA-256: <span className="break-all font-mono text-ink-2">{groupedHash(check.hash)}</span>
      </p>
      <p className={`mt-1 font-medium ${check.matches ? "text-ok" : "text-danger"}`}>
        {check.matches
          ? "✓ The verdict, findings and photos are exactly as signed."
          : "✗ The verdict, findings or photos changed after signing: this signature no longer covers the case."}
      </p>
    </div>
  );
}
