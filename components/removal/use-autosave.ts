"use client";
// Autosave for the removal form: a new report keeps its draft in this browser until it is filed;
// an existing case saves to the server a moment after typing stops, at the version it was loaded.
import { useCallback, useEffect, useRef, useState } from "react";
import { forSaving, type RemovalDraft } from "./form-state";
import { callApi, type ApiProblem } from "@/lib/client/api";

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

/** A refused save as the form shows it; field keys arrive without their `data.` prefix. */
export function saveStateFrom(problem: ApiProblem): SaveState {
  return { kind: problem.conflict ? "conflict" : "error", message: problem.message, fields: problem.fields };
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
    const res = await callApi<{ case: { version: number } }>("PATCH", `/api/cases/${opts.caseId}`, {
      json: { version: version.current, section: "field", data: forSaving(draft) },
      fieldPrefixes: ["data"],
      fallback: "Save failed.",
    });
    if (!res.ok) {
      // Keep the unsaved edits on this device so a refused or lost save never loses them.
      localStorage.setItem(`${DRAFT_KEY}:${opts.caseId}`, JSON.stringify(draft));
      if (res.status === 0) return setState({ kind: "error", message: `${res.message} Your edits are kept on this device.` });
      return setState(saveStateFrom(res));
    }
    version.current = res.data.case.version;
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
