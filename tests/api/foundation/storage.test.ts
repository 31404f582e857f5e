// The object store keeps bytes exactly as sent (compared by SHA-256), and health reports every service.
import { createHash, randomBytes, randomUUID } from "node:crypto";
import { Readable } from "node:stream";
import { GetObjectCommand, HeadObjectCommand, PutObjectCommand } from "@aws-sdk/client-s3";
import { afterAll, describe, expect, it } from "vitest";
import { bucket, deleteObject, getObject, putObject, s3 } from "../../../lib/storage/s3";
import { ApiClient } from "../../support/api";

const sha256 = (b: Buffer) => createHash("sha256").update(b).digest("hex");
const written: string[] = [];
const key = (what: string) => {
  const k = `tests/foundation/${what}-${randomUUID()}.bin`;
  written.push(k);
  return k;
};

afterAll(async () => {
  for (const k of written) await deleteObject(k).catch(() => undefined);
});

describe("object store", () => {
  it("returns a random 1 MiB object byte for byte", async () => {
    const sent = randomBytes(1024 * 1024);
    const k = key("buffer");
    await putObject(k, sent, "application/octet-stream");
    const back = await getObject(k);
    expect(back.length).toBe(sent.length);
    expect(sha256(back)).toBe(sha256(sent));
  });

  it("keeps a streamed upload intact (no checksum frames stored with the bytes)", async () => {
    const sent = randomBytes(1024 * 1024 + 17);
    const k = key("stream");
    const chunks = Array.from({ length: Math.ceil(sent.length / 65536) }, (_, i) => sent.subarray(i * 65536, (i + 1) * 65536));
    await s3().send(
      new PutObjectCommand({
        Bucket: bucket(),
        Key: k,
        Body: Readable.from(chunks),
        ContentLength: sent.length,
        ContentType: "image/jpeg",
      }),
    );
    const head = await s3().send(new HeadObjectCommand({ Bucket: bucket(), Key: k }));
    expect(head.ContentLength).toBe(sent.length);
    expect(head.ContentType).toBe("image/jpeg");
    expect(sha256(await getObject(k))).toBe(sha256(sent));
  });

  it("forgets a deleted object", async () => {
    const k = key("deleted");
    await putObject(k, Buffer.from("gone soon"), "text/plain");
    await deleteObject(k);
    await expect(s3().send(new GetObjectCommand({ Bucket: bucket(), Key: k }))).rejects.toMatchObject({ name: "NoSuchKey" });
  });
});

describe("health", () => {
  it("reports the database, the object store and the mail server as reachable, to anyone, as ok alone", async () => {
    const res = await new ApiClient().json<Record<string, { ok: boolean } | boolean>>("GET", "/api/health");
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ ok: true });
    expect(JSON.stringify(res.body)).not.toMatch(/S3RVER|password|secret/i);
  });
});
