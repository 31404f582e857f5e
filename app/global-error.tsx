"use client";
import "./globals.css";

// The shell itself failed to render: the last resort, with its own html and body.
export default function ShellError() {
  return (
    <html lang="en">
      <body className="min-h-dvh bg-bg font-sans text-ink antialiased">
        <main className="mx-auto flex min-h-dvh max-w-md flex-col items-center justify-center px-6 text-center">
          <p className="text-sm font-semibold uppercase tracking-widest text-accent">Tearline</p>
          <h1 className="mt-2 text-2xl font-semibold">Tearline could not load</h1>
          <p className="mt-2 text-muted">
            The server stopped partway through. Try again in a moment; if it keeps happening, tell your Tearline administrator.
          </p>
          <button
            type="button"
            onClick={() => window.location.reload()}
            className="mt-6 inline-flex min-h-11 items-center justify-center rounded-lg bg-accent px-4 font-medium text-accent-ink"
          >
            Try again
          </button>
        </main>
      </body>
    </html>
  );
}
