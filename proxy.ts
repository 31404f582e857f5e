// Runs before every request: security headers with a fresh script nonce on every response, and the
// origin check on state-changing API calls (the body type is checked in withRole).
import { NextResponse, type NextRequest } from "next/server";
import { HSTS, STATIC_SECURITY_HEADERS, contentSecurityPolicy } from "@/lib/security/headers";
import { checkOrigin } from "@/lib/security/request-rules";

const appUrl = process.env.APP_URL ?? process.env.BETTER_AUTH_URL ?? "http://127.0.0.1:3000";
const allowedOrigins = [new URL(appUrl).origin, new URL(appUrl.replace("127.0.0.1", "localhost")).origin];
const trustedHops = Number(process.env.TEARLINE_TRUSTED_PROXY_HOPS ?? 0) > 0;

function overHttps(req: NextRequest) {
  if (req.nextUrl.protocol === "https:" && !req.headers.get("x-forwarded-proto")) return true;
  return trustedHops && (req.headers.get("x-forwarded-proto") ?? "").split(",")[0].trim() === "https";
}

function withHeaders(res: NextResponse, csp: string, https: boolean) {
  res.headers.set("Content-Security-Policy", csp);
  for (const [k, v] of Object.entries(STATIC_SECURITY_HEADERS)) res.headers.set(k, v);
  if (https) res.headers.set("Strict-Transport-Security", HSTS);
  return res;
}

export function proxy(req: NextRequest) {
  const nonce = Buffer.from(crypto.randomUUID()).toString("base64");
  const csp = contentSecurityPolicy(nonce, process.env.NODE_ENV === "development");
  const https = overHttps(req);

  const refusal = checkOrigin(req.method, req.nextUrl.pathname, req.headers.get("origin"), allowedOrigins);
  if (refusal) {
    return withHeaders(NextResponse.json({ error: refusal.message, code: refusal.code }, { status: refusal.status }), csp, https);
  }

  // Next reads the nonce from the request's policy and puts it on its own scripts.
  const requestHeaders = new Headers(req.headers);
  requestHeaders.set("x-nonce", nonce);
  requestHeaders.set("Content-Security-Policy", csp);
  return withHeaders(NextResponse.next({ request: { headers: requestHeaders } }), csp, https);
}

export const config = {
  matcher: [{ source: "/((?!_next/static|_next/image|favicon.ico).*)" }],
};
