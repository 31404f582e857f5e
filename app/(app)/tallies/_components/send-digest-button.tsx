"use client";
// Admins can send the weekly digest at once instead of waiting for Monday.
import { useState } from "react";
import { Button } from "@/components/ui/button";

export function SendDigestButton() {
  const [state, setState] = useState<{ busy: boolean; text: string | null; tone: "ok" | "danger" }>({ busy: false, text: null, tone: "ok" });
  async function send() {
    if (!window.confirm("Send the weekly digest to managers now?")) return;
    setState({ busy: true, text: null, tone: "ok" });
    try {
      const res = await fetch("/api/digest", { method: "POST" });
      const body = (await res.json().catch(() => ({}))) as { recipients?: number; error?: string };
      if (!res.ok) throw new Error(body.error ?? `HTTP ${res.status}`);
      setState({ busy: false, tone: "ok", text: body.recipients ? `Digest queued for ${body.recipients} ${body.recipients === 1 ? "person" : "people"}.` : "Nobody has the digest switched on." });
    } catch (err) {
      setState({ busy: false, tone: "danger", text: `Not sent: ${err instanceof Error ? err.message : "try again"}.` });
    }
  }
  return (
    <div className="flex items-center gap-3">
      {state.text ? <p role="status" className={`text-sm ${state.tone === "ok" ? "text-ok" : "text-danger"}`}>{state.text}</p> : null}
      <Button variant="secondary" onClick={send} disabled={state.busy}>{state.busy ? "Sending…" : "Send digest now"}</Button>
    </div>
  );
}
