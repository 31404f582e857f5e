// Every kind of bad upload gets a 4xx with a message a person can act on, and leaves nothing
// behind: no row in the database and no object in the bucket.
import { beforeAll, describe, expect, it } from "vitest";
import { as, ApiClient } from "../../support/api";
import { listKeys } from "../../support/bucket";
import { createCase } from "../../support/factories";
import { heicHeaderOnly, pixelBombPng, svgDrawing, textAsJpeg, truncatedJpeg, twoToneJpeg } from "../../support/photo-files";
import { footprint, upload } from "./helpers";

let analyst: ApiClient;
let caseId: string;
beforeAll(async () => {
  analyst = await as("analyst");
  caseId = (await createCase({ status: "bench" })).id;
});

async function expectRefused(client: ApiClient, targetCase: string, file: Buffer, name: string, status: number, message: RegExp) {
  const before = await footprint(targetCase);
  const bucketBefore = await listKeys("cases/");
  const res = await upload(client, targetCase, file, name);
  expect(res.status).toBe(status);
  expect(res.body.error).toMatch(message);
  expect(await footprint(targetCase)).toEqual(before);
  expect(await listKeys("cases/")).toEqual(bucketBefore);
}

describe("bad files are refused and leave nothing behind", () => {
  it("zero bytes → 400", async () => {
    await expectRefused(analyst, caseId, Buffer.alloc(0), "IMG_0001.jpg", 400, /“IMG_0001.jpg” is empty \(0 bytes\)/);
  });

  it("a truncated JPEG → 422", async () => {
    await expectRefused(analyst, caseId, await truncatedJpeg(), "cut.jpg", 422, /damaged or cut short.*upload the complete file/);
  });

  it("text renamed .jpg → 415", async () => {
    await expectRefused(
      analyst,
      caseId,
      textAsJpeg(),
      "raceway.jpg",
      415,
      /is not a photo: its content is plain text, whatever its name says/,
    );
  });

  it("an SVG drawing → 415", async () => {
    await expectRefused(analyst, caseId, svgDrawing(), "cup.svg", 415, /is an SVG drawing.*export it as PNG or JPEG/);
  });

  it("a pixel bomb → 413 before decoding", async () => {
    await expectRefused(analyst, caseId, pixelBombPng(20_000), "bomb.png", 413, /is 400 megapixels; photos may be at most 110 megapixels/);
  });

  it("a file over 25 MB → 413", async () => {
    const big = Buffer.concat([await twoToneJpeg(), Buffer.alloc(26 * 1024 * 1024, 0x55)]);
    await expectRefused(analyst, caseId, big, "huge.jpg", 413, /photos may be at most 25 MB/);
  });

  it("an HEIC the server cannot decode → 415 that says how to send JPEG", async () => {
    await expectRefused(
      analyst,
      caseId,
      heicHeaderOnly(),
      "IMG_4410.HEIC",
      415,
      /HEIC photo that this server cannot decode.*Most Compatible/,
    );
  });
});

describe("a file for a case the person may not touch", () => {
  it("is refused for an inspector of another shop as if the case did not exist", async () => {
    await expectRefused(await as("inspector.pellham"), caseId, await twoToneJpeg({ seed: 21 }), "x.jpg", 404, /That case was not found/);
  });

  it("is refused for a role that does not upload photos", async () => {
    await expectRefused(await as("engineer"), caseId, await twoToneJpeg({ seed: 22 }), "x.jpg", 403, /Your role does not allow this/);
  });

  it("is refused without signing in", async () => {
    await expectRefused(new ApiClient(), caseId, await twoToneJpeg({ seed: 23 }), "x.jpg", 401, /Sign in first/);
  });

  it("is refused for a signed case, which is read-only", async () => {
    const signed = await createCase({ status: "signed", signedAt: new Date() });
    await expectRefused(analyst, signed.id, await twoToneJpeg({ seed: 24 }), "x.jpg", 409, /signed and read-only/);
  });

  it("is refused for a case that does not exist", async () => {
    const res = await upload(analyst, "7d1f3c2e-0000-4000-8000-000000000000", await twoToneJpeg({ seed: 25 }), "x.jpg");
    expect(res.status).toBe(404);
  });
});

describe("malformed requests", () => {
  it("without a file field → 400", async () => {
    const form = new FormData();
    form.set("caption", "no file");
    const res = await analyst.request("POST", `/api/cases/${caseId}/photos`, form);
    expect(res.status).toBe(400);
    expect(((await res.json()) as { error: string }).error).toMatch(/field named “file”/);
  });

  it("with a tag that is not on the list → 400 naming it", async () => {
    const res = await upload(analyst, caseId, await twoToneJpeg({ seed: 26 }), "x.jpg", { component: "wheel" });
    expect(res.status).toBe(400);
    expect(res.body.error).toMatch(/^Choose a part from the list/);
  });
});
