// The printable case report: the same model and order as the PDF, laid out for screen and paper.
/* eslint-disable @next/next/no-img-element -- photo bytes come from our session-checked route */
import type { CaseReport, ComponentSection, ReportPhoto } from "@/lib/report/types";
import { ReportDamageMap } from "./report-damage-map";
import { Callout, Facts, Notes, ReportSection, Sub, Table } from "./report-parts";
import "./report-print.css";
import { SAFETY_FLAG_DEFERRAL, SAFETY_FLAG_TITLE } from "@/lib/cases/safety-flag";

function Photos({ photos }: { photos: ReportPhoto[] }) {
  if (!photos.length) return null;
  return (
    <div className="mt-3 grid grid-cols-2 gap-3 sm:grid-cols-4">
      {photos.map((p) => (
        <figure key={p.id} className="tl-keep">
          <img
            src={`/api/photos/${p.id}/thumb`}
            alt={p.caption}
            loading="eager"
            className="aspect-[4/3] w-full rounded border border-line-strong bg-surface-2 object-contain"
          />
          <figcaption className="mt-1 text-[11px] leading-snug">
            <span className="font-semibold text-ink">Photo {p.number}</span> <span className="text-muted">{p.caption}</span>
          </figcaption>
        </figure>
      ))}
    </div>
  );
}

function Part({ c }: { c: ComponentSection }) {
  return (
    <div className="mt-5 first:mt-0">
      <Sub>
        {c.label}
        {c.disposition ? <span className="font-normal text-muted"> · disposition: {c.disposition}</span> : null}
      </Sub>
      {c.findings.length ? (
        <Table
          head={["Damage", "Severity", "Where", "Size", "Notes"]}
          rows={c.findings.map((f) => [
            <span key="d">
              {f.damage}
              {f.isoMode ? <span className="block text-[11px] text-muted">ISO 15243: {f.isoMode}</span> : null}
            </span>,
            f.severityLabel,
            f.where,
            <span key="s" className="whitespace-nowrap">
              {f.size}
            </span>,
            <span key="n">
              {f.notes || (f.photoNumbers.length ? "" : "—")}
              {f.photoNumbers.length ? <span className="block text-[11px] text-muted">Photo {f.photoNumbers.join(", ")}</span> : null}
            </span>,
          ])}
        />
      ) : (
        <p className="text-[12.5px] text-muted">No damage recorded on this part.</p>
      )}
      <Photos photos={c.photos} />
    </div>
  );
}

export function ReportDocument({ r }: { r: CaseReport }) {
  const signed = r.revision.kind === "signed";
  const f = r.field;
  let n = 0;
  const next = () => ++n;
  return (
    <article
      className="tl-report relative mx-auto max-w-[8.5in] overflow-x-clip rounded-lg bg-surface text-ink shadow-[0_1px_3px_rgba(15,23,42,.12),0_8px_30px_rgba(15,23,42,.08)]"
      data-revision={r.revision.kind}
    >
      <header className="tl-band rounded-t-lg bg-[#0f172a] px-6 pb-5 pt-6 text-white sm:px-10">
        <div className="flex flex-wrap items-start justify-between gap-4">
          <div>
            <p className="text-[10.5px] font-bold uppercase tracking-[0.25em] text-amber-400">Tearline case report</p>
            <h1 className="mt-1 text-3xl font-bold tracking-tight tabular">{r.number}</h1>
            <p className="mt-1 text-[11px] text-slate-300">Generated {r.generatedAt}</p>
          </div>
          <div className="sm:text-right">
            <span
              className={`inline-block rounded-full px-3 py-1 text-[10.5px] font-bold uppercase tracking-[0.15em] ${signed ? "bg-emerald-700 text-white" : "bg-amber-400 text-slate-900"}`}
            >
              {signed ? "Signed revision" : "Draft"}
            </span>
            <p className="mt-2 text-[11px] leading-snug text-slate-200">
              {r.revision.kind === "signed" ? (
                <>
                  Signed by {r.revision.signedBy}
                  <br />
                  {r.revision.signedAt}
                </>
              ) : (
                <>Not signed · {r.revision.stage}</>
              )}
            </p>
          </div>
        </div>
      </header>
      <div className="h-[3px] bg-amber-400" />
      {!signed ? (
        <div className="tl-watermark" aria-hidden>
          <span>DRAFT — NOT SIGNED</span>
        </div>
      ) : null}

      <div className="relative px-6 py-6 sm:px-10 sm:py-8">
        <Facts rows={r.headline} />
        {r.revision.kind === "signed" ? (
          <Callout tone="ok" title={r.revision.title}>
            This revision is final. Any later change reopens the case and is recorded in its history.
          </Callout>
        ) : (
          <Callout tone="warn" title={`${r.revision.title} · ${r.revision.stage}`}>
            This report shows the case as it stands now; findings and the verdict may still change before an engineer signs it.
          </Callout>
        )}

        <ReportSection n={next()} title="Bearing and removal">
          <Sub>Bearing</Sub>
          <Facts rows={r.bearing} />
          <Sub>Removal</Sub>
          <Facts rows={r.removal} cols={3} />
          <Sub>Trigger: {r.trigger.label}</Sub>
          {r.trigger.details.length ? <Facts rows={r.trigger.details} cols={3} /> : null}
          <div className="mt-2.5">
            <Facts rows={r.service} cols={3} />
          </div>
        </ReportSection>

        <ReportSection n={next()} title="Field checks">
          <Sub>Hand roll</Sub>
          {f.handRoll ? (
            <>
              <Table
                head={["Axle position", "Cup pulled outboard", "Cup pushed inboard"]}
                rows={f.handRoll.grid.map((row) =>
                  row.map((cell) =>
                    /^(Rough|Catch)/.test(cell) ? (
                      <strong key={cell} className="text-danger">
                        {cell}
                      </strong>
                    ) : (
                      cell
                    ),
                  ),
                )}
              />
              <div className="mt-2.5">
                <Facts rows={[...f.handRoll.procedure, ["Result", f.handRoll.result]]} />
              </div>
            </>
          ) : (
            <p className="text-[12.5px] text-muted">No hand roll recorded.</p>
          )}
          <Sub>Mounted end play</Sub>
          {f.endPlay ? (
            <>
              <p className="mb-1.5 text-[11.5px] text-muted">
                {f.endPlay.method}. {f.endPlay.unitNote}.
              </p>
              <Table
                head={["Trial", "Zero", "Reading", "End play (in)", "End play (mm)"]}
                align={["center", "right", "right", "right", "right"]}
                rows={f.endPlay.trials.map((t) =>
                  [t.trial, t.zero, t.reading, t.endPlayIn, t.endPlayMm].map((v, i) => (
                    <span key={i} className="tabular">
                      {v}
                    </span>
                  )),
                )}
              />
              {f.endPlay.arithmetic.length ? (
                <div className="mt-2">
                  <Table
                    head={["Arithmetic", "Value"]}
                    rows={f.endPlay.arithmetic.map(([k, v]) => [
                      k,
                      <span key={k} className="tabular">
                        {v}
                      </span>,
                    ])}
                  />
                </div>
              ) : null}
              <p className={`mt-2 text-[13px] font-semibold ${f.endPlay.removes ? "text-danger" : "text-ink"}`}>
                End-play call: {f.endPlay.call}
              </p>
            </>
          ) : (
            <p className="text-[12.5px] text-muted">End play was not measured.</p>
          )}
          {f.visual.length ? (
            <>
              <Sub>Visual findings</Sub>
              <Table head={["Finding", "Note"]} rows={f.visual} />
            </>
          ) : null}
          <Sub>Before the checks</Sub>
          <Facts rows={f.confirmations} />
          {f.safetyFlag.length ? (
            <Callout tone="warn" title={SAFETY_FLAG_TITLE}>
              {f.safetyFlag.map((t) => `Not confirmed: ${t}`).join(" ")} {SAFETY_FLAG_DEFERRAL}
            </Callout>
          ) : null}
          <Callout
            tone={f.call.call === "remove" ? "danger" : f.call.call === "keep" ? "ok" : "warn"}
            title={`Field call: ${f.call.label}`}
          >
            {f.storedCallDiffers
              ? `The call stored with the case was “${f.storedCallDiffers}”; the checks as recorded now give the call above.`
              : "Recomputed from the readings above."}
          </Callout>
          <Notes items={f.call.reasons} />
          {f.notes ? (
            <p className="mt-3 text-[12.5px]">
              <span className="font-semibold">Shop notes:</span> {f.notes}
            </p>
          ) : null}
        </ReportSection>

        <ReportSection n={next()} title="Teardown">
          <Facts rows={r.teardown.rows} cols={2} />
          {r.teardown.notes ? <p className="mt-3 whitespace-pre-line text-[13px]">{r.teardown.notes}</p> : null}
        </ReportSection>

        <ReportSection n={next()} title="Findings by part">
          {r.components.length ? (
            r.components.map((c) => <Part key={c.code} c={c} />)
          ) : (
            <p className="text-[12.5px] text-muted">No teardown findings yet.</p>
          )}
        </ReportSection>

        <ReportSection n={next()} title="Damage map">
          {r.components.some((c) => c.findings.length > 0) ? (
            <ReportDamageMap arcs={r.damageArcs} offMap={r.offMap} />
          ) : (
            <p className="text-[12.5px] text-muted">
              No teardown findings yet; the map fills in as findings with a clock position are recorded.
            </p>
          )}
        </ReportSection>

        <ReportSection n={next()} title="Verdict">
          <Facts rows={r.verdict.rows} cols={2} />
          {r.verdict.returnReason ? (
            <Callout tone="warn" title="Returned to the bench">
              {r.verdict.returnReason}
            </Callout>
          ) : null}
          {r.verdict.correctiveAction ? (
            <>
              <Sub>Corrective action</Sub>
              <p className="whitespace-pre-line text-[13px]">{r.verdict.correctiveAction}</p>
            </>
          ) : null}
          {r.verdict.notes ? (
            <>
              <Sub>Notes</Sub>
              <p className="whitespace-pre-line text-[13px]">{r.verdict.notes}</p>
            </>
          ) : null}
        </ReportSection>

        <ReportSection n={next()} title="Related cases">
          {r.related.length ? (
            <Table
              head={["Case", "Stage", "Root cause", "Removed", "Link note"]}
              rows={r.related.map((x) => [
                <a key={x.number} href={`/cases/${x.number}`} className="font-medium text-accent tabular">
                  {x.number}
                </a>,
                x.status,
                x.cause,
                x.removedOn,
                x.note || "—",
              ])}
            />
          ) : (
            <p className="text-[12.5px] text-muted">No related cases are linked.</p>
          )}
        </ReportSection>

        <ReportSection n={next()} title="Photo register">
          {r.photos.length ? (
            <>
              <p className="mb-2 text-[11.5px] text-muted">
                Originals are kept byte for byte; the SHA-256 of each lets anyone check a copy. The evidence ZIP holds the files and the
                same list.
              </p>
              <Table
                head={["No.", "Part", "Caption / file", "SHA-256"]}
                align={["center"]}
                rows={r.photos.map((p) => [
                  p.number,
                  p.component,
                  <span key="c">
                    {p.caption}
                    {p.fileName && p.fileName !== p.caption ? <span className="block text-[11px] text-muted">{p.fileName}</span> : null}
                  </span>,
                  <code key="h" className="break-all font-mono text-[10.5px]">
                    {p.sha256}
                  </code>,
                ])}
              />
            </>
          ) : (
            <p className="text-[12.5px] text-muted">No photos in this case.</p>
          )}
        </ReportSection>

        <p className="mt-8 border-t border-line pt-2 text-[11px] text-muted">
          {r.number} · {signed ? r.revision.title : "Draft — not signed"} · end of report
        </p>
      </div>
    </article>
  );
}
