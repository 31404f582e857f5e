// The weekly digest for managers: the week's counts, then the last twelve months' headline
// figures from the tallies, and a link to see them all.
import { renderMail, type RenderedMail } from "@/lib/mail/templates/layout";
import { monthLabel, percent, percentRange } from "@/lib/tallies/labels";
import { outOfControl } from "@/lib/tallies/shape-monthly";
import type { TalliesData } from "@/lib/tallies/types";

export type DigestInput = {
  tallies: TalliesData;
  week: { removals: number; signed: number; awaitingSignoff: number; from: string; to: string };
  tallyUrl: string;
};

const plural = (n: number, one: string, many = `${one}s`) => `${n.toLocaleString("en-US")} ${n === 1 ? one : many}`;
const interval = percentRange;

export function buildDigest({ tallies: t, week, tallyUrl }: DigestInput): RenderedMail {
  const period = t.filters.from && t.filters.to ? `${monthLabel(t.filters.from)} to ${monthLabel(t.filters.to)}` : "all time";
  const overall = t.byTrigger.overall;
  const blocks: Parameters<typeof renderMail>[2] = [
    {
      kind: "p",
      text: `This week (${week.from} to ${week.to}): ${plural(week.removals, "removal")} logged and ${plural(week.signed, "verdict")} signed. ${week.awaitingSignoff === 0 ? "No verdicts wait for sign-off." : `${plural(week.awaitingSignoff, "verdict")} ${week.awaitingSignoff === 1 ? "waits" : "wait"} for sign-off.`}`,
    },
    { kind: "p", text: `${period}, signed verdicts only:` },
    {
      kind: "facts",
      rows: [
        ["Removals logged", t.totals.removals.toLocaleString("en-US")],
        ["Verdicts signed", t.totals.signed.toLocaleString("en-US")],
        [
          "Removal confirmed by teardown",
          overall.p === null
            ? "no outcomes recorded"
            : `${percent(overall.p)} of ${overall.n.toLocaleString("en-US")} (95%: ${interval(overall.lower, overall.upper)})`,
        ],
        ["No defect found", t.totals.noDefect.toLocaleString("en-US")],
      ],
    },
  ];
  const top = t.pareto.slice(0, 3);
  if (top.length) {
    blocks.push({ kind: "p", text: "Most frequent root causes:" });
    blocks.push({
      kind: "facts",
      rows: top.map((p, i) => [`${i + 1}. ${p.label}`, `${p.count.toLocaleString("en-US")} (${percent(p.share)})`]),
    });
  }
  const triggers = [...t.byTrigger.rows].sort((a, b) => b.n - a.n).slice(0, 5);
  if (triggers.length) {
    blocks.push({ kind: "p", text: "Share of removals confirmed at teardown, by trigger:" });
    blocks.push({
      kind: "facts",
      rows: triggers.map((r) => [r.label, `${percent(r.rate.p)} of ${r.n} (95%: ${interval(r.rate.lower, r.rate.upper)})`]),
    });
  }
  const lowShops = t.byShop.rows.filter((r) => r.standsOut === "below");
  for (const s of lowShops) {
    blocks.push({
      kind: "p",
      text: `Removals from ${s.label} are confirmed less often than across all shops: ${percent(s.rate.p)} (95%: ${interval(s.rate.lower, s.rate.upper)}) against ${percent(overall.p)}. Worth a look at how its calls are made.`,
    });
  }
  const complete = t.monthly.months.filter((m) => m !== t.monthly.partialMonth);
  const lastMonth = complete[complete.length - 1];
  const alarms = outOfControl(t.monthly).filter((a) => a.month === lastMonth && a.side === "above");
  if (alarms.length) {
    blocks.push({
      kind: "p",
      text: `Above the control limit in ${monthLabel(lastMonth)}: ${alarms.map((a) => `${a.series} (${a.count}, limit ${a.limit.toFixed(1)})`).join("; ")}.`,
    });
  }
  blocks.push({ kind: "button", label: "Open the tallies", url: tallyUrl });
  const subject = `Tearline weekly digest: ${plural(week.removals, "removal")}, ${plural(week.signed, "verdict")} signed`;
  return renderMail(
    subject,
    `Week to ${week.to}`,
    blocks,
    "You receive this weekly digest as a manager on Tearline. Turn it off in your notice settings.",
  );
}
