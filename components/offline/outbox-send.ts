// Sends the outbox: each report once, with its Idempotency-Key, under a time limit so nothing hangs.
import { callApi } from "@/lib/client/api";
import { announce, deleteEntry, listEntries, putEntry, type OutboxEntry } from "./outbox-store";

/** A filing that has not answered in this long is treated as no signal and retried later. */
export const SEND_TIMEOUT_MS = 15_000;

export type SendResult =
  | { kind: "filed"; number: string }
  | { kind: "retry"; reason: string }
  | { kind: "refused"; message: string; fields?: Record<string, string> };

export async function sendReport(key: string, body: unknown): Promise<SendResult> {
  const res = await callApi<{ case: { number: string } }>("POST", "/api/cases", {
    json: body,
    headers: { "idempotency-key": key },
    timeoutMs: SEND_TIMEOUT_MS,
    fallback: "The server refused the report.",
  });
  if (res.ok) return { kind: "filed", number: res.data.case.number };
  if (res.status === 0) return { kind: "retry", reason: res.code === "timeout" ? "The server did not answer in time." : "No connection." };
  // Signed out, busy or broken server: worth another try; anything else is the report itself.
  if (res.status === 401 || res.status === 408 || res.status === 429 || res.status >= 500) {
    return {
      kind: "retry",
      reason: res.status === 401 ? "Sign in again to send it." : `The server answered ${res.status}; it will try again.`,
    };
  }
  return { kind: "refused", message: res.message, fields: res.fields };
}

let flushing: Promise<void> | null = null;

/** Sends every waiting report; one flush at a time per page, and the key makes a second tab harmless. */
export function flushOutbox(): Promise<void> {
  flushing ??= (async () => {
    try {
      for (const entry of await listEntries()) {
        if (entry.state === "refused" || !navigator.onLine) continue;
        await sendEntry(entry);
      }
    } finally {
      flushing = null;
    }
  })();
  return flushing;
}

export async function sendEntry(entry: OutboxEntry): Promise<SendResult> {
  await putEntry({ ...entry, state: "sending" });
  announce();
  const result = await sendReport(entry.key, entry.body);
  if (result.kind === "filed") {
    await deleteEntry(entry.key);
    announce({ sent: { key: entry.key, number: result.number } });
  } else {
    await putEntry({
      ...entry,
      attempts: entry.attempts + 1,
      state: result.kind === "refused" ? "refused" : "waiting",
      error: result.kind === "refused" ? result.message : result.reason,
    });
    announce();
  }
  return result;
}
