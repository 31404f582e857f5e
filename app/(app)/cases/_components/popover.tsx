"use client";
// A button that opens a small panel below it; closes on Escape (focus back to the button) or a click outside.
import { useEffect, useId, useRef, useState, type ReactNode } from "react";
import { Icon } from "./icons";

type Props = {
  label: ReactNode;
  title: string;
  active?: boolean;
  align?: "start" | "end";
  testId?: string;
  children: (close: () => void) => ReactNode;
};

export const chipClass = (active: boolean) =>
  `inline-flex h-11 items-center gap-1.5 whitespace-nowrap rounded-lg border px-3 text-sm font-medium transition sm:h-9 ${
    active ? "border-accent/50 bg-accent-soft text-ink" : "border-line-strong bg-surface text-ink-2 hover:bg-surface-2"
  } focus-visible:outline-2 focus-visible:outline-offset-2 focus-visible:outline-accent`;

export function Popover({ label, title, active = false, align = "start", testId, children }: Props) {
  const [open, setOpen] = useState(false);
  const box = useRef<HTMLDivElement>(null);
  const button = useRef<HTMLButtonElement>(null);
  const panelId = useId();

  useEffect(() => {
    if (!open) return;
    const onDown = (e: PointerEvent) => {
      if (!box.current?.contains(e.target as Node)) setOpen(false);
    };
    const onKey = (e: KeyboardEvent) => {
      if (e.key !== "Escape") return;
      setOpen(false);
      button.current?.focus();
    };
    document.addEventListener("pointerdown", onDown);
    document.addEventListener("keydown", onKey);
    return () => {
      document.removeEventListener("pointerdown", onDown);
      document.removeEventListener("keydown", onKey);
    };
  }, [open]);

  return (
    <div ref={box} className="relative">
      <button
        ref={button}
        type="button"
        aria-expanded={open}
        aria-controls={open ? panelId : undefined}
        data-testid={testId}
        onClick={() => setOpen((o) => !o)}
        className={chipClass(active)}
      >
        {label}
        <Icon name="chevron" className={`h-3.5 w-3.5 text-muted transition ${open ? "rotate-180" : ""}`} />
      </button>
      {open ? (
        <div
          id={panelId}
          role="dialog"
          aria-label={title}
          className={`absolute z-30 mt-1.5 w-72 max-w-[calc(100vw-2rem)] rounded-xl border border-line bg-surface p-1.5 shadow-[0_12px_32px_-8px_rgba(15,23,42,0.25)] ${align === "end" ? "right-0" : "left-0"}`}
        >
          {children(() => setOpen(false))}
        </div>
      ) : null}
    </div>
  );
}
