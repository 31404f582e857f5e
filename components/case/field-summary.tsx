// The field report as read back: facts, the hand-roll grid, the end-play arithmetic and the call.
import { formatDay } from "@/lib/cases/list-columns";
import {
  AXLE_POSITIONS,
  ROLL_DIRECTIONS,
  formatInches,
  formatMm,
  wheelRevolutions,
  type EndPlayPolicy,
  type HandRollGrid,
} from "@/lib/field";
import { evaluateFieldChecks } from "@/lib/cases/compute";
import { fieldChecksSchema } from "@/lib/cases/schemas";
import type { CaseDetail } from "@/lib/cases/types";
import { FieldMessages } from "@/components/removal/field-messages";
import { FieldCallPanel } from "@/components/removal/field-call-panel";
import { TRIGGERS } from "@/lib/classification/triggers";
import { Facts } from "./facts";
import { triggerLabel } from "@/lib/classification/labels";

const feelTone: Record<string, string> = {
  smooth: "bg-ok-soft text-ok",
  stiff: "bg-warn-soft text-warn",
  rough: "bg-danger-soft text-danger",
  catch: "bg-danger-soft text-danger",
};

export function FieldSummary({ c, policy }: { c: CaseDetail; policy: EndPlayPolicy }) {
  const checks = fieldChecksSchema.safeParse(c.fieldChecks);
  const ev = checks.success ? evaluateFieldChecks(checks.data, policy) : null;
  const grid = (checks.success ? checks.data.handRoll?.grid : undefined) as HandRollGrid | undefined;
  const trigger = TRIGGERS.find((t) => t.code === c.trigger);
  const detail = Object.entries(c.triggerDetail ?? {}).filter(([, v]) => v !== null && v !== "");
  const revs = c.serviceMiles && c.wheelDiameterIn ? wheelRevolutions(c.serviceMiles, c.wheelDiameterIn) : null;
  return (
    <div className="flex flex-col gap-6">
      <Facts
        items={[
          ["Car", `${c.carMark} ${c.carNumber}`.trim()],
          ["Position", c.axle && c.side ? `Axle ${c.axle}, ${c.side === "L" ? "left" : "right"} (${c.axle}${c.side})` : null],
          ["Removed", formatDay(c.removedOn)],
          ["Site", c.siteName],
          ["Trigger", triggerLabel(c.trigger)],
          ...detail.map(
            ([k, v]) =>
              [
                trigger?.fields.find((f) => f.key === k)?.label ?? k,
                `${v}${trigger?.fields.find((f) => f.key === k)?.unit ? ` ${trigger?.fields.find((f) => f.key === k)?.unit}` : ""}`,
              ] as [string, string],
          ),
          ["Serial", c.serial],
          ["Class", c.bearingClass === "other" ? c.bearingClassOther : c.bearingClass],
          ["Maker", c.makerCode],
          ["Made", c.manufacturedYm],
          ["Lot", c.lot],
          ["Reconditioned", c.timesReconditioned === null ? null : `${c.timesReconditioned}×`],
          ["Mounted", c.mountedOn],
          [
            "Service",
            c.serviceMonths !== null
              ? `${c.serviceMonths.toFixed(1)} months${c.serviceMiles ? `, ${c.serviceMiles.toLocaleString("en-US")} mi` : ""}`
              : c.serviceMiles
                ? `${c.serviceMiles.toLocaleString("en-US")} mi`
                : null,
          ],
          ["Wheel", c.wheelDiameterIn ? `${c.wheelDiameterIn} in` : null],
          ["Wheel revolutions", revs ? `${(revs / 1e6).toFixed(1)} million` : null],
        ]}
      />
      {grid ? (
        <div>
          <h3 className="mb-2 text-sm font-semibold">Hand roll</h3>
          <div className="grid max-w-md grid-cols-[auto_1fr_1fr] gap-1.5 text-xs">
            <span />
            <span className="text-muted">Cup pulled</span>
            <span className="text-muted">Cup pushed</span>
            {AXLE_POSITIONS.map((p) => (
              <div key={p} className="contents">
                <span className="pr-2 font-medium tabular">{p}°</span>
                {ROLL_DIRECTIONS.map((d) => {
                  const cell = grid[p]?.[d];
                  return (
                    <span
                      key={d}
                      className={`rounded px-2 py-1 font-medium ${cell?.feel ? feelTone[cell.feel] : "bg-surface-2 text-muted"}`}
                    >
                      {cell?.feel ?? "not done"}
                      {cell?.revolutions !== undefined ? ` · ${cell.revolutions} rev` : ""}
                    </span>
                  );
                })}
              </div>
            ))}
          </div>
          {ev?.handRoll ? (
            <div className="mt-2">
              <FieldMessages messages={ev.handRoll.messages.filter((m) => m.level !== "info")} />
            </div>
          ) : null}
        </div>
      ) : null}
      {ev?.endPlay && ev.endPlay.call !== "incomplete" ? (
        <div>
          <h3 className="mb-2 text-sm font-semibold">
            Mounted end play ({checks.success && checks.data.endPlay?.method === "tape" ? "metal tape" : "dial indicator"})
          </h3>
          <table className="text-sm tabular">
            <tbody>
              {ev.endPlay.trials.map((t) => (
                <tr key={t.trial}>
                  <td className="pr-4 text-muted">Trial {t.trial}</td>
                  <td className="pr-4">{formatInches(t.in)}</td>
                  <td className="text-muted">{formatMm(t.mm)}</td>
                </tr>
              ))}
              <tr className="border-t border-line font-semibold">
                <td className="pr-4">Mean</td>
                <td className="pr-4">{formatInches(ev.endPlay.meanIn)}</td>
                <td>{formatMm(ev.endPlay.meanMm)}</td>
              </tr>
              <tr>
                <td className="pr-4 text-muted">Spread</td>
                <td className="pr-4">{formatInches(ev.endPlay.spreadIn)}</td>
                <td className="text-muted">{formatMm(ev.endPlay.spreadMm)}</td>
              </tr>
              <tr>
                <td className="pr-4 text-muted">Limit</td>
                <td className="pr-4">{formatInches(policy.maxIn)}</td>
                <td className="text-muted">{formatMm(policy.maxIn * 25.4)}</td>
              </tr>
            </tbody>
          </table>
        </div>
      ) : null}
      {ev ? <FieldCallPanel call={ev.call} sticky={false} /> : null}
      {c.fieldNotes ? <p className="whitespace-pre-wrap rounded-lg bg-surface-2 p-3 text-sm">{c.fieldNotes}</p> : null}
    </div>
  );
}
