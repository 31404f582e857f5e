"use client";
import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { Button } from "@/components/ui/button";
import { callApi } from "@/lib/client/api";

/** Sends every unsent mail now and refreshes the table with the outcome. */
export function RetryButton({ unsent }: { unsent: number }) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [busy, setBusy] = useState(false);
  const [note, setNote] = useState<string | null>(null);

  async function retry() {
    setBusy(true);
    setNote(null);
    const res = await callApi<{ sent?: number; failed?: number }>("POST", "/api/admin/outbox/retry", {
      fallback: "The retry was refused.",
    });
    if (!res.ok) setNote(res.message);
    else if (!res.data?.sent && !res.data?.failed) setNote("Nothing was waiting to be sent.");
    else setNote(`${res.data.sent ?? 0} sent, ${res.data.failed ?? 0} still failing.`);
    setBusy(false);
    startTransition(() => router.refresh());
  }

  return (
    <div className="flex flex-col items-stretch gap-1 sm:items-end">
      <Button onClick={retry} disabled={busy || pending} size="md" className="whitespace-nowrap">
        {busy ? "Sending…" : unsent > 0 ? `Retry now (${unsent})` : "Retry now"}
      </Button>
      <p role="status" aria-live="polite" className="min-h-4 text-xs text-muted">
        {note ?? ""}
      </p>
    </div>
  );
}
