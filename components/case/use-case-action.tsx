"use client";
// Sends one change to the case API and refreshes the page's server data when it is saved.
import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { ErrorSummary } from "@/components/ui/error-summary";
import { callApi } from "@/lib/client/api";

export function useCaseAction() {
  const router = useRouter();
  const [error, setError] = useState<{ message: string; conflict: boolean; fields?: Record<string, string> } | null>(null);
  const [busy, setBusy] = useState(false);
  const [, startTransition] = useTransition();

  async function run(method: string, url: string, body?: unknown): Promise<boolean> {
    setBusy(true);
    setError(null);
    const res = await callApi(method, url, {
      json: body ?? undefined,
      fieldPrefixes: ["data", "finding"],
      fallback: "The change was not saved.",
    });
    setBusy(false);
    if (!res.ok) {
      setError({ message: res.message, conflict: res.conflict, fields: res.fields });
      return false;
    }
    startTransition(() => router.refresh());
    return true;
  }

  return { run, error, busy, clearError: () => setError(null) };
}

type ActionErrorProps = {
  error: { message: string; conflict: boolean; fields?: Record<string, string> } | null;
  labels?: Record<string, string>;
  idPrefix?: string;
};

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
