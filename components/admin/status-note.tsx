// A short line under a form or row saying what just happened (or what went wrong).
export type Note = { tone: "ok" | "danger"; text: string } | null;

export function StatusNote({ note, className = "" }: { note: Note; className?: string }) {
  return (
    <p role="status" aria-live="polite" className={`min-h-5 text-sm ${note?.tone === "danger" ? "text-danger" : "text-ok"} ${className}`}>
      {note?.text ?? ""}
    </p>
  );
}
