"use client";
// Connection and outbox state, always on screen: online, offline, reports waiting to send, sent, refused.
import Link from "next/link";
import { useEffect } from "react";
import { flushOutbox } from "./outbox-send";
import { deleteEntry } from "./outbox-store";
import { useOnline, useOutboxEntries } from "./use-connection";

/** How often waiting reports are retried while the browser says it is online. */
const RETRY_MS = 20_000;

export function OutboxBar() {
  const online = useOnline();
  const { entries, lastSent, refresh } = useOutboxEntries();
  const waiting = entries.filter((e) => e.state !== "refused");
  const refused = entries.filter((e) => e.state === "refused");

  useEffect(() => {
    if (!online) return;
    void flushOutbox();
    const t = setInterval(() => void flushOutbox(), RETRY_MS);
    return () => clearInterval(t);
  }, [online]);

  useEffect(() => {
    if ("serviceWorker" in navigator) navigator.serviceWorker.register("/sw.js", { scope: "/" }).catch(() => undefined);
  }, []);

  if (online && entries.length === 0 && !lastSent) return null;
  const tone = !online
    ? "border-warn/40 bg-warn-soft text-warn"
    : refused.length
      ? "border-danger/40 bg-danger-soft text-danger"
      : "border-ok/40 bg-ok-soft text-ok";
  return (
    <section
      aria-label="Connection and outbox"
      data-testid="outbox"
      data-online={online}
      data-waiting={waiting.length}
      className={`no-print border-b px-4 py-2.5 text-sm ${tone}`}
    >
      <p role="status" className="font-semibold">
        {!online ? (
          "Offline — reports you file are kept on this device."
        ) : waiting.length ? (
          "Back online — sending…"
        ) : lastSent ? (
          <>
            Sent:{" "}
            <Link className="underline" href={`/cases/${lastSent.number}`}>
              {lastSent.number}
            </Link>{" "}
            is filed.
          </>
        ) : null}
        {waiting.length ? (
          <span className="ml-1 font-normal">
            {waiting.length} {waiting.length === 1 ? "report" : "reports"} waiting to send.
          </span>
        ) : null}
      </p>
      {entries.length ? (
        <ul className="mt-1.5 flex flex-col gap-1.5">
          {entries.map((e) => (
            <li
              key={e.key}
              data-testid="outbox-entry"
              data-state={e.state}
              className="flex flex-wrap items-center justify-between gap-2 rounded-lg bg-surface/70 px-3 py-2 text-ink-2"
            >
              <span>
                <b className="text-ink">{e.label}</b> ·{" "}
                {e.state === "refused" ? `not filed: ${e.error}` : e.state === "sending" ? "sending…" : "waiting to send"}
                {e.state === "waiting" && e.error ? <span className="text-muted"> ({e.error})</span> : null}
              </span>
              {e.state === "refused" ? (
                <button
                  type="button"
                  className="min-h-11 rounded-lg border border-line-strong px-3 font-medium"
                  onClick={() => void deleteEntry(e.key).then(refresh)}
                >
                  Discard
                </button>
              ) : online ? (
                <button
                  type="button"
                  className="min-h-11 rounded-lg border border-line-strong px-3 font-medium"
                  onClick={() => void flushOutbox()}
                >
                  Send now
                </button>
              ) : null}
            </li>
          ))}
        </ul>
      ) : null}
    </section>
  );
}
