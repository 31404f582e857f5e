"use client";
// The list of what to fix, at the top of a form: one link per field, and focus moved to the first one.
import { useEffect, useRef } from "react";

export type FieldErrors = Record<string, string | undefined>;

/** Finds the control for an error key: its id, a `data-field` wrapper, or the nearest enclosing key ("endPlay.trials.0" -> "endPlay"). */
export function fieldElement(key: string, idPrefix = ""): HTMLElement | null {
  const parts = key.split(".");
  for (let n = parts.length; n > 0; n--) {
    const k = parts.slice(0, n).join(".");
    const el = document.querySelector<HTMLElement>(`[id="${CSS.escape(idPrefix + k)}"], [data-field="${CSS.escape(k)}"]`);
    if (el) return el;
  }
  return null;
}

function focusable(el: HTMLElement): HTMLElement {
  if (el.matches("input, select, textarea, button")) return el;
  return el.querySelector<HTMLElement>("input, select, textarea, button") ?? el;
}

/** Moves to the field: scrolled to the middle of the screen, focused so a keyboard or reader lands there. */
export function goToField(key: string, idPrefix = "") {
  const el = fieldElement(key, idPrefix);
  if (!el) return false;
  el.scrollIntoView({ block: "center" });
  focusable(el).focus({ preventScroll: true });
  return true;
}

type Props = { errors: FieldErrors; labels?: Record<string, string>; message?: string; focusFirst?: boolean; idPrefix?: string };

export function ErrorSummary({ errors, labels = {}, message, focusFirst = true, idPrefix = "" }: Props) {
  const box = useRef<HTMLDivElement>(null);
  const entries = Object.entries(errors).filter((e): e is [string, string] => !!e[1] && e[0] !== "_");
  const signature = entries.map(([k, v]) => `${k}:${v}`).join("|") + (message ?? "");
  useEffect(() => {
    if (!signature) return;
    // The first field with a problem, or the summary itself when no field on the page matches.
    const moved = focusFirst && entries.length > 0 && goToField(entries[0][0], idPrefix);
    if (!moved) {
      box.current?.scrollIntoView({ block: "center" });
      box.current?.focus({ preventScroll: true });
    }
    // Only when the set of problems changes, not on every render.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [signature]);
  if (!entries.length && !message) return null;
  const count = entries.length;
  return (
    <div
      ref={box}
      tabIndex={-1}
      role="alert"
      data-testid="error-summary"
      className="rounded-xl border-2 border-danger/60 bg-danger-soft p-4 text-ink outline-none focus:ring-2 focus:ring-danger"
    >
      <p className="text-base font-semibold text-danger">
        {count > 1
          ? `${count} things to fix before this can be saved`
          : count === 1
            ? "One thing to fix before this can be saved"
            : message}
      </p>
      {count ? (
        <ul className="mt-2 flex flex-col gap-1 text-[15px]">
          {entries.map(([key, text]) => (
            <li key={key}>
              <a
                href={`#${idPrefix}${key}`}
                className="inline-flex min-h-11 items-center text-danger underline underline-offset-2"
                onClick={(e) => {
                  e.preventDefault();
                  goToField(key, idPrefix);
                }}
              >
                {labels[key] ? `${labels[key]}: ${text}` : text}
              </a>
            </li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}
