// Small building blocks of the printable report: numbered sections, fact grids, tables and notes.
import type { ReactNode } from "react";
import type { Note, Row } from "@/lib/report/types";

export function ReportSection({ n, title, children }: { n: number; title: string; children: ReactNode }) {
  return (
    <section className="mt-8 first:mt-0">
      <h2 className="tl-heading flex items-center gap-2.5 border-b border-line-strong pb-1.5 text-[15px] font-semibold text-ink">
        <span aria-hidden className="inline-block h-4 w-[3px] rounded-sm bg-accent" />
        <span className="tabular">{n}</span>
        {title}
      </h2>
      <div className="mt-3">{children}</div>
    </section>
  );
}

export function Sub({ children }: { children: ReactNode }) {
  return <h3 className="tl-heading mb-1.5 mt-4 text-[13px] font-semibold text-ink-2 first:mt-0">{children}</h3>;
}

export function Facts({ rows, cols = 4 }: { rows: Row[]; cols?: 2 | 3 | 4 }) {
  const grid = { 2: "sm:grid-cols-2", 3: "sm:grid-cols-3", 4: "sm:grid-cols-4" }[cols];
  return (
    <dl className={`grid grid-cols-2 gap-x-5 gap-y-2.5 ${grid}`}>
      {rows.map(([k, v]) => (
        <div key={k} className="tl-keep min-w-0">
          <dt className="text-[10.5px] font-medium uppercase tracking-wide text-muted">{k}</dt>
          <dd className="break-words text-[13px] text-ink">{v}</dd>
        </div>
      ))}
    </dl>
  );
}

export function Table({ head, rows, align = [] }: { head: string[]; rows: ReactNode[][]; align?: ("left" | "right" | "center")[] }) {
  const cls = (i: number) => (align[i] === "right" ? "text-right" : align[i] === "center" ? "text-center" : "text-left");
  return (
    <div className="-mx-1 overflow-x-auto px-1">
      <table className="w-full border-collapse text-[12.5px]">
        <thead>
          <tr className="bg-surface-2">
            {head.map((h, i) => (
              <th
                key={h}
                scope="col"
                className={`whitespace-nowrap px-2 py-1.5 text-[10.5px] font-semibold uppercase tracking-wide text-muted ${cls(i)}`}
              >
                {h}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((r, i) => (
            <tr key={i} className="tl-keep border-b border-line align-top">
              {r.map((cell, j) => (
                <td key={j} className={`px-2 py-1.5 ${cls(j)}`}>
                  {cell}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

const LEVEL = {
  remove: ["Remove", "text-danger"],
  error: ["Error", "text-danger"],
  warn: ["Check", "text-warn"],
  info: ["Note", "text-muted"],
} as const;

export function Notes({ items }: { items: Note[] }) {
  if (!items.length) return null;
  return (
    <ul className="mt-2 space-y-1 text-[12.5px]">
      {items.map((n, i) => (
        <li key={i} className="tl-keep grid grid-cols-[3.5rem_1fr] gap-2">
          <span className={`pt-px text-[10px] font-bold uppercase tracking-wide ${LEVEL[n.level][1]}`}>{LEVEL[n.level][0]}</span>
          <span className="text-ink-2">{n.text}</span>
        </li>
      ))}
    </ul>
  );
}

export function Callout({ tone, title, children }: { tone: "ok" | "warn" | "danger"; title: string; children?: ReactNode }) {
  const t = {
    ok: "border-ok bg-ok-soft text-ok",
    warn: "border-warn bg-warn-soft text-warn",
    danger: "border-danger bg-danger-soft text-danger",
  }[tone];
  return (
    <div className={`tl-keep mt-3 rounded-md border-l-[3px] px-4 py-3 ${t}`}>
      <p className="text-[13.5px] font-semibold">{title}</p>
      {children ? <div className="mt-0.5 text-[12.5px] text-ink">{children}</div> : null}
    </div>
  );
}
