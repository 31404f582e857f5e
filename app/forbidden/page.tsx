import Link from "next/link";

export default function ForbiddenPage() {
  return (
    <main className="mx-auto flex min-h-dvh max-w-md flex-col items-center justify-center px-6 text-center">
      <p className="text-sm font-semibold uppercase tracking-widest text-accent">Not for your role</p>
      <h1 className="mt-2 text-2xl font-semibold">This page is not open to your role</h1>
      <p className="mt-2 text-muted">If you need it for your work, ask your Tearline administrator to change your role.</p>
      <Link href="/" className="mt-6 text-sm font-medium text-accent hover:underline">
        Back to your home page
      </Link>
    </main>
  );
}
