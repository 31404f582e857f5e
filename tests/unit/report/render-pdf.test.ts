import { describe, expect, it } from "vitest";
import { buildCaseReport } from "@/lib/report/build-report";
import { renderReportPdf } from "@/lib/report/pdf/render-report-pdf";
import { demoReportSource } from "../../fixtures/report-demo-case";
import { hasPoppler, largeLettersPerPage, pdfPageCount, pdfPages } from "../../support/pdf-text";

describe.skipIf(!hasPoppler())("case report PDF", () => {
  it("reads back with the case number, every section and a footer on every page", async () => {
    const pdf = await renderReportPdf(buildCaseReport(demoReportSource()));
    expect(pdf.subarray(0, 5).toString()).toBe("%PDF-");
    const pages = pdfPages(pdf);
    const count = pdfPageCount(pdf);
    expect(pages).toHaveLength(count);
    expect(count).toBeGreaterThanOrEqual(2);
    const all = pages.join("\n");
    expect(all).toContain("TEARLINE CASE REPORT");
    for (const s of [
      "Bearing and removal",
      "Field checks",
      "Teardown",
      "Findings by part",
      "Damage map",
      "Verdict",
      "Related cases",
      "Photo register",
    ])
      expect(all).toContain(s);
    expect(all).toContain("Signed revision — signed by Tomasz Wielgus on 2 Apr 2026, 09:30 UTC");
    // The end-play arithmetic as printed: mean 0.020 in = 0.508 mm (1 in = 25.4 mm, NIST SP 811).
    expect(all).toContain("0.0200 in = 0.508 mm (3 trials)");
    pages.forEach((text, i) => expect(text).toContain(`TL-26-00042 · page ${i + 1} of ${count}`));
    expect(all).not.toMatch(/draft/i);
    expect(largeLettersPerPage(pdf).every((m) => m === "")).toBe(true);
  });

  it("marks a draft on every page", async () => {
    const pdf = await renderReportPdf(buildCaseReport(demoReportSource({ status: "bench", signedAt: null })));
    const pages = pdfPages(pdf);
    expect(pages.length).toBe(pdfPageCount(pdf));
    expect(pages[0]).toContain("DRAFT");
    for (const text of pages) expect(text).toContain("Draft — not signed");
    // The large diagonal mark, read from the word boxes, left to right.
    const marks = largeLettersPerPage(pdf);
    expect(marks).toHaveLength(pages.length);
    for (const m of marks) expect(m).toBe("DRAFT—NOTSIGNED");
    expect(pages.join("\n")).not.toContain("Signed revision");
  });

  it("prints the safety flag beside the confirmations left unticked, and none when all were ticked", async () => {
    const src = demoReportSource();
    const unticked = {
      ...src,
      case: { ...src.case, fieldChecks: { ...src.case.fieldChecks, confirmations: { ppe: true, blueSignal: true } } },
    };
    const flagged = pdfPages(await renderReportPdf(buildCaseReport(unticked)))
      .join("\n")
      .replace(/\s+/g, " ");
    expect(flagged).toContain("Safety flag: confirmations left unticked at filing");
    expect(flagged).toContain("Not confirmed: wheelset is out from under the car and secured against rolling");
    expect(flagged).not.toContain("Not confirmed: blue-signal");
    const clean = pdfPages(await renderReportPdf(buildCaseReport(src))).join("\n");
    expect(clean).not.toContain("Safety flag");
  });
});
