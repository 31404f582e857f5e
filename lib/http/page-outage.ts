// Which requests the page outage check covers, and where "Try again" may lead. Pure: proxy.ts asks
// the database and does the rewrite; this only decides.

/** The page that says the casebook cannot be reached; served with 503 in place of the page asked for. */
export const UNAVAILABLE_PATH = "/unavailable";
/** Request header proxy.ts sets to the address the person asked for, for the page's "Try again" link. */
export const RETRY_HEADER = "x-tearline-retry";

/** A page navigation (or the router's fetch of one): GET or HEAD, not the API, not a built or public file. */
export function isPageRequest(method: string, pathname: string): boolean {
  if (method !== "GET" && method !== "HEAD") return false;
  if (pathname.startsWith("/api/") || pathname === "/api" || pathname.startsWith("/_next/")) return false;
  // Files such as /sw.js, /favicon.ico or /manifest.webmanifest need no database.
  return !/\.[a-z0-9]+$/i.test(pathname);
}

/** The retry link: a path on this site only (never another host), else the home page. */
export function retryPath(value: string | null | undefined): string {
  if (!value || value.length > 2000 || !value.startsWith("/") || value.startsWith("//") || value.startsWith("/\\")) return "/";
  if (value === UNAVAILABLE_PATH || value.startsWith(`${UNAVAILABLE_PATH}?`)) return "/";
  return value;
}
