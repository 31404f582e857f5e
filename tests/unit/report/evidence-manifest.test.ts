import { createHash } from "node:crypto";
import { describe, expect, it } from "vitest";
import { buildCaseReport } from "@/lib/report/build-report";
import { evidencePhotoPath, evidenceReadme, sha256Sums } from "@/lib/report/evidence-manifest";
import { demoReportSource } from "../../fixtures/report-demo-case";

describe("evidence manifest", () => {
  it("names photos by report number with a safe file name and the type's extension", () => {
    expect(evidencePhotoPath({ number: 3, fileName: "Seal lip (inboard).JPG", contentType: "image/jpeg", sha256: "c".repeat(64) })).toBe(
      "photos/03-Seal-lip-inboard.jpg",
    );
    expect(evidencePhotoPath({ number: 12, fileName: "../../etc/passwd", contentType: "image/png", sha256: "d".repeat(64) })).toBe(
      "photos/12-etc-passwd.png",
    );
    expect(evidencePhotoPath({ number: 1, fileName: "", contentType: "image/heic", sha256: "e".repeat(64) })).toBe(
      "photos/01-eeeeeeeeeeee.heic",
    );
  });

  it("writes SHA256SUMS lines as sha256sum does: digest, two spaces, path", () => {
    // SHA-256 of the empty input (FIPS 180-4 test vector, widely published).
    const empty = "e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855";
    expect(createHash("sha256").update("").digest("hex")).toBe(empty);
    expect(sha256Sums([{ path: "report.pdf", sha256: empty }])).toBe(`${empty}  report.pdf\n`);
  });

  it("warns in the README when a photo no longer matches its upload digest", () => {
    const r = buildCaseReport(demoReportSource());
    const ok = evidenceReadme(r, [{ path: "photos/01-a.jpg", stored: "x", actual: "x" }], "Sam", "now");
    expect(ok).toContain("Every photo's digest matches");
    const bad = evidenceReadme(r, [{ path: "photos/01-a.jpg", stored: "x", actual: "y" }], "Sam", "now");
    expect(bad).toContain("WARNING: 1 photo no longer matches");
  });
});
