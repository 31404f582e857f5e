"use client";
// Admins can send the weekly digest at once instead of waiting for Monday.
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { callApi } from "@/lib/client/api";

export function SendDigestButton() {
  const [state, setState] = useState<{ busy: boolean; text: string | null; tone: "ok" | "danger" }>({
    busy: false,
    text: null,
    tone: "ok",
  });
  async function send() {
    if (!window.confirm("Send the weekly digest to managers now?")) return;
    setState({ busy: true, text: null, tone: "ok" });
    const res = await callApi<{ recipients?: number }>("POST", "/api/digest");
    if (!res.ok) return setState({ busy: false, tone: "danger", text: `Not sent: ${res.message.replace(/\.$/, "")}.` });
    const n = res.data?.recipients ?? 0;
    setState({
      busy: false,
      tone: "ok",
      text: n ? `Digest queued for ${n} ${n === 1 ? "person" : "people"}.` : "Nobody has the digest switched on.",
    });
  }
  return (
    <div className="flex items-center gap-3">
      {state.text ? (
        <p role="status" className={`text-sm ${state.tone === "ok" ? "text-ok" : "text-danger"}`}>
          {state.text}
        </p>
      ) : null}
      <Button variant="secondary" onClick={send} disabled={state.busy}>
        {state.busy ? "Sending…" : "Send digest now"}
      </Button>
    </div>
  );
}
