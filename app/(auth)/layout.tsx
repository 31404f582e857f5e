import { BrandMark } from "@/components/brand";

export default function AuthLayout({ children }: { children: React.ReactNode }) {
  return (
    <main className="grid min-h-dvh lg:grid-cols-[1.1fr_1fr]">
      <section className="relative hidden overflow-hidden bg-[#0f172a] p-12 text-slate-200 lg:flex lg:flex-col lg:justify-between">
        <div className="flex items-center gap-2 text-amber-400">
          <BrandMark className="h-9 w-9" />
          <span className="text-xl font-semibold tracking-tight text-white">Tearline</span>
        </div>
        <div className="max-w-md">
          <p className="text-3xl font-semibold leading-tight text-white">Every removed bearing, from the shop floor to a signed verdict.</p>
          <p className="mt-4 text-slate-400">
            Field checks, teardown findings and root causes in one casebook, so the causes that recur and the removals that teardown did not
            confirm are plain to see.
          </p>
        </div>
        <p className="text-xs text-slate-500">Tearline casebook</p>
        <svg viewBox="0 0 400 400" className="pointer-events-none absolute -right-24 -bottom-24 h-[420px] w-[420px] opacity-10" aria-hidden>
          <circle cx="200" cy="200" r="180" fill="none" stroke="#fbbf24" strokeWidth="26" />
          <circle cx="200" cy="200" r="90" fill="none" stroke="#fbbf24" strokeWidth="26" />
        </svg>
      </section>
      <section className="flex items-center justify-center px-5 py-10">
        <div className="w-full max-w-sm">
          <div className="mb-8 flex items-center gap-2 text-accent lg:hidden">
            <BrandMark className="h-8 w-8" />
            <span className="text-lg font-semibold text-ink">Tearline</span>
          </div>
          {children}
        </div>
      </section>
    </main>
  );
}
