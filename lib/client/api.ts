// The one way browser code calls Tearline's API: JSON or a form, a time limit, and every refusal
// read the same way (see api-problem.ts). A weak signal ends in a message, never a spinner forever.
import {
  ApiError,
  clientTimeoutMs,
  UPLOAD_TIMEOUT_MS,
  noAnswerProblem,
  problemFrom,
  type ApiResult,
  type NoAnswer,
  type ProblemOptions,
} from "./api-problem";

export * from "./api-problem";

export type CallOptions = ProblemOptions & {
  /** Sent as JSON. */
  json?: unknown;
  /** Sent as multipart; the time limit defaults to the upload one. */
  form?: FormData;
  headers?: Record<string, string>;
  /** Milliseconds before giving up; 20 s (see clientTimeoutMs), or 120 s for a form. */
  timeoutMs?: number;
  /** The caller's own cancel (a closed dialog). */
  signal?: AbortSignal;
};

export async function callApi<T = unknown>(method: string, url: string, opts: CallOptions = {}): Promise<ApiResult<T>> {
  const controller = new AbortController();
  let why: NoAnswer | null = null;
  const ms = opts.timeoutMs ?? (opts.form ? UPLOAD_TIMEOUT_MS : clientTimeoutMs());
  const timer = setTimeout(() => {
    why = "timeout";
    controller.abort();
  }, ms);
  const onCancel = () => {
    why ??= "cancelled";
    controller.abort();
  };
  if (opts.signal?.aborted) onCancel();
  opts.signal?.addEventListener("abort", onCancel);

  const headers: Record<string, string> = { accept: "application/json", ...opts.headers };
  if (opts.json !== undefined) headers["content-type"] = "application/json";
  try {
    const res = await fetch(url, {
      method,
      headers,
      body: opts.form ?? (opts.json !== undefined ? JSON.stringify(opts.json) : undefined),
      signal: controller.signal,
    });
    // The body is read under the same time limit: a stalled answer is no answer.
    const text = await res.text();
    let body: unknown = null;
    try {
      body = text ? JSON.parse(text) : null;
    } catch {
      body = null;
    }
    if (res.ok) return { ok: true, status: res.status, data: body as T };
    return { ok: false, ...problemFrom(res.status, body, opts) };
  } catch {
    // Not a timeout nor a cancel: the network failed (offline, DNS, connection reset).
    return { ok: false, ...noAnswerProblem(why ?? "offline") };
  } finally {
    clearTimeout(timer);
    opts.signal?.removeEventListener("abort", onCancel);
  }
}

/** For SWR and other callers that expect a thrown Error: the data, or an ApiError with the message. */
export async function getOrThrow<T>(url: string, opts: ProblemOptions & { timeoutMs?: number } = {}): Promise<T> {
  const r = await callApi<T>("GET", url, opts);
  if (!r.ok) throw new ApiError(r);
  return r.data;
}

/** Shorthand for a JSON change: `sendJson("PATCH", url, body)`. */
export const sendJson = <T = unknown>(method: string, url: string, body?: unknown) => callApi<T>(method, url, { json: body });
