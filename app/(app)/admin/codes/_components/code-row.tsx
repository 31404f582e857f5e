"use client";
import { useRouter } from "next/navigation";
import { useId, useState } from "react";
import { quietDangerClass } from "@/components/admin/quiet-danger";
import { sendJson } from "@/lib/client/api";
import { StatusNote, type Note } from "@/components/admin/status-note";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { Field, Input, Textarea } from "@/components/ui/field";
import { codePatchSchema, parseSynonyms } from "@/lib/validation/code-entry";
import type { CodeView } from "./types";

const casesText = (n: number) => (n === 0 ? "Not used yet" : `Used in ${n} ${n === 1 ? "case" : "cases"}`);

/** One code: read it, edit its words, retire or restore it, or delete it while nothing uses it. */
export function CodeRow({ entry }: { entry: CodeView }) {
  const router = useRouter();
  const id = useId();
  const [editing, setEditing] = useState(false);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [note, setNote] = useState<Note>(null);
  const [busy, setBusy] = useState(false);
  const url = `/api/admin/codes/${entry.list}/${encodeURIComponent(entry.code)}`;

  async function send(method: "PATCH" | "DELETE", body: unknown, done: string) {
    setBusy(true);
    setNote(null);
    const res = await sendJson(method, url, body);
    setBusy(false);
    if (!res.ok) {
      setErrors(res.fields);
      setNote({ tone: "danger", text: res.message });
      return false;
    }
    setNote({ tone: "ok", text: done });
    router.refresh();
    return true;
  }

  async function onSave(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const data = new FormData(e.currentTarget);
    const change = {
      label: String(data.get("label") ?? ""),
      description: String(data.get("description") ?? ""),
      synonyms: parseSynonyms(String(data.get("synonyms") ?? "")),
      ...(entry.list === "damage" ? { isoMode: String(data.get("isoMode") ?? "").trim() || null } : {}),
    };
    const local = codePatchSchema.safeParse(change);
    if (!local.success) {
      const next: Record<string, string> = {};
      for (const issue of local.error.issues) next[String(issue.path[0])] ??= issue.message;
      return setErrors(next);
    }
    setErrors({});
    if (await send("PATCH", change, "Saved.")) setEditing(false);
  }

  const f = (n: string) => `${id}-${n}`;
  return (
    <li className={`py-4 ${entry.retired ? "opacity-70" : ""}`} data-testid={`code-${entry.code}`}>
      <div className="flex flex-col gap-3 sm:flex-row sm:items-start sm:justify-between">
        <div className="min-w-0">
          <p className="flex flex-wrap items-center gap-2">
            <span className={`font-medium ${entry.retired ? "text-muted line-through decoration-1" : "text-ink"}`}>{entry.label}</span>
            <code className="rounded bg-surface-2 px-1.5 py-0.5 font-mono text-xs text-ink-2 ring-1 ring-line">{entry.code}</code>
            {entry.retired ? <Badge tone="warn">Retired</Badge> : null}
          </p>
          {entry.description ? <p className="mt-1 text-sm text-ink-2">{entry.description}</p> : null}
          {entry.isoMode ? <p className="mt-1 text-xs text-muted">ISO 15243: {entry.isoMode}</p> : null}
          {entry.synonyms.length ? (
            <ul className="mt-2 flex flex-wrap gap-1.5" aria-label="Shop words">
              {entry.synonyms.map((s) => (
                <li key={s} className="rounded-full bg-surface-2 px-2 py-0.5 text-xs text-ink-2 ring-1 ring-line">
                  {s}
                </li>
              ))}
            </ul>
          ) : null}
        </div>
        <div className="flex shrink-0 flex-wrap items-center gap-1 sm:flex-col sm:items-end">
          <span className="mr-2 text-xs text-muted sm:mr-0 sm:mb-1">{casesText(entry.cases)}</span>
          {!editing ? (
            <div className="flex flex-wrap gap-1">
              <Button size="sm" variant="secondary" onClick={() => setEditing(true)} disabled={busy}>
                Edit
              </Button>
              {entry.retired ? (
                <Button
                  size="sm"
                  variant="secondary"
                  onClick={() => send("PATCH", { retired: false }, "Restored: offered in pickers again.")}
                  disabled={busy}
                >
                  Restore
                </Button>
              ) : (
                <button
                  type="button"
                  className={quietDangerClass}
                  onClick={() => send("PATCH", { retired: true }, "Retired: old cases keep it; pickers no longer offer it.")}
                  disabled={busy}
                >
                  Retire
                </button>
              )}
              {entry.cases === 0 ? (
                <button type="button" className={quietDangerClass} onClick={() => send("DELETE", undefined, "Deleted.")} disabled={busy}>
                  Delete
                </button>
              ) : null}
            </div>
          ) : null}
        </div>
      </div>
      {editing ? (
        <form
          onSubmit={onSave}
          noValidate
          className="mt-4 flex flex-col gap-4 rounded-lg border border-line bg-surface-2 p-4"
          aria-label={`Edit ${entry.code}`}
        >
          <Field label="Label" htmlFor={f("label")} error={errors.label}>
            <Input id={f("label")} name="label" defaultValue={entry.label} aria-invalid={!!errors.label} />
          </Field>
          <Field
            label={entry.list === "damage" ? "What it looks like" : "What it means"}
            htmlFor={f("description")}
            error={errors.description}
          >
            <Textarea id={f("description")} name="description" rows={2} className="min-h-16" defaultValue={entry.description} />
          </Field>
          <Field label="Shop words" htmlFor={f("synonyms")} error={errors.synonyms} hint="Separated by commas.">
            <Input id={f("synonyms")} name="synonyms" defaultValue={entry.synonyms.join(", ")} />
          </Field>
          {entry.list === "damage" ? (
            <Field label="ISO 15243 mode" htmlFor={f("isoMode")} error={errors.isoMode} hint="Leave empty outside the standard's modes.">
              <Input id={f("isoMode")} name="isoMode" defaultValue={entry.isoMode ?? ""} />
            </Field>
          ) : null}
          <div className="flex gap-2">
            <Button type="submit" size="sm" disabled={busy}>
              {busy ? "Saving…" : "Save"}
            </Button>
            <Button
              size="sm"
              variant="ghost"
              onClick={() => {
                setEditing(false);
                setErrors({});
              }}
            >
              Cancel
            </Button>
          </div>
        </form>
      ) : null}
      {note ? <StatusNote note={note} className="mt-2" /> : null}
    </li>
  );
}
