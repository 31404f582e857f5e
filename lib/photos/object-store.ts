// The bucket as the photo code sees it, through the AWS SDK only: the same code runs against the
// local fake and a real S3 bucket; configuration (S3_* in lib/env.ts) decides which.
import "server-only";
import { GetObjectCommand, ListObjectsV2Command, NoSuchKey } from "@aws-sdk/client-s3";
import { bucket, deleteObject, putObject, s3 } from "@/lib/storage/s3";
import type { PhotoObjectStore } from "./ingest";
import type { StoredObject } from "./sweep";

export const s3PhotoStore: PhotoObjectStore = {
  put: (key, body, contentType) => putObject(key, body, contentType),
  remove: async (keys) => {
    await Promise.all(keys.map((k) => deleteObject(k)));
  },
};

export async function* listStoredObjects(prefix: string): AsyncIterable<StoredObject> {
  let token: string | undefined;
  do {
    const page = await s3().send(new ListObjectsV2Command({ Bucket: bucket(), Prefix: prefix, ContinuationToken: token }));
    for (const o of page.Contents ?? []) {
      if (o.Key) yield { key: o.Key, lastModified: o.LastModified ?? new Date(0) };
    }
    token = page.IsTruncated ? page.NextContinuationToken : undefined;
  } while (token);
}

/** The object's bytes as a web stream for a response body, or null when it is missing. */
export async function openStoredObject(key: string): Promise<{ body: ReadableStream; length: number | undefined } | null> {
  try {
    const res = await s3().send(new GetObjectCommand({ Bucket: bucket(), Key: key }));
    if (!res.Body) return null;
    return { body: res.Body.transformToWebStream(), length: res.ContentLength };
  } catch (err) {
    if (err instanceof NoSuchKey || (err as { name?: string }).name === "NoSuchKey") return null;
    throw err;
  }
}
