import Link from "next/link";
import { BrandMark } from "@/components/brand";

// Any address the app does not have: our own page with a way back, never the framework's bare one.
export default function NotFound() {
  return (
    <main className="mx-auto flex min-h-dvh max-w-md flex-col items-center justify-center px-6 text-center">
      <span className="text-accent">
        <BrandMark className="h-10 w-10" />
      </span>
      <p className="mt-4 text-sm font-semibold uppercase tracking-widest text-accent">Not found</p>
      <h1 className="mt-2 text-2xl font-semibold">There is no page at this address</h1>
      <p className="mt-2 text-muted">The link may be mistyped, or the case number may not exist or not be open to you.</p>
      <div className="mt-6 flex flex-col gap-3 sm:flex-row">
        <Link
          href="/"
          className="inline-flex min-h-11 items-center justify-center whitespace-nowrap rounded-lg bg-accent px-4 font-medium text-accent-ink"
        >
          Back to your home page
        </Link>
        <Link
          href="/cases"
          className="inline-flex min-h-11 items-center justify-center whitespace-nowrap rounded-lg border border-line px-4 font-medium text-ink"
        >
          Open the case list
        </Link>
      </div>
    </main>
  );
}
