"use client";
import Link from "next/link";
import { usePathname } from "next/navigation";
import type { NavItem } from "./nav-items";

function isActive(pathname: string, href: string) {
  if (href === "/") return pathname === "/";
  if (href === "/cases") return pathname === "/cases" || (pathname.startsWith("/cases/") && !pathname.startsWith("/cases/new"));
  return pathname.startsWith(href);
}

export function NavLinks({ items, layout }: { items: NavItem[]; layout: "side" | "bar" }) {
  const pathname = usePathname();
  const main = items.filter((i) => !i.group);
  const admin = items.filter((i) => i.group === "admin");
  const link = (i: NavItem) => {
    const active = isActive(pathname, i.href);
    return (
      <Link
        key={i.href}
        href={i.href}
        aria-current={active ? "page" : undefined}
        className={
          layout === "side"
            ? `flex items-center gap-3 rounded-lg px-3 py-2 text-sm font-medium ${active ? "bg-white/10 text-white" : "text-slate-400 hover:bg-white/5 hover:text-white"}`
            : `flex min-h-12 items-center gap-3 rounded-lg border px-3 text-[15px] font-medium ${active ? "border-accent bg-accent text-accent-ink" : "border-line text-ink hover:bg-surface-2"}`
        }
      >
        <svg
          viewBox="0 0 24 24"
          className="h-5 w-5 shrink-0"
          fill="none"
          stroke="currentColor"
          strokeWidth="1.8"
          strokeLinecap="round"
          strokeLinejoin="round"
          aria-hidden
        >
          <path d={i.icon} />
        </svg>
        {i.label}
      </Link>
    );
  };
  if (layout === "bar")
    return (
      <nav aria-label="Main" className="flex flex-col gap-2">
        <div className="grid grid-cols-2 gap-2">{main.map(link)}</div>
        {admin.length ? <p className="mt-2 px-1 text-[11px] font-semibold uppercase tracking-widest text-muted">Administration</p> : null}
        {admin.length ? <div className="grid grid-cols-2 gap-2">{admin.map(link)}</div> : null}
      </nav>
    );
  return (
    <nav aria-label="Main" className="flex flex-col gap-1">
      {main.map(link)}
      {admin.length ? (
        <p className="mt-5 px-3 pb-1 text-[11px] font-semibold uppercase tracking-widest text-slate-500">Administration</p>
      ) : null}
      {admin.map(link)}
    </nav>
  );
}
