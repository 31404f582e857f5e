// Which state-changing API requests are let through: same origin, and a body type the route reads.
const STATE_CHANGING = new Set(["POST", "PUT", "PATCH", "DELETE"]);

/** Body types per route: photos take multipart, the fleet upload takes multipart or CSV, the rest JSON. */
function allowedTypes(path: string): string[] {
  if (/^\/api\/cases\/[^/]+\/photos$/.test(path)) return ["multipart/form-data"];
  if (path === "/api/fleet") return ["multipart/form-data", "text/csv", "text/plain"];
  return ["application/json"];
}

export type Refusal = { status: 403 | 415; code: string; message: string };

export function checkApiRequest(method: string, path: string, origin: string | null, contentType: string | null, hasBody: boolean, allowedOrigins: string[]): Refusal | null {
  if (!STATE_CHANGING.has(method) || !path.startsWith("/api/")) return null;
  // better-auth checks the origin of its own endpoints itself.
  if (path.startsWith("/api/auth/")) return null;
  if (!origin || !allowedOrigins.includes(origin)) {
    return { status: 403, code: "bad-origin", message: "This request did not come from a Tearline page, so it was refused. Reload the page and try again." };
  }
  // Nothing to read, nothing to mistake for JSON (the origin was still checked).
  if (!hasBody) return null;
  const type = (contentType ?? "").split(";")[0].trim().toLowerCase();
  const allowed = allowedTypes(path);
  if (!allowed.includes(type)) {
    return { status: 415, code: "unsupported-media-type", message: `Send the request body as ${allowed.join(" or ")}.` };
  }
  return null;
}
