"use client";
// The phone's menu: one button opens every destination as large rows, so nothing hides in a sideways strip.
import { usePathname } from "next/navigation";
import { useEffect, useState } from "react";
import type { NavItem } from "./nav-items";
import { NavLinks } from "./nav-links";

export function PhoneMenu({ items, footer }: { items: NavItem[]; footer: React.ReactNode }) {
  const [open, setOpen] = useState(false);
  const pathname = usePathname();
  useEffect(() => setOpen(false), [pathname]);
  useEffect(() => {
    if (!open) return;
    const onKey = (e: KeyboardEvent) => e.key === "Escape" && setOpen(false);
    window.addEventListener("keydown", onKey);
    return () => window.removeEventListener("keydown", onKey);
  }, [open]);
  return (
    <>
      <button
        type="button"
        aria-expanded={open}
        aria-controls="phone-menu"
        onClick={() => setOpen((o) => !o)}
        className="inline-flex h-11 min-w-11 items-center justify-center gap-1.5 rounded-lg border border-line px-3 text-sm font-medium text-ink"
      >
        <svg viewBox="0 0 24 24" className="h-5 w-5" fill="none" stroke="currentColor" strokeWidth="2" strokeLinecap="round" aria-hidden>
          <path d={open ? "M6 6l12 12M18 6L6 18" : "M4 7h16M4 12h16M4 17h16"} />
        </svg>
        Menu
      </button>
      {open ? (
        <div
          id="phone-menu"
          onClick={(e) => (e.target as HTMLElement).closest("a") && setOpen(false)}
          className="absolute inset-x-0 top-full z-30 max-h-[calc(100dvh-4rem)] overflow-y-auto border-b border-line bg-surface px-3 pb-4 pt-2 shadow-lg"
        >
          <NavLinks items={items} layout="bar" />
          <div className="mt-3 flex items-center justify-between border-t border-line px-1 pt-3 text-sm">{footer}</div>
        </div>
      ) : null}
    </>
  );
}
