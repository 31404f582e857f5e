import Link from "next/link";
import { BrandMark } from "@/components/brand";
import { ROLE_LABELS } from "@/lib/auth/permissions";
import type { CurrentUser } from "@/lib/auth/session";
import { navFor } from "./nav-items";
import { NavLinks } from "./nav-links";
import { OutboxBar } from "@/components/offline/outbox-bar";
import { SignOutButton } from "./sign-out-button";
import { PhoneMenu } from "./phone-menu";

export function AppShell({ user, children }: { user: CurrentUser; children: React.ReactNode }) {
  const items = navFor(user.role);
  return (
    <div className="min-h-dvh lg:grid lg:grid-cols-[232px_1fr]">
      <aside className="no-print sticky top-0 hidden h-dvh flex-col justify-between bg-[#0f172a] px-3 py-5 lg:flex">
        <div>
          <Link href="/" className="mb-7 flex items-center gap-2 px-3 text-amber-400">
            <BrandMark />
            <span className="text-lg font-semibold tracking-tight text-white">Tearline</span>
          </Link>
          <NavLinks items={items} layout="side" />
        </div>
        <div className="border-t border-white/10 px-3 pt-4 text-sm">
          <p className="truncate font-medium text-white" data-testid="current-user">
            {user.name}
          </p>
          <p className="truncate text-xs text-slate-400">{ROLE_LABELS[user.role]}</p>
          <div className="mt-3 flex gap-3 text-xs">
            <Link href="/profile" className="text-slate-400 hover:text-white">
              Notices
            </Link>
            <SignOutButton className="text-slate-400 hover:text-white" />
          </div>
        </div>
      </aside>
      <div className="min-w-0">
        <header className="no-print sticky top-0 z-20 border-b border-line bg-surface/95 backdrop-blur lg:hidden">
          <div className="flex items-center justify-between px-4 py-2.5">
            <Link href="/" className="flex min-h-11 items-center gap-2 text-accent">
              <BrandMark className="h-6 w-6" />
              <span className="font-semibold text-ink">Tearline</span>
            </Link>
            <PhoneMenu
              items={items}
              footer={
                <>
                  <Link
                    href="/profile"
                    className="inline-flex min-h-11 items-center truncate text-ink-2 underline-offset-4 hover:underline"
                    title="Your notices"
                  >
                    {user.name} · {ROLE_LABELS[user.role]}
                  </Link>
                  <SignOutButton className="inline-flex min-h-11 items-center rounded-lg border border-line px-3 text-ink-2" />
                </>
              }
            />
          </div>
        </header>
        <OutboxBar />
        <main className="mx-auto w-full max-w-7xl px-4 py-5 sm:px-6 lg:px-8 lg:py-8">{children}</main>
      </div>
    </div>
  );
}
