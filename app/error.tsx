"use client";
import { BrandMark } from "@/components/brand";

// A page that failed while rendering (the database dropped mid-request, say): our own plain words and
// a way to try again, never the framework's bare error page. The reference lets an admin find the log line.
// "Try again" reloads the address, since the failure was in the server's render, not in this page.
// The way home is a plain link, a fresh load after a failure: this boundary's code comes with every
// page, and next/link here would bring a second copy of the router's link code into each first load.
export default function PageError({ error }: { error: Error & { digest?: string } }) {
  return (
    <main className="mx-auto flex min-h-dvh max-w-md flex-col items-center justify-center px-6 text-center">
      <span className="text-accent">
        <BrandMark className="h-10 w-10" />
      </span>
      <p className="mt-4 text-sm font-semibold uppercase tracking-widest text-accent">Page not loaded</p>
      <h1 className="mt-2 text-2xl font-semibold">This page could not be loaded</h1>
      <p className="mt-2 text-muted">
        The server stopped partway through. It is often a moment&apos;s outage of the casebook&apos;s database; nothing saved before it is
        lost, and a draft report stays on this device.
      </p>
      {error.digest ? <p className="mt-3 text-xs text-muted">Reference for your administrator: {error.digest}</p> : null}
      <div className="mt-6 flex flex-col gap-3 sm:flex-row">
        <button
          type="button"
          onClick={() => window.location.reload()}
          className="inline-flex min-h-11 items-center justify-center whitespace-nowrap rounded-lg bg-accent px-4 font-medium text-accent-ink"
        >
          Try again
        </button>
        {/* eslint-disable-next-line @next/next/no-html-link-for-pages -- a fresh load after a failed render (see above) */}
        <a
          href="/"
          className="inline-flex min-h-11 items-center justify-center whitespace-nowrap rounded-lg border border-line px-4 font-medium text-ink"
        >
          Back to your home page
        </a>
      </div>
    </main>
  );
}
