import type { Metadata } from "next";
import { headers } from "next/headers";
import { BrandMark } from "@/components/brand";
import { RETRY_HEADER, retryPath } from "@/lib/http/page-outage";

export const metadata: Metadata = { title: "Casebook out of reach" };

// Shown by proxy.ts, with status 503, in place of any page while the database does not answer.
// It reads nothing from the database, so it renders however long the outage lasts.
export default async function UnavailablePage() {
  const again = retryPath((await headers()).get(RETRY_HEADER));
  return (
    <main className="mx-auto flex min-h-dvh max-w-md flex-col items-center justify-center px-6 text-center">
      <span className="text-accent">
        <BrandMark className="h-10 w-10" />
      </span>
      <p className="mt-4 text-sm font-semibold uppercase tracking-widest text-accent">Casebook out of reach</p>
      <h1 className="mt-2 text-2xl font-semibold">The casebook cannot be reached right now</h1>
      <p className="mt-2 text-muted">
        Tearline&apos;s database is not answering, so cases cannot be shown or saved for the moment. This is on the server&apos;s side, not
        yours.
      </p>
      <div className="mt-5 w-full rounded-lg border border-line bg-surface p-4 text-left text-sm text-ink-2">
        <p className="font-medium text-ink">Nothing you typed is lost</p>
        <p className="mt-1">
          A new removal report keeps its draft on this device until it is filed. Open it again once the casebook is back and carry on where
          you left off.
        </p>
      </div>
      <p className="mt-4 text-sm text-muted">Try again in a minute. If it keeps happening, tell your Tearline administrator.</p>
      <a
        href={again}
        className="mt-6 inline-flex min-h-11 items-center justify-center whitespace-nowrap rounded-lg bg-accent px-4 font-medium text-accent-ink"
      >
        Try again
      </a>
    </main>
  );
}
