// Runs before every request: security headers with a fresh script nonce on every response, the
// origin check on state-changing API calls (the body type is checked in withRole), and for a page
// while the database is out of reach, Tearline's own "cannot be reached" page with 503 in its place.
import { NextResponse, type NextRequest } from "next/server";
import { HSTS, STATIC_SECURITY_HEADERS, contentSecurityPolicy } from "@/lib/security/headers";
import { checkOrigin } from "@/lib/security/request-rules";
import { RETRY_HEADER, UNAVAILABLE_PATH, isPageRequest } from "@/lib/http/page-outage";
import { databaseReachable } from "@/db/reachable";

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

// A page's render cannot answer 503 itself (the framework makes a failed render a 500), so the outage
// page is rendered by this same server as an ordinary page and sent on here with 503. Its headers
// (the policy with its own nonce) travel with it.
// `next start` records its own address in the environment at run time (read by name, not inlined by the build).
const runtimeEnv: Record<string, string | undefined> = process.env;
const selfOrigin = () => runtimeEnv["__NEXT_PRIVATE_ORIGIN"] ?? `http://127.0.0.1:${runtimeEnv["PORT"] ?? 3000}`;

async function unavailablePage(asked: string, method: string): Promise<NextResponse> {
  const page = await fetch(new URL(UNAVAILABLE_PATH, selfOrigin()), {
    method,
    headers: { [RETRY_HEADER]: asked },
    signal: AbortSignal.timeout(10_000),
  });
  const headers = new Headers(page.headers);
  // fetch has already unpacked the body; the server packs the answer again itself.
  for (const h of ["content-encoding", "content-length", "transfer-encoding"]) headers.delete(h);
  headers.set("Retry-After", "30");
  headers.set("Cache-Control", "no-store");
  return new NextResponse(method === "HEAD" ? null : page.body, { status: 503, headers });
}

export async function proxy(req: NextRequest) {
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

  // Every page reads the database (the session at least); without it the render would fail with the
  // framework's 500. Asked per page request (one tiny query, shared by requests arriving together).
  const { pathname, search } = req.nextUrl;
  if (isPageRequest(req.method, pathname)) {
    const reachable = await databaseReachable();
    if (pathname === UNAVAILABLE_PATH) {
      // The page is for outages only: asked for directly while the database answers, go home.
      if (reachable) return withHeaders(NextResponse.redirect(new URL("/", req.url)), csp, https);
    } else if (!reachable) {
      return unavailablePage(pathname + search, req.method);
    }
  }
  return withHeaders(NextResponse.next({ request: { headers: requestHeaders } }), csp, https);
}

export const config = {
  matcher: [{ source: "/((?!_next/static|_next/image|favicon.ico).*)" }],
};
