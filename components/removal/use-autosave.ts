"use client";
// Autosave for the removal form: a new report keeps its draft in this browser until it is filed;
// an existing case saves to the server a moment after typing stops, at the version it was loaded.
import { useCallback, useEffect, useRef, useState } from "react";
import { forSaving, type RemovalDraft } from "./form-state";
import { fetchWithTimeout } from "@/lib/http/client-fetch";

export type SaveState = { kind: "idle" | "saving" | "saved" | "error" | "conflict"; message?: string; fields?: Record<string, string> };

const DRAFT_KEY = "tearline:new-removal";

export function loadLocalDraft(): RemovalDraft | null {
  try {
    const raw = localStorage.getItem(DRAFT_KEY);
    return raw ? (JSON.parse(raw) as RemovalDraft) : null;
  } catch {
    return null;
  }
}
export const clearLocalDraft = () => localStorage.removeItem(DRAFT_KEY);

function normaliseFields(fields: Record<string, string> | undefined) {
  return Object.fromEntries(Object.entries(fields ?? {}).map(([k, v]) => [k.replace(/^data\./, ""), v]));
}

export async function readError(res: Response): Promise<SaveState> {
  const body = (await res.json().catch(() => ({}))) as { error?: string; fields?: Record<string, string> };
  return { kind: res.status === 409 ? "conflict" : "error", message: body.error ?? `Save failed (${res.status}).`, fields: normaliseFields(body.fields) };
}

export function useAutosave(draft: RemovalDraft, opts: { mode: "new" | "edit"; caseId?: string; version?: number; enabled: boolean }) {
  const [state, setState] = useState<SaveState>({ kind: "idle" });
  const version = useRef(opts.version ?? 0);
  const first = useRef(true);

  const saveNow = useCallback(async () => {
    if (opts.mode === "new") {
      localStorage.setItem(DRAFT_KEY, JSON.stringify(draft));
      setState({ kind: "saved", message: "Draft kept on this device" });
      return;
    }
    setState({ kind: "saving" });
    const sent = await fetchWithTimeout(`/api/cases/${opts.caseId}`, {
      method: "PATCH",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({ version: version.current, section: "field", data: forSaving(draft) }),
    });
    const res = sent.res;
    if (!res) {
      localStorage.setItem(`${DRAFT_KEY}:${opts.caseId}`, JSON.stringify(draft));
      return setState({ kind: "error", message: `${"message" in sent ? sent.message : ""} Your edits are kept on this device.` });
    }
    if (!res.ok) {
      // Keep the unsaved edits on this device so a refused save never loses them.
      localStorage.setItem(`${DRAFT_KEY}:${opts.caseId}`, JSON.stringify(draft));
      return setState(await readError(res));
    }
    const body = (await res.json()) as { case: { version: number } };
    version.current = body.case.version;
    setState({ kind: "saved", message: "Saved" });
  }, [draft, opts.mode, opts.caseId]);

  useEffect(() => {
    if (first.current) {
      first.current = false;
      return;
    }
    if (!opts.enabled || state.kind === "conflict") return;
    const t = setTimeout(() => void saveNow(), opts.mode === "new" ? 400 : 1500);
    return () => clearTimeout(t);
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [draft]);

  return { state, setState, saveNow, version };
}
