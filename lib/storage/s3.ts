// The object store, reached only through the AWS SDK: the local fake here, a real bucket elsewhere.
import "server-only";
import { GetObjectCommand, HeadBucketCommand, PutObjectCommand, DeleteObjectCommand, S3Client } from "@aws-sdk/client-s3";
import { env } from "@/lib/env";
import { isObjectStoreOutage, ObjectStoreUnavailable } from "@/lib/http/unavailable";

let client: S3Client | undefined;

export function s3(): S3Client {
  if (client) return client;
  const e = env();
  client = new S3Client({
    region: e.S3_REGION,
    endpoint: e.S3_ENDPOINT,
    forcePathStyle: Boolean(e.S3_FORCE_PATH_STYLE),
    credentials: { accessKeyId: e.S3_ACCESS_KEY_ID, secretAccessKey: e.S3_SECRET_ACCESS_KEY },
    // The fake stores the SDK's default streaming checksum frames verbatim; only send checksums when required.
    requestChecksumCalculation: "WHEN_REQUIRED",
    responseChecksumValidation: "WHEN_REQUIRED",
    // A store that is down or stuck must fail the request in seconds, not hang it: 3 s to connect,
    // 60 s for a whole request (a 25 MB original on a slow link), two tries in all.
    requestHandler: { connectionTimeout: 3_000, requestTimeout: 60_000, throwOnRequestTimeout: true },
    maxAttempts: 2,
  });
  // Outermost step, after the SDK's retries: an outage becomes one error the API answers with 503.
  client.middlewareStack.add(
    (next) => async (args) => {
      try {
        return await next(args);
      } catch (err) {
        throw isObjectStoreOutage(err) ? new ObjectStoreUnavailable(err) : err;
      }
    },
    { step: "initialize", name: "tearlineObjectStoreOutage" },
  );
  return client;
}

export const bucket = () => env().S3_BUCKET;

export async function putObject(key: string, body: Buffer, contentType: string) {
  await s3().send(new PutObjectCommand({ Bucket: bucket(), Key: key, Body: body, ContentType: contentType, ContentLength: body.length }));
}

export async function getObject(key: string): Promise<Buffer> {
  const res = await s3().send(new GetObjectCommand({ Bucket: bucket(), Key: key }));
  return Buffer.from(await res.Body!.transformToByteArray());
}

export async function deleteObject(key: string) {
  await s3().send(new DeleteObjectCommand({ Bucket: bucket(), Key: key }));
}

export async function storageReachable(): Promise<boolean> {
  await s3().send(new HeadBucketCommand({ Bucket: bucket() }));
  return true;
}
