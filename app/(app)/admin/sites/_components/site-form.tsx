"use client";
import { useRouter } from "next/navigation";
import { useId, useState } from "react";
import { sendJson } from "@/lib/client/api";
import { StatusNote, type Note } from "@/components/admin/status-note";
import { Button } from "@/components/ui/button";
import { Field, Input, Select } from "@/components/ui/field";
import type { PolicyUnit } from "@/lib/admin/policy-units";
import { DEFAULT_END_PLAY_POLICY } from "@/lib/field/end-play-policy";
import { DEFAULT_PLAUSIBLE_MAX_IN } from "@/lib/field/plausibility";
import { policyOrderProblems, SITE_KIND_LABELS, SITE_KINDS, siteCreateSchema, sitePatchSchema } from "@/lib/validation/site";
import { PolicyFields, policyTexts, readPolicy } from "./policy-fields";
import type { SiteView } from "./types";
import { ErrorSummary } from "@/components/ui/error-summary";

/** Blank clears the cost; anything else is read as dollars (a wrong text fails the schema with its message). */
function readCost(text: string): number | null {
  const t = text.replace(/[$,\s]/g, "");
  return t === "" ? null : Number(t);
}

const DEFAULTS = {
  endPlayMaxIn: DEFAULT_END_PLAY_POLICY.maxIn,
  dialSpreadIn: DEFAULT_END_PLAY_POLICY.dialSpreadIn,
  tapeSpreadIn: DEFAULT_END_PLAY_POLICY.tapeSpreadIn,
  plausibleMaxIn: DEFAULT_PLAUSIBLE_MAX_IN,
};

/** Adds a site (no `site`) or edits one; the limits can be typed in either unit. */
export function SiteForm({ site, onDone }: { site?: SiteView; onDone: (message?: string) => void }) {
  const router = useRouter();
  const id = useId();
  const [unit, setUnit] = useState<PolicyUnit>("in");
  const [texts, setTexts] = useState(() => policyTexts(site ?? DEFAULTS, "in"));
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [note, setNote] = useState<Note>(null);
  const [busy, setBusy] = useState(false);

  function switchUnit(next: PolicyUnit) {
    const { values } = readPolicy(texts, unit);
    setTexts({ ...texts, ...policyTexts({ ...DEFAULTS, ...(site ?? {}), ...values }, next) });
    setUnit(next);
  }

  async function onSubmit(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const data = new FormData(e.currentTarget);
    const policy = readPolicy(texts, unit);
    const input = {
      code: String(data.get("code") ?? ""),
      name: String(data.get("name") ?? ""),
      kind: String(data.get("kind") ?? ""),
      railway: String(data.get("railway") ?? ""),
      location: String(data.get("location") ?? ""),
      active: site ? data.get("active") === "on" : true,
      ...policy.values,
      removalCostUsd: readCost(String(data.get("removalCostUsd") ?? "")),
    };
    const checked = (site ? sitePatchSchema : siteCreateSchema).safeParse(input);
    const local: Record<string, string> = { ...policy.errors };
    if (!checked.success) for (const issue of checked.error.issues) local[String(issue.path[0])] ??= issue.message;
    const endPlayMaxIn = policy.values.endPlayMaxIn ?? site?.endPlayMaxIn ?? DEFAULTS.endPlayMaxIn;
    const plausibleMaxIn = policy.values.plausibleMaxIn ?? site?.plausibleMaxIn ?? DEFAULTS.plausibleMaxIn;
    if (!local.endPlayMaxIn && !local.plausibleMaxIn) Object.assign(local, policyOrderProblems({ endPlayMaxIn, plausibleMaxIn }));
    if (Object.keys(local).length) {
      setErrors(local);
      setNote({ tone: "danger", text: "Check the marked fields." });
      return;
    }
    setBusy(true);
    setErrors({});
    const res = site ? await sendJson("PATCH", `/api/admin/sites/${site.id}`, input) : await sendJson("POST", "/api/admin/sites", input);
    setBusy(false);
    if (!res.ok) {
      setErrors(res.fields);
      setNote({ tone: "danger", text: res.message });
      return;
    }
    router.refresh();
    onDone(site ? "Saved. Removals at this site are judged against these limits from now on." : "Site added.");
  }

  const f = (name: string) => `${id}-${name}`;
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-5" aria-label={site ? `Edit ${site.code}` : "Add a site"}>
      <ErrorSummary errors={errors} idPrefix={`${id}-`} />
      <div className="grid gap-4 sm:grid-cols-[8rem_1fr]">
        <Field label="Code" htmlFor={f("code")} error={errors.code}>
          <Input
            id={f("code")}
            name="code"
            defaultValue={site?.code}
            aria-invalid={!!errors.code}
            className="uppercase"
            placeholder="e.g. RSC"
          />
        </Field>
        <Field label="Name" htmlFor={f("name")} error={errors.name}>
          <Input id={f("name")} name="name" defaultValue={site?.name} aria-invalid={!!errors.name} placeholder="e.g. Riverside car shop" />
        </Field>
      </div>
      <div className="grid gap-4 sm:grid-cols-3">
        <Field label="Kind" htmlFor={f("kind")} error={errors.kind}>
          <Select id={f("kind")} name="kind" defaultValue={site?.kind ?? "car-shop"}>
            {SITE_KINDS.map((k) => (
              <option key={k} value={k}>
                {SITE_KIND_LABELS[k]}
              </option>
            ))}
          </Select>
        </Field>
        <Field label="Railway" htmlFor={f("railway")} error={errors.railway}>
          <Input id={f("railway")} name="railway" defaultValue={site?.railway} aria-invalid={!!errors.railway} placeholder="Who runs it" />
        </Field>
        <Field label="Location" htmlFor={f("location")} error={errors.location}>
          <Input
            id={f("location")}
            name="location"
            defaultValue={site?.location}
            aria-invalid={!!errors.location}
            placeholder="Town or yard"
          />
        </Field>
      </div>
      <Field
        label="Cost of one removal (USD) — optional"
        htmlFor={f("cost")}
        error={errors.removalCostUsd}
        hint="Wheelset change, car out of service and lab time. Tallies use it to price removals that teardown did not confirm."
      >
        <div className="relative w-44">
          <span className="pointer-events-none absolute inset-y-0 left-3 flex items-center text-sm text-muted">$</span>
          <Input
            id={f("cost")}
            name="removalCostUsd"
            inputMode="decimal"
            defaultValue={site?.removalCostUsd ?? ""}
            aria-invalid={!!errors.removalCostUsd}
            className="pl-7 tabular"
            placeholder="not set"
          />
        </div>
      </Field>
      <div className="rounded-lg border border-line bg-surface-2 p-4">
        <PolicyFields texts={texts} unit={unit} errors={errors} onChange={setTexts} onUnit={switchUnit} />
      </div>
      {site ? (
        <label className="flex items-start gap-3 text-sm">
          <input type="checkbox" name="active" defaultChecked={site.active} className="mt-0.5 h-5 w-5 accent-[var(--accent)]" />
          <span>
            <span className="font-medium text-ink">Active</span>
            <span className="block text-muted">Inactive sites keep their cases but are no longer offered in forms.</span>
          </span>
        </label>
      ) : null}
      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" disabled={busy}>
          {busy ? "Saving…" : site ? "Save changes" : "Add site"}
        </Button>
        <Button variant="ghost" onClick={() => onDone()}>
          Cancel
        </Button>
        <StatusNote note={note} />
      </div>
    </form>
  );
}
