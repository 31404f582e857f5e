// The case report PDF read back as text: sections, arithmetic, revision, footers and the draft mark.
import { beforeAll, describe, expect, it } from "vitest";
import { ApiClient, as } from "../../support/api";
import { largeLettersPerPage, pdfPageCount, pdfPages } from "../../support/pdf-text";
import { reportCases } from "./report-fixture";

let cases: Awaited<ReturnType<typeof reportCases>>;

async function pdfOf(client: ApiClient, caseId: string) {
  const res = await client.get(`/api/cases/${caseId}/report.pdf`);
  expect(res.status).toBe(200);
  expect(res.headers.get("content-type")).toBe("application/pdf");
  return { res, pdf: new Uint8Array(await res.arrayBuffer()) };
}

beforeAll(async () => {
  cases = await reportCases();
});

describe("GET /api/cases/:id/report.pdf", () => {
  it("renders a signed case with every section, the end-play arithmetic and numbered pages", async () => {
    const { res, pdf } = await pdfOf(await as("engineer"), cases.signed.id);
    expect(res.headers.get("content-disposition")).toContain(`${cases.signed.number}-report.pdf`);
    const pages = pdfPages(pdf);
    const count = pdfPageCount(pdf);
    expect(count).toBeGreaterThanOrEqual(2);
    expect(pages).toHaveLength(count);
    const text = pages.join("\n");
    expect(text).toContain("TEARLINE CASE REPORT");
    expect(text).toContain(cases.signed.number);
    for (const section of [
      "Bearing and removal",
      "Field checks",
      "Teardown",
      "Findings by part",
      "Damage map",
      "Verdict",
      "Related cases",
      "Photo register",
    ]) {
      expect(text).toContain(section);
    }
    expect(text).toContain("Signed revision — signed by Tomasz Wielgus on 22 Jun 2026, 09:30 UTC");
    // Dial trials 0.020, 0.021, 0.019 in: mean 0.020 in = 0.508 mm (1 in = 25.4 mm exactly, NIST SP 811).
    expect(text).toContain("0.0200 in = 0.508 mm (3 trials)");
    // The limit: 1/16 in = 0.0625 in (common practice for North American freight interchange).
    expect(text).toContain("0.0625 in = 1.588 mm (1/16 in)");
    expect(text).toContain("Field call: Remove from service");
    expect(text).toContain("Water etch");
    expect(text).toContain(cases.related.number);
    // The photo register prints each digest in two halves.
    for (const p of cases.photos) {
      expect(text).toContain(p.digest.slice(0, 32));
      expect(text).toContain(p.digest.slice(32));
    }
    pages.forEach((page, i) => expect(page).toContain(`${cases.signed.number} · page ${i + 1} of ${count}`));
    expect(text).not.toMatch(/draft/i);
    expect(largeLettersPerPage(pdf).every((letters) => letters === "")).toBe(true);
  });

  it("marks a draft on every page and says it is not signed", async () => {
    const { res, pdf } = await pdfOf(await as("analyst"), cases.draft.id);
    expect(res.headers.get("content-disposition")).toContain(`${cases.draft.number}-draft-report.pdf`);
    const pages = pdfPages(pdf);
    expect(pages).toHaveLength(pdfPageCount(pdf));
    expect(pages[0]).toContain("DRAFT");
    for (const page of pages) expect(page).toContain("Draft — not signed");
    for (const letters of largeLettersPerPage(pdf)) expect(letters).toBe("DRAFT—NOTSIGNED");
    expect(pages.join("\n")).not.toContain("Signed revision");
  });

  it("answers only people who may read the case", async () => {
    expect((await new ApiClient().get(`/api/cases/${cases.signed.id}/report.pdf`)).status).toBe(401);
    // The case belongs to Marrow Junction; the Pellham Yard inspector may not see it, and learns nothing.
    expect((await (await as("inspector.pellham")).get(`/api/cases/${cases.signed.id}/report.pdf`)).status).toBe(404);
    expect((await (await as("inspector")).get(`/api/cases/${cases.signed.id}/report.pdf`)).status).toBe(200);
    expect((await (await as("engineer")).get("/api/cases/not-a-uuid/report.pdf")).status).toBe(404);
  });
});

describe("GET /cases/:number/report", () => {
  it("shows the printable report with its revision, and hides it from people who may not read the case", async () => {
    const engineer = await as("engineer");
    const signed = await engineer.get(`/cases/${cases.signed.number}/report`);
    expect(signed.status).toBe(200);
    const html = await signed.text();
    expect(html).toContain("Signed revision — signed by Tomasz Wielgus");
    expect(html).toContain(`/api/cases/${cases.signed.id}/report.pdf`);
    expect(html).not.toContain("DRAFT — NOT SIGNED");
    const draft = await (await engineer.get(`/cases/${cases.draft.number}/report`)).text();
    expect(draft).toContain("DRAFT — NOT SIGNED");
    expect((await (await as("inspector.pellham")).get(`/cases/${cases.signed.number}/report`)).status).toBe(404);
  });
});
