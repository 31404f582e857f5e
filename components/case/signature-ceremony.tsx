"use client";
// Signing a verdict on purpose: what exactly is signed, what the signature means, and the
// signer's password again. The server re-checks the hash of what was shown before it signs.
import { useEffect, useState } from "react";
import { Button } from "@/components/ui/button";
import { Field, Input } from "@/components/ui/field";
import type { SignedContent } from "@/lib/cases/signature-content";
import { causeLabel, componentLabel, confidenceLabel, damageLabel, severityLabel, zoneLabel } from "@/lib/classification/labels";
import { ActionError, useCaseAction } from "./use-case-action";
import { callApi } from "@/lib/client/api";

type View = { meaning: string; contentHash: string; content: SignedContent; version: number };

const removalWords = (v: string | null) =>
  v === "confirmed" ? "Confirmed by teardown" : v === "no-defect" ? "No defect found" : "Not stated";

export function SignatureCeremony({ caseId, onCancel }: { caseId: string; onCancel: () => void }) {
  const { run, error, busy } = useCaseAction();
  const [view, setView] = useState<View | null>(null);
  const [loadError, setLoadError] = useState<string | null>(null);
  const [password, setPassword] = useState("");
  const [accepted, setAccepted] = useState(false);

  useEffect(() => {
    let live = true;
    void callApi<View>("GET", `/api/cases/${caseId}/signature`).then((res) => {
      if (!live) return;
      if (res.ok) setView(res.data);
      else setLoadError(res.status === 0 ? res.message : "What is to be signed could not be loaded. Reload the page and try again.");
    });
    return () => {
      live = false;
    };
  }, [caseId]);

  if (loadError)
    return (
      <p role="alert" className="text-sm text-danger">
        {loadError}
      </p>
    );
  if (!view)
    return (
      <p className="text-sm text-muted" aria-live="polite">
        Loading what you are about to sign…
      </p>
    );

  const c = view.content;
  const flags = c.findings.filter((f) => f.severity >= 4);
  const sign = async () => {
    await run("POST", `/api/cases/${caseId}/signature`, {
      version: view.version,
      password,
      contentHash: view.contentHash,
      meaningAccepted: accepted,
    });
  };

  return (
    <section
      aria-labelledby="sign-title"
      className="flex flex-col gap-4 rounded-xl border border-line-strong bg-surface p-4 shadow-sm"
      data-testid="signature-ceremony"
    >
      <h3 id="sign-title" className="text-base font-semibold text-ink">
        You are signing this verdict
      </h3>
      <dl className="grid grid-cols-1 gap-x-6 gap-y-2 text-sm sm:grid-cols-[max-content_1fr]">
        <dt className="text-muted">Case</dt>
        <dd className="font-medium text-ink tabular">{c.caseNumber}</dd>
        <dt className="text-muted">Primary root cause</dt>
        <dd className="font-medium text-ink">{c.verdict.primaryCause ? causeLabel(c.verdict.primaryCause, undefined) : "Not chosen"}</dd>
        {c.verdict.contributingCauses.length ? (
          <>
            <dt className="text-muted">Contributing</dt>
            <dd>{c.verdict.contributingCauses.map((x) => causeLabel(x, undefined)).join(", ")}</dd>
          </>
        ) : null}
        <dt className="text-muted">Confidence</dt>
        <dd>{c.verdict.confidence ? confidenceLabel(c.verdict.confidence) : "Not stated"}</dd>
        <dt className="text-muted">Removal</dt>
        <dd>{removalWords(c.verdict.removalConfirmed)}</dd>
        <dt className="text-muted">Photos</dt>
        <dd className="tabular">{c.photoHashes.length === 1 ? "1 photo" : `${c.photoHashes.length} photos`}, each fixed by its SHA-256</dd>
        <dt className="text-muted">Evidence version</dt>
        <dd className="tabular">{`Version ${view.version} of the case`}</dd>
      </dl>
      <div>
        <p className="text-sm font-medium text-ink">{c.findings.length === 1 ? "1 finding" : `${c.findings.length} findings`}</p>
        <ul className="mt-1 space-y-1 text-sm text-ink-2">
          {c.findings.map((f, i) => (
            <li key={i} className="flex flex-wrap gap-x-2">
              <span className="font-medium text-ink">
                {componentLabel(f.component)}
                {f.row ? `, ${f.row} row` : ""}
              </span>
              <span>{damageLabel(f.damageCode, undefined)}</span>
              {f.zone ? <span className="text-muted">{zoneLabel(f.zone)}</span> : null}
              <span className="text-muted">severity {f.severity}</span>
            </li>
          ))}
        </ul>
      </div>
      {flags.length ? (
        <p
          role="note"
          className="rounded-lg border border-danger/40 bg-danger-soft px-3 py-2 text-sm text-ink"
          data-testid="sign-safety-flags"
        >
          <strong className="text-danger">Safety flag: </strong>
          {flags.map((f) => `${componentLabel(f.component)} — ${severityLabel(f.severity).toLowerCase()}`).join("; ")}. Follow your
          employer&apos;s procedures and the applicable interchange rules for the rest of this wheelset and car.
        </p>
      ) : null}
      <div className="rounded-lg bg-surface-2 px-3 py-2 text-sm">
        <p className="font-medium text-ink">What your signature means</p>
        <p className="mt-0.5 text-ink-2">{view.meaning}</p>
        <p className="mt-1 text-xs text-muted">
          The case becomes read-only. Your name, the time and this fingerprint of the signed content are kept and printed on the report:
        </p>
        <p className="mt-1 break-all font-mono text-xs text-ink-2" data-testid="sign-hash">
          {view.contentHash}
        </p>
      </div>
      <label className="flex items-start gap-2 text-sm text-ink">
        <input
          type="checkbox"
          checked={accepted}
          onChange={(e) => setAccepted(e.target.checked)}
          className="mt-0.5 h-4 w-4 accent-[var(--accent)]"
        />
        I have reviewed this and sign it as my own judgement.
      </label>
      <Field
        label="Your password"
        htmlFor="sign-password"
        hint="The one you sign in with; asked again so no one can sign from a session left open."
      >
        <Input
          id="sign-password"
          type="password"
          autoComplete="current-password"
          value={password}
          onChange={(e) => setPassword(e.target.value)}
          maxLength={200}
        />
      </Field>
      <ActionError error={error} />
      <div className="flex flex-wrap gap-2">
        <Button onClick={() => void sign()} disabled={busy || !accepted || password.length === 0}>
          Sign this verdict
        </Button>
        <Button variant="ghost" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </section>
  );
}
