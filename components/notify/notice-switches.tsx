"use client";
import { useState } from "react";
import { sendJson } from "@/lib/client/api";

export type NoticeSwitch = { kind: string; label: string; description: string; on: boolean };

/** One switch per notice; each flip is saved at once and undone if the server refuses it. */
export function NoticeSwitches({ initial }: { initial: NoticeSwitch[] }) {
  const [items, setItems] = useState(initial);
  const [saving, setSaving] = useState<string | null>(null);
  const [status, setStatus] = useState<{ tone: "ok" | "danger"; text: string } | null>(null);

  async function flip(kind: string, on: boolean) {
    const before = items;
    setItems(items.map((i) => (i.kind === kind ? { ...i, on } : i)));
    setSaving(kind);
    setStatus(null);
    const label = items.find((i) => i.kind === kind)?.label ?? kind;
    const res = await sendJson("PATCH", "/api/me/notices", { [kind]: on });
    setSaving(null);
    if (res.ok) return setStatus({ tone: "ok", text: `${label}: ${on ? "you will get this e-mail" : "switched off"}.` });
    setItems(before);
    setStatus({ tone: "danger", text: `Not saved: ${res.message.replace(/\.$/, "")}.` });
  }

  return (
    <div>
      <ul className="-my-1 divide-y divide-line">
        {items.map((i) => (
          <li key={i.kind} className="flex items-start justify-between gap-4 py-3.5">
            <label htmlFor={`notice-${i.kind}`} className="min-w-0 cursor-pointer">
              <span className="block font-medium text-ink">{i.label}</span>
              <span className="mt-0.5 block text-sm leading-snug text-muted">{i.description}</span>
            </label>
            <button
              id={`notice-${i.kind}`}
              type="button"
              role="switch"
              aria-checked={i.on}
              disabled={saving === i.kind}
              onClick={() => flip(i.kind, !i.on)}
              className={`relative mt-0.5 inline-flex h-7 w-12 shrink-0 items-center rounded-full transition focus-visible:outline-2 focus-visible:outline-offset-2 focus-visible:outline-accent disabled:opacity-60 ${i.on ? "bg-accent" : "bg-line-strong"}`}
            >
              <span className="sr-only">{i.on ? "On" : "Off"}</span>
              <span
                aria-hidden
                className={`inline-block h-5 w-5 rounded-full bg-white shadow transition ${i.on ? "translate-x-6" : "translate-x-1"}`}
              />
            </button>
          </li>
        ))}
      </ul>
      <p
        role="status"
        aria-live="polite"
        className={status ? `mt-3 text-sm ${status.tone === "danger" ? "text-danger" : "text-ok"}` : "sr-only"}
      >
        {status?.text ?? ""}
      </p>
    </div>
  );
}
