// pdfkit's built-in Helvetica speaks WinAnsi only: swap what it cannot show for plain equivalents.
const SWAPS: Record<string, string> = {
  "−": "-",
  "→": "->",
  "←": "<-",
  "≤": "<=",
  "≥": ">=",
  "≈": "~",
  π: "pi",
  "✓": "yes",
  "✗": "no",
  "×": "×",
  "\u00a0": " ",
  "\u2009": " ",
  "\u202f": " ",
};
// Characters WinAnsi adds above Latin-1's control range (pdfkit maps these itself).
const WIN_ANSI_EXTRA = new Set("€‚ƒ„…†‡ˆ‰Š‹ŒŽ‘’“”•–—˜™š›œžŸ");

export function pdfText(s: string): string {
  let out = "";
  for (const ch of s) {
    const swapped = SWAPS[ch];
    if (swapped !== undefined) out += swapped;
    else if (ch === "\n" || ch === "\t") out += ch;
    else {
      const code = ch.codePointAt(0)!;
      out += (code >= 0x20 && code < 0x7f) || (code >= 0xa0 && code <= 0xff) || WIN_ANSI_EXTRA.has(ch) ? ch : "?";
    }
  }
  return out;
}
