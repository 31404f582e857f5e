"use client";
import { useRouter } from "next/navigation";
import { useId, useState } from "react";
import { sendJson } from "@/lib/client/api";
import { StatusNote, type Note } from "@/components/admin/status-note";
import { Button } from "@/components/ui/button";
import { Field, Input, Select, Textarea } from "@/components/ui/field";
import type { CodeListName } from "@/lib/validation/code-entry";
import { DAMAGE_FAMILIES } from "@/lib/classification/damage-families";
import { CODE_LIST_LABELS, codeCreateSchema, parseSynonyms } from "@/lib/validation/code-entry";
import { ErrorSummary } from "@/components/ui/error-summary";

/** Adds a code to one list. Damage codes are built from a family and a short name. */
export function AddCodeForm({ list, onDone }: { list: CodeListName; onDone: () => void }) {
  const router = useRouter();
  const id = useId();
  const [family, setFamily] = useState<string>(DAMAGE_FAMILIES[0].code);
  const [name, setName] = useState("");
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [note, setNote] = useState<Note>(null);
  const [busy, setBusy] = useState(false);
  const damage = list === "damage";
  const code = damage ? `${family}.${name.trim().toLowerCase()}` : name.trim().toLowerCase();

  async function onSubmit(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const data = new FormData(e.currentTarget);
    const input = {
      list,
      code,
      label: String(data.get("label") ?? ""),
      description: String(data.get("description") ?? ""),
      synonyms: parseSynonyms(String(data.get("synonyms") ?? "")),
      ...(damage && String(data.get("isoMode") ?? "").trim() ? { isoMode: String(data.get("isoMode")) } : {}),
    };
    const local = codeCreateSchema.safeParse(input);
    if (!local.success) {
      const next: Record<string, string> = {};
      for (const issue of local.error.issues) next[String(issue.path[0])] ??= issue.message;
      setErrors(next);
      setNote({ tone: "danger", text: "Check the marked fields." });
      return;
    }
    setBusy(true);
    setErrors({});
    setNote(null);
    const res = await sendJson("POST", "/api/admin/codes", input);
    setBusy(false);
    if (!res.ok) {
      setErrors(res.fields);
      setNote({ tone: "danger", text: res.message });
      return;
    }
    router.refresh();
    onDone();
  }

  const f = (n: string) => `${id}-${n}`;
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4" aria-label={`Add a ${CODE_LIST_LABELS[list].one}`}>
      <ErrorSummary errors={errors} idPrefix={`${id}-`} />
      <div className={`grid gap-4 ${damage ? "sm:grid-cols-[12rem_1fr]" : ""}`}>
        {damage ? (
          <Field label="Family" htmlFor={f("family")}>
            <Select id={f("family")} value={family} onChange={(e) => setFamily(e.target.value)}>
              {DAMAGE_FAMILIES.map((fam) => (
                <option key={fam.code} value={fam.code}>
                  {fam.label}
                </option>
              ))}
            </Select>
          </Field>
        ) : null}
        <Field
          label={damage ? "Code name" : "Code"}
          htmlFor={f("code")}
          error={errors.code}
          hint={
            <>
              Stored as <code className="font-mono text-ink-2">{code || "…"}</code>; lowercase words joined by hyphens. A code never changes
              once added.
            </>
          }
        >
          <Input
            id={f("code")}
            value={name}
            onChange={(e) => setName(e.target.value)}
            aria-invalid={!!errors.code}
            className="font-mono"
            placeholder={damage ? "micro-pitting" : "axle-current"}
            autoComplete="off"
          />
        </Field>
      </div>
      <Field label="Label" htmlFor={f("label")} error={errors.label}>
        <Input id={f("label")} name="label" aria-invalid={!!errors.label} placeholder="What people call it" />
      </Field>
      <Field label={damage ? "What it looks like" : "What it means"} htmlFor={f("description")} error={errors.description}>
        <Textarea id={f("description")} name="description" rows={2} className="min-h-16" aria-invalid={!!errors.description} />
      </Field>
      <Field
        label="Shop words"
        htmlFor={f("synonyms")}
        error={errors.synonyms}
        hint="Other words people use for it, separated by commas. Search finds the code by these."
      >
        <Input id={f("synonyms")} name="synonyms" placeholder="e.g. frosting, grey patches" />
      </Field>
      {damage ? (
        <Field
          label="ISO 15243 mode (optional)"
          htmlFor={f("isoMode")}
          error={errors.isoMode}
          hint="Only where the code is one of the standard's failure modes."
        >
          <Input id={f("isoMode")} name="isoMode" />
        </Field>
      ) : null}
      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" disabled={busy}>
          {busy ? "Adding…" : `Add ${CODE_LIST_LABELS[list].one}`}
        </Button>
        <Button variant="ghost" onClick={onDone}>
          Cancel
        </Button>
        <StatusNote note={note} />
      </div>
    </form>
  );
}
