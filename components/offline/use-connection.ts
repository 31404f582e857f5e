"use client";
// Online or not, as the browser knows it, and the outbox entries, kept fresh across tabs.
import { useCallback, useEffect, useState } from "react";
import { listEntries, type OutboxEntry } from "./outbox-store";

export function useOnline(): boolean {
  const [online, setOnline] = useState(true);
  useEffect(() => {
    const update = () => setOnline(navigator.onLine);
    update();
    window.addEventListener("online", update);
    window.addEventListener("offline", update);
    return () => {
      window.removeEventListener("online", update);
      window.removeEventListener("offline", update);
    };
  }, []);
  return online;
}

export function useOutboxEntries(): { entries: OutboxEntry[]; lastSent: { key: string; number: string } | null; refresh: () => void } {
  const [entries, setEntries] = useState<OutboxEntry[]>([]);
  const [lastSent, setLastSent] = useState<{ key: string; number: string } | null>(null);
  const refresh = useCallback(() => {
    listEntries().then(setEntries, () => setEntries([]));
  }, []);
  useEffect(() => {
    refresh();
    const onChange = (e: Event) => {
      const sent = (e as CustomEvent<{ sent?: { key: string; number: string } }>).detail?.sent;
      if (sent) setLastSent(sent);
      refresh();
    };
    window.addEventListener("tearline:outbox", onChange);
    let channel: BroadcastChannel | null = null;
    try {
      channel = new BroadcastChannel("tearline-outbox");
      channel.onmessage = (m) => onChange(new CustomEvent("x", { detail: m.data }));
    } catch {
      channel = null;
    }
    return () => {
      window.removeEventListener("tearline:outbox", onChange);
      channel?.close();
    };
  }, [refresh]);
  return { entries, lastSent, refresh };
}
