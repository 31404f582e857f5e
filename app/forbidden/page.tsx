import Link from "next/link";
import { BrandMark } from "@/components/brand";

// A page outside the reader's role: our own page, saying why, with a way back.

export default function ForbiddenPage() {
  return (
    <main className="mx-auto flex min-h-dvh max-w-md flex-col items-center justify-center px-6 text-center">
      <span className="text-accent">
        <BrandMark className="h-10 w-10" />
      </span>
      <p className="mt-4 text-sm font-semibold uppercase tracking-widest text-accent">Not for your role</p>
      <h1 className="mt-2 text-2xl font-semibold">This page is not open to your role</h1>
      <p className="mt-2 text-muted">If you need it for your work, ask your Tearline administrator to change your role.</p>
      <Link
        href="/"
        className="mt-6 inline-flex min-h-11 items-center justify-center rounded-lg bg-accent px-4 font-medium text-accent-ink"
      >
        Back to your home page
      </Link>
    </main>
  );
}
