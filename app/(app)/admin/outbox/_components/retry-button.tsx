"use client";
import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { Button } from "@/components/ui/button";

/** Sends every unsent mail now and refreshes the table with the outcome. */
export function RetryButton({ unsent }: { unsent: number }) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [busy, setBusy] = useState(false);
  const [note, setNote] = useState<string | null>(null);

  async function retry() {
    setBusy(true);
    setNote(null);
    try {
      const res = await fetch("/api/admin/outbox/retry", { method: "POST" });
      const body = (await res.json().catch(() => ({}))) as { sent?: number; failed?: number; error?: string };
      if (!res.ok) setNote(body.error ?? `Retry refused (HTTP ${res.status}).`);
      else if (!body.sent && !body.failed) setNote("Nothing was waiting to be sent.");
      else setNote(`${body.sent ?? 0} sent, ${body.failed ?? 0} still failing.`);
    } catch {
      setNote("The server could not be reached.");
    } finally {
      setBusy(false);
      startTransition(() => router.refresh());
    }
  }

  return (
    <div className="flex flex-col items-stretch gap-1 sm:items-end">
      <Button onClick={retry} disabled={busy || pending} size="md" className="whitespace-nowrap">
        {busy ? "Sending…" : unsent > 0 ? `Retry now (${unsent})` : "Retry now"}
      </Button>
      <p role="status" aria-live="polite" className="min-h-4 text-xs text-muted">{note ?? ""}</p>
    </div>
  );
}
