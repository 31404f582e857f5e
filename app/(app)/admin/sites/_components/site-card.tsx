"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { quietDangerClass } from "@/components/admin/quiet-danger";
import { sendJson } from "@/lib/client/api";
import { StatusNote, type Note } from "@/components/admin/status-note";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { formatIn, formatMmFromIn, tapeFraction } from "@/lib/admin/policy-units";
import { DEFAULT_END_PLAY_POLICY } from "@/lib/field/end-play-policy";
import { SITE_KIND_LABELS } from "@/lib/validation/site";
import { SiteForm } from "./site-form";
import type { SiteView } from "./types";

function Limit({ label, inches, testId }: { label: string; inches: number; testId: string }) {
  return (
    <div className="min-w-0">
      <dt className="text-xs text-muted">{label}</dt>
      <dd className="mt-0.5 tabular" data-testid={testId}>
        <span className="font-semibold text-ink">{formatIn(inches)} in</span>
        {tapeFraction(inches) ? <span className="ml-1 text-xs text-ink-2">({tapeFraction(inches)})</span> : null}
        <span className="block text-xs text-muted sm:inline sm:before:content-['_·_']">{formatMmFromIn(inches)} mm</span>
      </dd>
    </div>
  );
}

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

export function SiteCard({ site }: { site: SiteView }) {
  const router = useRouter();
  const [editing, setEditing] = useState(false);
  const [note, setNote] = useState<Note>(null);
  const [busy, setBusy] = useState(false);
  const inUse = site.usage.cases > 0 || site.usage.users > 0;
  const ownLimit = Math.abs(site.endPlayMaxIn - DEFAULT_END_PLAY_POLICY.maxIn) > 1e-9;

  async function remove() {
    setBusy(true);
    const res = await sendJson("DELETE", `/api/admin/sites/${site.id}`);
    setBusy(false);
    if (!res.ok) setNote({ tone: "danger", text: res.message });
    else router.refresh();
  }

  return (
    <li
      className={`rounded-xl border bg-surface ${site.active ? "border-line" : "border-dashed border-line-strong"}`}
      data-testid={`site-${site.code}`}
    >
      <div className="flex flex-col gap-4 p-4 sm:p-5">
        <div className="flex items-start justify-between gap-3">
          <div className="min-w-0">
            <p className="flex flex-wrap items-center gap-2">
              <span className="rounded-md bg-ink px-2 py-0.5 font-mono text-xs font-semibold tracking-wider text-surface">{site.code}</span>
              <span className="font-semibold text-ink">{site.name}</span>
              {!site.active ? <Badge>Inactive</Badge> : null}
            </p>
            <p className="mt-1 text-sm text-muted">
              {SITE_KIND_LABELS[site.kind]} · {site.railway}
              {site.location ? ` · ${site.location}` : ""}
            </p>
          </div>
          {!editing ? (
            <Button
              size="sm"
              variant="secondary"
              onClick={() => {
                setEditing(true);
                setNote(null);
              }}
            >
              Edit
            </Button>
          ) : null}
        </div>
        {editing ? (
          <SiteForm
            site={site}
            onDone={(message) => {
              setEditing(false);
              if (message) setNote({ tone: "ok", text: message });
            }}
          />
        ) : (
          <>
            <dl className="grid grid-cols-2 gap-3 rounded-lg bg-surface-2 px-3 py-3 text-sm sm:grid-cols-4">
              <Limit label="Removes above" inches={site.endPlayMaxIn} testId={`limit-${site.code}`} />
              <Limit label="Dial trials within" inches={site.dialSpreadIn} testId={`dial-${site.code}`} />
              <Limit label="Tape trials within" inches={site.tapeSpreadIn} testId={`tape-${site.code}`} />
              <Limit label="Believable up to" inches={site.plausibleMaxIn} testId={`plausible-${site.code}`} />
            </dl>
            <div className="flex flex-wrap items-center justify-between gap-2 text-xs text-muted">
              <span>
                {ownLimit ? <Badge tone="warn">Own limit</Badge> : <span>Common limit</span>} · {plural(site.usage.cases, "case", "cases")}{" "}
                · {plural(site.usage.users, "person", "people")} ·{" "}
                <span data-testid={`cost-${site.code}`}>
                  {site.removalCostUsd === null ? "no cost per removal set" : `$${site.removalCostUsd.toLocaleString("en-US")} per removal`}
                </span>
              </span>
              {inUse ? (
                <span>In use: can be made inactive, not deleted.</span>
              ) : (
                <button type="button" className={quietDangerClass} disabled={busy} onClick={remove}>
                  Delete site
                </button>
              )}
            </div>
          </>
        )}
        {note ? <StatusNote note={note} /> : null}
      </div>
    </li>
  );
}
