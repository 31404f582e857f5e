// Pure rules behind the hardened edges: which address counts, which requests pass, which links leave stored mail.
import { describe, expect, it } from "vitest";
import { clientAddress, servedOverHttps } from "../../../lib/security/client-address";
import { checkBodyType, checkOrigin } from "../../../lib/security/request-rules";
import { LINK_REMOVED, redactOneTimeLinks } from "../../../lib/mail/redact-links";
import { SIGN_IN_LIMITS, addressBlockedUntil } from "../../../lib/security/sign-in-rules";
import { contentSecurityPolicy } from "../../../lib/security/headers";

const h = (o: Record<string, string>) => new Headers(o);

describe("client address", () => {
  it("is the socket address, whatever X-Forwarded-For says, unless proxies are trusted", () => {
    const headers = h({ "x-tearline-peer": "10.0.0.5", "x-forwarded-for": "1.2.3.4, 10.0.0.9" });
    expect(clientAddress(headers, 0)).toBe("10.0.0.5");
    // One trusted proxy appends the client it saw: the right-most entry.
    expect(clientAddress(headers, 1)).toBe("10.0.0.9");
    expect(clientAddress(headers, 2)).toBe("1.2.3.4");
  });
  it("trusts X-Forwarded-Proto only behind a trusted proxy", () => {
    expect(servedOverHttps("http://x/", h({ "x-forwarded-proto": "https" }), 0)).toBe(false);
    expect(servedOverHttps("http://x/", h({ "x-forwarded-proto": "https" }), 1)).toBe(true);
    expect(servedOverHttps("https://x/", h({}), 0)).toBe(true);
  });
});

describe("state-changing API requests", () => {
  const ours = ["http://127.0.0.1:3000"];
  it("need our origin, except better-auth's own and reads", () => {
    expect(checkOrigin("POST", "/api/cases", null, ours)?.status).toBe(403);
    expect(checkOrigin("DELETE", "/api/cases/1", "https://evil.example", ours)?.status).toBe(403);
    expect(checkOrigin("POST", "/api/cases", ours[0], ours)).toBeNull();
    expect(checkOrigin("GET", "/api/cases", null, ours)).toBeNull();
    expect(checkOrigin("POST", "/api/auth/sign-in/email", null, ours)).toBeNull();
  });
  it("need the body type the route reads", () => {
    expect(checkBodyType("POST", "/api/cases", "text/plain", true)?.status).toBe(415);
    expect(checkBodyType("POST", "/api/cases", "application/json; charset=utf-8", true)).toBeNull();
    expect(checkBodyType("POST", "/api/cases/x/photos", "application/json", true)?.status).toBe(415);
    expect(checkBodyType("POST", "/api/cases/x/photos", "multipart/form-data; boundary=a", true)).toBeNull();
    expect(checkBodyType("POST", "/api/fleet", "text/csv", true)).toBeNull();
    expect(checkBodyType("POST", "/api/admin/outbox/retry", null, false)).toBeNull();
  });
});

describe("one-time links", () => {
  it("are removed from text and HTML, other links stay", () => {
    const text =
      "Open http://127.0.0.1:3000/invitation/abcDEF123_-xyz to join; reset: https://t.example/api/auth/reset-password/tok123?callbackURL=%2Freset. Case: https://t.example/cases/JB-1";
    const out = redactOneTimeLinks(text);
    expect(out).not.toMatch(/abcDEF123|tok123/);
    expect(out.split(LINK_REMOVED)).toHaveLength(3);
    expect(out).toContain("https://t.example/cases/JB-1");
    expect(redactOneTimeLinks('<a href="https://t.example/invitation/zzz">Join</a>')).toBe(`<a href="${LINK_REMOVED}">Join</a>`);
  });
});

describe("sign-in limits", () => {
  it("block an address only once its failures reach the limit inside the window", () => {
    const now = new Date("2026-03-01T10:00:30Z");
    const start = new Date("2026-03-01T10:00:00Z");
    expect(addressBlockedUntil({ failures: SIGN_IN_LIMITS.addressFailures - 1, windowStart: start, lockedUntil: null }, now)).toBeNull();
    expect(
      addressBlockedUntil({ failures: SIGN_IN_LIMITS.addressFailures, windowStart: start, lockedUntil: null }, now)?.toISOString(),
    ).toBe("2026-03-01T10:01:00.000Z");
    expect(addressBlockedUntil({ failures: 99, windowStart: new Date("2026-03-01T09:58:00Z"), lockedUntil: null }, now)).toBeNull();
  });
});

describe("content-security policy", () => {
  it("allows scripts only by nonce and forbids framing", () => {
    const csp = contentSecurityPolicy("abc");
    expect(csp).toContain("script-src 'self' 'nonce-abc' 'strict-dynamic'");
    expect(csp).not.toContain("unsafe-eval");
    expect(csp).toContain("frame-ancestors 'none'");
    expect(contentSecurityPolicy("abc", true)).toContain("'unsafe-eval'");
  });
});
