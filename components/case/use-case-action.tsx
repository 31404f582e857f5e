"use client";
// Sends one change to the case API and refreshes the page's server data when it is saved.
import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { ErrorSummary } from "@/components/ui/error-summary";
import { fetchWithTimeout } from "@/lib/http/client-fetch";

export function useCaseAction() {
  const router = useRouter();
  const [error, setError] = useState<{ message: string; conflict: boolean; fields?: Record<string, string> } | null>(null);
  const [busy, setBusy] = useState(false);
  const [, startTransition] = useTransition();

  async function run(method: string, url: string, body?: unknown): Promise<boolean> {
    setBusy(true);
    setError(null);
    const sent = await fetchWithTimeout(url, { method, headers: body ? { "content-type": "application/json" } : {}, body: body ? JSON.stringify(body) : undefined });
    setBusy(false);
    if (!sent.res) {
      setError({ message: sent.message, conflict: false });
      return false;
    }
    const res = sent.res;
    if (!res.ok) {
      const b = (await res.json().catch(() => ({}))) as { error?: string; fields?: Record<string, string> };
      const fields = Object.fromEntries(Object.entries(b.fields ?? {}).map(([k, v]) => [k.replace(/^(data|finding)\./, ""), v]));
      setError({ message: b.error ?? `The change was not saved (${res.status}).`, conflict: res.status === 409, fields });
      return false;
    }
    startTransition(() => router.refresh());
    return true;
  }

  return { run, error, busy, clearError: () => setError(null) };
}

type ActionErrorProps = { error: { message: string; conflict: boolean; fields?: Record<string, string> } | null; labels?: Record<string, string>; idPrefix?: string };

/** Field problems as a summary with links to each field; anything else (a stale version, a refused step) as one line. */
export function ActionError({ error, labels, idPrefix }: ActionErrorProps) {
  if (!error) return null;
  const fields = Object.fromEntries(Object.entries(error.fields ?? {}).filter(([k]) => k !== "_"));
  if (!error.conflict && Object.keys(fields).length) return <ErrorSummary errors={fields} labels={labels} idPrefix={idPrefix} />;
  return (
    <p role="alert" className="rounded-lg border border-danger/40 bg-danger-soft px-3 py-2 text-sm text-danger">
      {error.message}
      {error.conflict ? (
        <button type="button" className="ml-2 font-semibold underline" onClick={() => location.reload()}>
          Reload
        </button>
      ) : null}
    </p>
  );
}
