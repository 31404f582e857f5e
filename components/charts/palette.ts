// Chart colours: Tearline's tokens where the chart follows the theme, fixed hues for categories.
export const THEME = {
  ink: "var(--ink)",
  ink2: "var(--ink-2)",
  muted: "var(--muted)",
  line: "var(--line)",
  lineStrong: "var(--line-strong)",
  surface: "var(--surface)",
  accent: "var(--accent)",
  ok: "var(--ok)",
  danger: "var(--danger)",
  warn: "var(--warn)",
} as const;

// Our own categorical set for root causes; unknown codes take the spare hues in turn.
const CAUSE_COLOURS: Record<string, string> = {
  "water-ingress": "#0284c7",
  "debris-ingress": "#92400e",
  lubrication: "#ca8a04",
  seal: "#7c3aed",
  electrical: "#db2777",
  impact: "#dc2626",
  mounting: "#0d9488",
  handling: "#475569",
  reconditioning: "#ea580c",
  material: "#4f46e5",
  "end-of-life": "#16a34a",
  "no-defect": "#a1a1aa",
  undetermined: "#78716c",
};
const SPARE = ["#0891b2", "#65a30d", "#c026d3", "#b45309", "#2563eb", "#9f1239"];

export function causeColour(code: string, index = 0): string {
  return CAUSE_COLOURS[code] ?? SPARE[index % SPARE.length];
}

export const OUTCOME_COLOURS = { confirmed: "#047857", noDefect: "#dc2626", notRecorded: "#94a3b8" } as const;

export const AXIS_TICK = { fill: "var(--muted)", fontSize: 12 } as const;
