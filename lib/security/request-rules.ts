// Which state-changing API requests are let through: from our own pages, with a body type the route reads.
const STATE_CHANGING = new Set(["POST", "PUT", "PATCH", "DELETE"]);

/** Body types per route: photos take multipart, the fleet upload multipart or CSV, the rest JSON. */
function allowedTypes(path: string): string[] {
  if (/^\/api\/cases\/[^/]+\/photos$/.test(path)) return ["multipart/form-data"];
  if (path === "/api/fleet") return ["multipart/form-data", "text/csv", "text/plain"];
  return ["application/json"];
}

export type Refusal = { status: 403 | 415; code: string; message: string };

const changesState = (method: string, path: string) =>
  STATE_CHANGING.has(method) && path.startsWith("/api/") && !path.startsWith("/api/auth/");

/** Checked in proxy.ts for every API call (better-auth checks the origin of its own endpoints itself). */
export function checkOrigin(method: string, path: string, origin: string | null, allowedOrigins: string[]): Refusal | null {
  if (!changesState(method, path)) return null;
  if (origin && allowedOrigins.includes(origin)) return null;
  return {
    status: 403,
    code: "bad-origin",
    message: "This request did not come from a Tearline page, so it was refused. Reload the page and try again.",
  };
}

/** Checked in withRole once the caller is known, so a stranger learns "sign in" before anything else. */
export function checkBodyType(method: string, path: string, contentType: string | null, hasBody: boolean): Refusal | null {
  if (!changesState(method, path) || !hasBody) return null;
  const type = (contentType ?? "").split(";")[0].trim().toLowerCase();
  const allowed = allowedTypes(path);
  if (allowed.includes(type)) return null;
  return { status: 415, code: "unsupported-media-type", message: `Send the request body as ${allowed.join(" or ")}.` };
}

export function requestHasBody(headers: Headers): boolean {
  return headers.has("content-length") ? headers.get("content-length") !== "0" : headers.has("transfer-encoding");
}
