"use client";
// Upload the list of bearings still in service; they enter every life analysis as suspensions.
import { useRouter } from "next/navigation";
import { useRef, useState } from "react";
import { Button } from "@/components/ui/button";
import { callApi } from "@/lib/client/api";
import { downloadBlob } from "@/components/charts/export-image";
import { FLEET_COLUMNS, FLEET_TEMPLATE } from "@/lib/tallies/fleet-columns";
import type { FleetBatch } from "@/lib/tallies/life-data";
import { formatDay } from "@/lib/dates";

type RowError = { row: number; column: string | null; message: string };
type Outcome = { tone: "ok" | "danger"; text: string; rows?: RowError[]; more?: number } | null;

export function FleetUpload({ batch }: { batch: FleetBatch | null }) {
  const router = useRouter();
  const input = useRef<HTMLInputElement>(null);
  const [file, setFile] = useState<File | null>(null);
  const [busy, setBusy] = useState(false);
  const [outcome, setOutcome] = useState<Outcome>(null);

  async function upload() {
    if (!file) return;
    setBusy(true);
    setOutcome(null);
    const form = new FormData();
    form.set("file", file);
    const res = await callApi<{ units?: number }>("POST", "/api/fleet", { form, fallback: "The upload was refused; nothing was stored." });
    setBusy(false);
    if (!res.ok) {
      const { rows, errorCount } = res.body as { rows?: RowError[]; errorCount?: number };
      const text = res.status === 0 ? `${res.message} Nothing was stored.` : res.message;
      setOutcome({ tone: "danger", text, rows, more: errorCount && rows ? errorCount - rows.length : 0 });
      return;
    }
    setOutcome({
      tone: "ok",
      text: `${(res.data?.units ?? 0).toLocaleString("en-US")} units in service stored. Life analyses now use this list.`,
    });
    setFile(null);
    if (input.current) input.current.value = "";
    router.refresh();
  }

  return (
    <div className="space-y-3" data-fleet-upload>
      <p className="text-sm text-ink-2">
        {batch ? (
          <>
            In use: <span className="font-medium text-ink">{batch.units.toLocaleString("en-US")} units</span>, uploaded{" "}
            {formatDay(batch.uploadedAt)}
            {batch.uploadedBy ? ` by ${batch.uploadedBy}` : ""}.
          </>
        ) : (
          "No fleet list yet: analyses count only removed bearings."
        )}
      </p>
      <p className="text-xs text-muted">
        CSV with a header row: {FLEET_COLUMNS.join(", ")}. Dates as YYYY-MM-DD; months are worked out from mounted_on and as_of when left
        empty. A new upload replaces the list in use; a file with any bad row stores nothing.
      </p>
      <div className="flex flex-wrap items-center gap-2">
        <label className="inline-flex h-11 cursor-pointer lg:h-10 items-center rounded-lg border border-dashed border-line-strong bg-surface-2 px-3 text-sm text-ink-2 hover:border-accent">
          <input
            ref={input}
            type="file"
            accept=".csv,text/csv"
            className="sr-only"
            aria-label="Fleet list CSV"
            onChange={(e) => setFile(e.target.files?.[0] ?? null)}
          />
          {file ? file.name : "Choose a CSV file…"}
        </label>
        <Button onClick={upload} disabled={!file || busy}>
          {busy ? "Checking…" : "Upload fleet list"}
        </Button>
        <button
          type="button"
          className="h-11 px-2 text-sm lg:h-10 text-accent hover:underline"
          onClick={() => downloadBlob(new Blob([FLEET_TEMPLATE], { type: "text/csv" }), "tearline-fleet-template.csv")}
        >
          Template
        </button>
      </div>
      {outcome ? (
        <div
          role={outcome.tone === "danger" ? "alert" : "status"}
          className={`rounded-lg px-3 py-2 text-sm ${outcome.tone === "ok" ? "bg-ok-soft text-ok" : "bg-danger-soft text-danger"}`}
        >
          <p className="font-medium">{outcome.text}</p>
          {outcome.rows?.length ? (
            <ul className="mt-1.5 max-h-48 list-disc space-y-0.5 overflow-y-auto pl-5 text-ink">
              {outcome.rows.map((r, i) => (
                <li key={i}>
                  Row {r.row}
                  {r.column ? `, ${r.column}` : ""}: {r.message}
                </li>
              ))}
              {outcome.more ? <li className="text-muted">and {outcome.more} more</li> : null}
            </ul>
          ) : null}
        </div>
      ) : null}
    </div>
  );
}
