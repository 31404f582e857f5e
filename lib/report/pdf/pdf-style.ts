// The report's print palette and type scale (Tearline's slate and amber, sized for paper).
export const PAGE = { size: "LETTER" as const, width: 612, height: 792, margin: { top: 46, bottom: 58, left: 48, right: 48 } };
export const CONTENT_WIDTH = PAGE.width - PAGE.margin.left - PAGE.margin.right;

export const INK = "#0f172a";
export const INK_2 = "#334155";
export const MUTED = "#64748b";
export const LINE = "#e2e8f0";
export const LINE_STRONG = "#cbd5e1";
export const SURFACE_2 = "#f8fafc";
export const ACCENT = "#b45309";
export const AMBER = "#fbbf24";
export const OK = "#047857";
export const OK_SOFT = "#d1fae5";
export const DANGER = "#b91c1c";
export const DANGER_SOFT = "#fee2e2";
export const WARN = "#a16207";
export const WARN_SOFT = "#fef9c3";

export const FONT = { regular: "Helvetica", bold: "Helvetica-Bold", italic: "Helvetica-Oblique", mono: "Courier" } as const;
export const SIZE = { body: 9, small: 7.5, label: 7, h2: 11.5, h3: 9.5 } as const;

export const LEVEL_COLOUR = { remove: DANGER, error: DANGER, warn: WARN, info: MUTED } as const;
export const LEVEL_WORD = { remove: "Remove", error: "Error", warn: "Check", info: "Note" } as const;
