// Which address a request came from. No request header can choose it unless a trusted proxy is configured.
import "server-only";

/** Set on every incoming request by the server itself (see peer-address-stamp.ts); a client's own value is overwritten. */
export const PEER_HEADER = "x-tearline-peer";

/** How many proxies in front of the app append to X-Forwarded-For (TEARLINE_TRUSTED_PROXY_HOPS, default 0: none). */
export function trustedProxyHops(): number {
  const n = Number(process.env.TEARLINE_TRUSTED_PROXY_HOPS ?? 0);
  return Number.isInteger(n) && n > 0 ? n : 0;
}

/** The socket address, or with N trusted proxies the N-th X-Forwarded-For entry from the right. */
export function clientAddress(headers: Headers, hops = trustedProxyHops()): string {
  const peer = headers.get(PEER_HEADER)?.trim() || "unknown";
  if (hops === 0) return peer;
  const chain = (headers.get("x-forwarded-for") ?? "")
    .split(",")
    .map((s) => s.trim())
    .filter(Boolean);
  return chain.length >= hops ? chain[chain.length - hops] : (chain[0] ?? peer);
}

/** Whether the browser reached us over HTTPS: the request URL, or a trusted proxy's X-Forwarded-Proto. */
export function servedOverHttps(url: string, headers: Headers, hops = trustedProxyHops()): boolean {
  if (url.startsWith("https:")) return true;
  return hops > 0 && (headers.get("x-forwarded-proto") ?? "").split(",")[0].trim() === "https";
}
