// Reads a request body as it arrives, counting bytes, and stops at a cap. Content-Length is not
// trusted: a chunked request leaves it out, and a client can state anything.
import { HttpError } from "./errors";

export const JSON_MAX_BYTES = 1024 * 1024;

function megabytes(bytes: number) {
  const mb = bytes / (1024 * 1024);
  return mb >= 1 ? `${Number(mb.toFixed(1))} MB` : `${Math.round(bytes / 1024)} KB`;
}

export function tooLarge(maxBytes: number, what: string): HttpError {
  return new HttpError(413, "too-large", `${what} is larger than ${megabytes(maxBytes)}, so it was refused and nothing was changed.`);
}

export async function readBodyLimited(req: Request, maxBytes: number, what = "The request body"): Promise<Uint8Array<ArrayBuffer>> {
  const declared = Number(req.headers.get("content-length") ?? NaN);
  if (Number.isFinite(declared) && declared > maxBytes) throw tooLarge(maxBytes, what);
  if (!req.body) return new Uint8Array();
  const reader = req.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > maxBytes) {
      await reader.cancel().catch(() => undefined);
      throw tooLarge(maxBytes, what);
    }
    chunks.push(value);
  }
  const out = new Uint8Array(total);
  let at = 0;
  for (const c of chunks) {
    out.set(c, at);
    at += c.byteLength;
  }
  return out;
}

export async function readTextLimited(req: Request, maxBytes: number, what?: string): Promise<string> {
  return new TextDecoder().decode(await readBodyLimited(req, maxBytes, what));
}

/** A multipart form read under the cap, then parsed from the counted bytes. */
export async function readFormLimited(req: Request, maxBytes: number, what?: string): Promise<FormData> {
  const bytes = await readBodyLimited(req, maxBytes, what);
  try {
    return await new Response(bytes as Uint8Array<ArrayBuffer>, {
      headers: { "content-type": req.headers.get("content-type") ?? "" },
    }).formData();
  } catch {
    throw new HttpError(400, "bad-request", "The upload arrived incomplete and could not be read; send it again.");
  }
}
