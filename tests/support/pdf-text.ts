// Reads a PDF back the way a person would: its text (poppler's pdftotext) and its page count (pdfinfo).
import { execFileSync } from "node:child_process";
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";

export function hasPoppler(): boolean {
  try {
    execFileSync("pdfinfo", ["-v"], { stdio: "ignore" });
    return true;
  } catch {
    return false;
  }
}

function withFile<T>(pdf: Uint8Array, fn: (file: string) => T): T {
  const dir = mkdtempSync(path.join(tmpdir(), "tearline-pdf-"));
  const file = path.join(dir, "report.pdf");
  writeFileSync(file, pdf);
  try {
    return fn(file);
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

/** Text of each page, in reading order (pages split on form feed). */
export function pdfPages(pdf: Uint8Array): string[] {
  const text = withFile(pdf, (f) => execFileSync("pdftotext", ["-enc", "UTF-8", f, "-"], { encoding: "utf8" }));
  return text.split("\f").slice(0, -1);
}

export function pdfPageCount(pdf: Uint8Array): number {
  const info = withFile(pdf, (f) => execFileSync("pdfinfo", [f], { encoding: "utf8" }));
  return Number(/^Pages:\s+(\d+)/m.exec(info)?.[1] ?? NaN);
}

/**
 * Letters set in very large type on each page (the diagonal DRAFT mark). pdftotext's plain output
 * leaves diagonal text out, so this reads the word boxes instead, sorted left to right.
 */
export function largeLettersPerPage(pdf: Uint8Array, minHeight = 30): string[] {
  const html = withFile(pdf, (f) => execFileSync("pdftotext", ["-bbox", "-enc", "UTF-8", f, "-"], { encoding: "utf8" }));
  return html
    .split(/<page /)
    .slice(1)
    .map((page) =>
      [...page.matchAll(/<word xMin="([\d.]+)" yMin="([\d.]+)" xMax="[\d.]+" yMax="([\d.]+)">([^<]*)<\/word>/g)]
        .filter((m) => Number(m[3]) - Number(m[2]) >= minHeight)
        .sort((a, b) => Number(a[1]) - Number(b[1]))
        .map((m) => m[4])
        .join(""),
    );
}
