"use client";
// Which columns a person shows, kept in this browser so the choice survives reloads.
import { useCallback, useEffect, useState } from "react";
import type { Updater, VisibilityState } from "@tanstack/react-table";
import { CASE_COLUMNS, defaultColumnVisibility } from "@/lib/cases/list-columns";

const KEY = "tearline.case-list.columns.v1";

function sanitize(saved: unknown): VisibilityState {
  const out: VisibilityState = defaultColumnVisibility();
  if (saved && typeof saved === "object") {
    for (const c of CASE_COLUMNS) {
      const v = (saved as Record<string, unknown>)[c.id];
      if (c.hideable && typeof v === "boolean") out[c.id] = v;
    }
  }
  return out;
}

export function useColumnVisibility() {
  const [visibility, setVisibility] = useState<VisibilityState>(defaultColumnVisibility);
  const [loaded, setLoaded] = useState(false);

  useEffect(() => {
    try {
      setVisibility(sanitize(JSON.parse(window.localStorage.getItem(KEY) ?? "null")));
    } catch {
      /* unreadable or blocked storage: keep the defaults */
    }
    setLoaded(true);
  }, []);

  useEffect(() => {
    if (!loaded) return;
    try {
      window.localStorage.setItem(KEY, JSON.stringify(visibility));
    } catch {
      /* storage full or blocked: the choice lasts for this visit only */
    }
  }, [visibility, loaded]);

  const update = useCallback((u: Updater<VisibilityState>) => setVisibility((prev) => sanitize(typeof u === "function" ? u(prev) : u)), []);
  const reset = useCallback(() => setVisibility(defaultColumnVisibility()), []);
  return { visibility, setVisibility: update, reset, loaded };
}
