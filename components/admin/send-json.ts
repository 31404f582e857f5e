// One way for admin screens to call Tearline's JSON API and get back a message and field errors.
import { fetchWithTimeout } from "@/lib/http/client-fetch";

export type SendResult<T> =
  | { ok: true; status: number; data: T }
  | { ok: false; status: number; error: string; fields: Record<string, string> };

type ErrorBody = { error?: string; fields?: Record<string, string>; details?: { fields?: Record<string, string> } };

export async function sendJson<T = unknown>(method: string, url: string, body?: unknown): Promise<SendResult<T>> {
  const sent = await fetchWithTimeout(url, {
    method,
    headers: body === undefined ? undefined : { "content-type": "application/json" },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  if (!sent.res) return { ok: false, status: 0, error: sent.message, fields: {} };
  const res = sent.res;
  const parsed = (await res.json().catch(() => ({}))) as T & ErrorBody;
  if (res.ok) return { ok: true, status: res.status, data: parsed };
  return {
    ok: false,
    status: res.status,
    error: parsed.error ?? `The server refused the change (HTTP ${res.status}).`,
    fields: { ...(parsed.details?.fields ?? {}), ...(parsed.fields ?? {}) },
  };
}
