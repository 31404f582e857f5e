"use client";
// Column definitions for @tanstack/react-table: ids match the server's sort keys.
import Link from "next/link";
import { createColumnHelper, type ColumnDef } from "@tanstack/react-table";
import { Badge, StageBadge } from "@/components/ui/badge";
import {
  columnInfo,
  fieldCallLabel,
  formatAgo,
  formatCar,
  formatClass,
  formatDay,
  formatEndPlay,
  formatMonths,
  formatPosition,
  type CaseColumnId,
  type CaseListRow,
} from "@/lib/cases/list-columns";
import { CallBadge, OutcomeBadge } from "./value-badges";

const h = createColumnHelper<CaseListRow>();
const none = <span className="text-muted">—</span>;
const or = (text: string) => (text ? text : none);

/** Right-aligned numeric columns. */
export const NUMERIC: ReadonlySet<string> = new Set<CaseColumnId>(["endPlay", "serviceMonths"]);

export function caseColumns(now: number): ColumnDef<CaseListRow, string>[] {
  const col = (id: CaseColumnId, value: (r: CaseListRow) => string, cell: (r: CaseListRow) => React.ReactNode) =>
    h.accessor(value, { id, header: columnInfo(id).label, enableHiding: columnInfo(id).hideable, cell: (c) => cell(c.row.original) });
  return [
    col(
      "number",
      (r) => r.number,
      (r) => (
        <Link href={`/cases/${r.number}`} className="font-semibold text-ink tabular underline-offset-2 hover:text-accent hover:underline">
          {r.number}
        </Link>
      ),
    ),
    col(
      "status",
      (r) => r.status,
      (r) => <StageBadge stage={r.status} />,
    ),
    col("car", formatCar, (r) =>
      r.carMark || r.carNumber ? (
        <span className="whitespace-nowrap">
          <span className="font-medium">{r.carMark}</span> <span className="tabular">{r.carNumber}</span>
        </span>
      ) : (
        none
      ),
    ),
    col(
      "position",
      (r) => formatPosition(r.axle, r.side),
      (r) => or(formatPosition(r.axle, r.side)),
    ),
    col(
      "serial",
      (r) => r.serial,
      (r) => (r.serial ? <span className="font-mono text-[13px] text-ink-2">{r.serial}</span> : none),
    ),
    col("class", formatClass, (r) => (formatClass(r) ? <Badge>{formatClass(r)}</Badge> : none)),
    col(
      "trigger",
      (r) => r.triggerLabel,
      (r) => (
        <span className="block max-w-[11rem] truncate" title={r.triggerLabel}>
          {r.triggerLabel}
        </span>
      ),
    ),
    col(
      "fieldCall",
      (r) => fieldCallLabel(r.fieldCall),
      (r) => <CallBadge call={r.fieldCall} />,
    ),
    col(
      "endPlay",
      (r) => formatEndPlay(r.endPlayMeanIn),
      (r) => <span className="tabular">{or(formatEndPlay(r.endPlayMeanIn))}</span>,
    ),
    col(
      "removedOn",
      (r) => r.removedOn ?? "",
      (r) => <span className="whitespace-nowrap tabular">{or(formatDay(r.removedOn))}</span>,
    ),
    col(
      "site",
      (r) => r.siteName ?? "",
      (r) =>
        r.siteCode ? (
          <span
            title={r.siteName ?? undefined}
            className="rounded bg-surface-2 px-1.5 py-0.5 font-mono text-[12px] font-medium text-ink-2 ring-1 ring-inset ring-line"
          >
            {r.siteCode}
          </span>
        ) : (
          none
        ),
    ),
    col(
      "cause",
      (r) => r.causeLabel ?? "",
      (r) =>
        r.causeLabel ? (
          <span className="block max-w-[10rem] truncate" title={r.causeLabel}>
            {r.causeLabel}
          </span>
        ) : (
          <span className="text-muted">No verdict yet</span>
        ),
    ),
    col(
      "outcome",
      (r) => r.removalConfirmed ?? "",
      (r) => <OutcomeBadge outcome={r.removalConfirmed} />,
    ),
    col(
      "serviceMonths",
      (r) => formatMonths(r.serviceMonths),
      (r) => <span className="tabular">{or(formatMonths(r.serviceMonths))}</span>,
    ),
    col(
      "updatedAt",
      (r) => r.updatedAt,
      (r) => (
        <time dateTime={r.updatedAt} title={new Date(r.updatedAt).toLocaleString()} className="whitespace-nowrap text-ink-2 tabular">
          {formatAgo(r.updatedAt, now)}
        </time>
      ),
    ),
  ];
}
