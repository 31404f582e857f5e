// The evidence bundle: report, original photos byte for byte, and a SHA256SUMS list that checks out.
import { execFileSync } from "node:child_process";
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { ApiClient, as } from "../../support/api";
import { pdfPages } from "../../support/pdf-text";
import { deleteObject } from "@/lib/storage/s3";
import { createCase } from "../../support/factories";
import { addPhoto, reportCases, sha256 } from "./report-fixture";

let cases: Awaited<ReturnType<typeof reportCases>>;
const dir = mkdtempSync(path.join(tmpdir(), "tearline-evidence-"));
const zipFile = path.join(dir, "evidence.zip");
const unzip = (...args: string[]) => execFileSync("unzip", args, { maxBuffer: 64 * 1024 * 1024 });

beforeAll(async () => {
  cases = await reportCases();
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe("GET /api/cases/:id/evidence.zip", () => {
  it("holds the report, the original photos and a SHA256SUMS list that sha256sum accepts", async () => {
    const res = await (await as("analyst")).get(`/api/cases/${cases.signed.id}/evidence.zip`);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("application/zip");
    expect(res.headers.get("content-disposition")).toContain(`${cases.signed.number}-evidence.zip`);
    writeFileSync(zipFile, Buffer.from(await res.arrayBuffer()));

    const names = unzip("-Z1", zipFile).toString().trim().split("\n");
    expect(names).toEqual(["report.pdf", "photos/01-cup-raceway-12.jpg", "photos/02-seal.jpg", "SHA256SUMS", "README.txt"]);

    // The originals come out byte for byte as they went in.
    expect(sha256(unzip("-p", zipFile, "photos/01-cup-raceway-12.jpg"))).toBe(cases.photos[0].digest);
    expect(sha256(unzip("-p", zipFile, "photos/02-seal.jpg"))).toBe(cases.photos[1].digest);

    const sums = unzip("-p", zipFile, "SHA256SUMS").toString();
    const lines = sums.trim().split("\n");
    expect(lines).toHaveLength(3);
    for (const line of lines) {
      const m = /^([0-9a-f]{64}) {2}(.+)$/.exec(line);
      expect(m, line).not.toBeNull();
      expect(sha256(unzip("-p", zipFile, m![2]))).toBe(m![1]);
    }
    // GNU coreutils checks the list itself, as the person receiving the bundle would.
    const out = path.join(dir, "out");
    unzip("-q", zipFile, "-d", out);
    expect(execFileSync("sha256sum", ["-c", "SHA256SUMS"], { cwd: out }).toString()).toMatch(/report\.pdf: OK[\s\S]*02-seal\.jpg: OK/);

    expect(pdfPages(new Uint8Array(unzip("-p", zipFile, "report.pdf"))).join("\n")).toContain(cases.signed.number);
    const readme = unzip("-p", zipFile, "README.txt").toString();
    expect(readme).toContain(`case ${cases.signed.number}`);
    expect(readme).toContain("Every photo's digest matches");
  });

  it("is for people who export cases and can read this one", async () => {
    expect((await new ApiClient().get(`/api/cases/${cases.signed.id}/evidence.zip`)).status).toBe(401);
    expect((await (await as("inspector")).get(`/api/cases/${cases.signed.id}/evidence.zip`)).status).toBe(403);
    const draft = await (await as("manager")).get(`/api/cases/${cases.draft.id}/evidence.zip`);
    expect(draft.status).toBe(200);
    expect(
      Buffer.from(await draft.arrayBuffer())
        .subarray(0, 2)
        .toString(),
    ).toBe("PK");
  });

  it("refuses with a clear message, before any download starts, when an original is missing from storage", async () => {
    const c = await createCase({ status: "bench" });
    const photo = await addPhoto(c.id, { component: "cup", fileName: "lost.jpg", rgb: [10, 10, 10] });
    await deleteObject(`cases/${c.id}/${photo.digest}/original`);
    const res = await (await as("engineer")).json<{ error: string; code: string }>("GET", `/api/cases/${c.id}/evidence.zip`);
    expect(res.status).toBe(500);
    expect(res.body.code).toBe("evidence-incomplete");
    expect(res.body.error).toContain("photo 1 (lost.jpg)");
  });
});
