// Shared steps for the photo API tests: upload a file as a browser would, and count what a case holds.
import { eq } from "drizzle-orm";
import type { ApiClient } from "../../support/api";
import { listKeys } from "../../support/bucket";
import { db, t } from "../../support/db";

export async function upload(
  client: ApiClient,
  caseId: string,
  file: Buffer,
  name: string,
  tags: Record<string, string> = {},
  type = "image/jpeg",
) {
  const form = new FormData();
  form.set("file", new Blob([new Uint8Array(file)], { type }), name);
  for (const [k, v] of Object.entries(tags)) form.set(k, v);
  const res = await client.request("POST", `/api/cases/${caseId}/photos`, form);
  const body = (await res.json()) as {
    photo?: { id: string; sha256: string; takenAt: string | null; width: number; height: number; urls: Record<string, string> };
    duplicate?: boolean;
    message?: string;
    error?: string;
    code?: string;
  };
  return { status: res.status, body };
}

/** Rows and stored objects of one case: what "nothing left behind" is measured against. */
export async function footprint(caseId: string) {
  const rows = await db.select({ id: t.photos.id }).from(t.photos).where(eq(t.photos.caseId, caseId));
  return { rows: rows.length, objects: await listKeys(`cases/${caseId}/`) };
}
