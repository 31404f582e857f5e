// How the browser reads a refusal from Tearline's API: one shape for every screen, whatever the
// route answered. Pure (no fetch, no React) so it is unit-tested alone.
//
// The server answers errors as (lib/http/handler.ts errorResponse):
//   zod:        { error, code: "bad-request", fields: { "data.site": "…" } }
//   HttpError:  { error, code, details? }       details may hold { fields } or, for a stale save (409),
//                                               { currentVersion, updatedBy, updatedAt, current }
//   outage:     { error, code: "unavailable", service }   (503)
// and some routes add their own keys beside `error` (the fleet upload's `rows`).

/** Long enough for a slow shop-floor link; short enough that nobody waits without word. */
export const CLIENT_TIMEOUT_MS = 20_000;
/** Uploads (photos, fleet lists) carry megabytes over the same weak signal. */
export const UPLOAD_TIMEOUT_MS = 120_000;

/** The limit for an ordinary call: CLIENT_TIMEOUT_MS, unless the page set a positive
 * `window.tearlineClientTimeoutMs` before the app ran (browser tests shorten it so that a
 * held request does not make a slow test). */
export function clientTimeoutMs(): number {
  const set = (globalThis as { tearlineClientTimeoutMs?: unknown }).tearlineClientTimeoutMs;
  return typeof set === "number" && Number.isFinite(set) && set > 0 ? set : CLIENT_TIMEOUT_MS;
}

export const TIMEOUT_MESSAGE = "The server did not answer in time. Check the connection and try again; nothing was lost on this screen.";
export const OFFLINE_MESSAGE = "The server could not be reached. Check the connection and try again.";
export const CANCELLED_MESSAGE = "Cancelled.";

export type ApiProblem = {
  /** HTTP status; 0 when no answer came (timeout, offline, cancelled). */
  status: number;
  /** One sentence in the words of the screen. */
  message: string;
  /** The server's code ("bad-request", "conflict", …) or "timeout" / "offline" / "cancelled". */
  code: string;
  /** Field problems keyed by form field (prefixes such as `data.` removed when asked). */
  fields: Record<string, string>;
  /** A 409: someone else saved, or the case was signed, since this screen loaded. */
  conflict: boolean;
  /** The server's `details`, e.g. the stale-save facts. */
  details: unknown;
  /** The whole answer, for routes that add their own keys (the fleet upload's rows). */
  body: Record<string, unknown>;
};

export type ApiResult<T> = { ok: true; status: number; data: T } | ({ ok: false } & ApiProblem);

export type ProblemOptions = {
  /** Said when the server gave no message of its own. */
  fallback?: string;
  /** Leading path parts to drop from field keys, so `data.site` lands on the form's `site`. */
  fieldPrefixes?: string[];
};

const isRecord = (v: unknown): v is Record<string, unknown> => typeof v === "object" && v !== null && !Array.isArray(v);

function stringFields(v: unknown): Record<string, string> {
  if (!isRecord(v)) return {};
  return Object.fromEntries(Object.entries(v).filter((e): e is [string, string] => typeof e[1] === "string"));
}

export function stripPrefixes(fields: Record<string, string>, prefixes: string[] = []): Record<string, string> {
  if (!prefixes.length) return fields;
  const pattern = new RegExp(`^(${prefixes.map((p) => p.replace(/[.*+?^${}()|[\]\\]/g, "\\$&")).join("|")})\\.`);
  const out: Record<string, string> = {};
  for (const [k, v] of Object.entries(fields)) out[k.replace(pattern, "")] ??= v;
  return out;
}

/** Reads any error answer into one ApiProblem. `body` is the parsed JSON, or anything else when it was not JSON. */
export function problemFrom(status: number, body: unknown, opts: ProblemOptions = {}): ApiProblem {
  const b = isRecord(body) ? body : {};
  const details = b.details;
  const fields = stripPrefixes(
    { ...stringFields(isRecord(details) ? details.fields : undefined), ...stringFields(b.fields) },
    opts.fieldPrefixes,
  );
  const said =
    typeof b.error === "string" && b.error.trim() ? b.error : typeof b.message === "string" && b.message.trim() ? b.message : null;
  return {
    status,
    message: said ?? opts.fallback ?? fallbackFor(status),
    code: typeof b.code === "string" ? b.code : status === 409 ? "conflict" : "http",
    fields,
    conflict: status === 409,
    details,
    body: b,
  };
}

function fallbackFor(status: number): string {
  if (status === 401) return "Your session has ended. Sign in again and retry.";
  if (status === 403) return "Your role does not allow this.";
  if (status === 404) return "That record was not found.";
  if (status === 413) return "That is too large to send.";
  if (status >= 500) return `The server had a problem (error ${status}); nothing was changed. Try again.`;
  return `The server refused the request (error ${status}).`;
}

export type NoAnswer = "timeout" | "offline" | "cancelled";

/** A request that got no answer at all, in plain words. */
export function noAnswerProblem(kind: NoAnswer): ApiProblem {
  const message = kind === "timeout" ? TIMEOUT_MESSAGE : kind === "offline" ? OFFLINE_MESSAGE : CANCELLED_MESSAGE;
  return { status: 0, message, code: kind, fields: {}, conflict: false, details: undefined, body: {} };
}

/** Carries a problem through code that expects a thrown Error (SWR fetchers). */
export class ApiError extends Error {
  constructor(public problem: ApiProblem) {
    super(problem.message);
    this.name = "ApiError";
  }
}
