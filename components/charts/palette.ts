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

// Categorical set for root causes, built on the Okabe–Ito colour-blind-safe palette (Okabe & Ito
// 2008) with a few darker hues from Paul Tol's schemes; every pair differs clearly in lightness or
// hue (tests/unit/charts/palette.test.ts).
// Unknown codes take the spare hues in turn.
export const CAUSE_COLOURS: Record<string, string> = {
  "water-ingress": "#0072B2",
  "debris-ingress": "#882255",
  lubrication: "#E69F00",
  seal: "#CC79A7",
  electrical: "#332288",
  impact: "#D55E00",
  mounting: "#009E73",
  handling: "#56B4E9",
  reconditioning: "#999933",
  material: "#5C3A1E",
  "end-of-life": "#1A1A1A",
  "no-defect": "#A3A3A3",
  undetermined: "#6B6B6B",
};
export const SPARE = ["#44AA99", "#AA4499", "#117733", "#DDCC77", "#88CCEE", "#661100"];

export function causeColour(code: string, index = 0): string {
  return CAUSE_COLOURS[code] ?? SPARE[index % SPARE.length];
}

export const OUTCOME_COLOURS = { confirmed: "#047857", noDefect: "#dc2626", notRecorded: "#94a3b8" } as const;

export const AXIS_TICK = { fill: "var(--muted)", fontSize: 12 } as const;
