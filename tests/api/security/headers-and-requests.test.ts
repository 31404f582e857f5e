// Security headers on every answer, the origin and body-type check, counted body limits and the terse health check.
import { describe, expect, it } from "vitest";
import { ApiClient, as } from "../../support/api";
import { APP_URL } from "../../support/env";
import { createCase } from "../../support/factories";

function chunked(bytes: number, type: string): RequestInit {
  const chunk = new Uint8Array(64 * 1024).fill(0x20);
  let sent = 0;
  const body = new ReadableStream<Uint8Array>({
    pull(controller) {
      if (sent >= bytes) return controller.close();
      sent += chunk.length;
      controller.enqueue(chunk);
    },
  });
  return { method: "POST", body, headers: { "content-type": type, origin: APP_URL }, duplex: "half" } as RequestInit;
}

describe("security headers", () => {
  it("a page carries a strict policy with a fresh nonce that its own scripts use", async () => {
    const [a, b] = [await fetch(`${APP_URL}/sign-in`), await fetch(`${APP_URL}/sign-in`)];
    const csp = a.headers.get("content-security-policy") ?? "";
    expect(csp).toMatch(/frame-ancestors 'none'/);
    expect(csp).toMatch(/object-src 'none'/);
    const nonce = /script-src [^;]*'nonce-([^']+)'/.exec(csp)?.[1];
    expect(nonce).toBeTruthy();
    expect(/'nonce-([^']+)'/.exec(b.headers.get("content-security-policy") ?? "")?.[1]).not.toBe(nonce);
    expect(csp).not.toMatch(/script-src[^;]*'unsafe-inline'/);
    const html = await a.text();
    const scripts = [...html.matchAll(/<script\b[^>]*>/g)].map((m) => m[0]);
    expect(scripts.length).toBeGreaterThan(0);
    for (const s of scripts) expect(s).toContain(`nonce="${nonce}"`);
    expect(a.headers.get("referrer-policy")).toBe("strict-origin-when-cross-origin");
    expect(a.headers.get("x-content-type-options")).toBe("nosniff");
    expect(a.headers.get("permissions-policy")).toMatch(/geolocation=\(\)/);
  });

  it("API answers carry them too; HSTS only over HTTPS, and a client's own X-Forwarded-Proto is not trusted", async () => {
    const res = await fetch(`${APP_URL}/api/health`, { headers: { "x-forwarded-proto": "https" } });
    expect(res.headers.get("content-security-policy")).toMatch(/frame-ancestors 'none'/);
    expect(res.headers.get("x-content-type-options")).toBe("nosniff");
    expect(res.headers.get("strict-transport-security")).toBeNull();
  });
});

describe("state-changing API requests", () => {
  it("are refused with 403 without our origin and with 415 without a JSON body type", async () => {
    const analyst = await as("analyst");
    const noOrigin = await fetch(`${APP_URL}/api/cases`, {
      method: "POST",
      headers: { cookie: analyst.cookie, "content-type": "application/json" },
      body: "{}",
    });
    expect(noOrigin.status).toBe(403);
    expect(((await noOrigin.json()) as { error: string }).error).toMatch(/did not come from a Tearline page/);
    const evil = await analyst.request("POST", "/api/cases", {}, { origin: "https://evil.example" });
    expect(evil.status).toBe(403);
    const form = await analyst.request("POST", "/api/cases", "a=1", { "content-type": "application/x-www-form-urlencoded" });
    expect(form.status).toBe(415);
    expect(((await form.json()) as { error: string }).error).toMatch(/application\/json/);
    const text = await analyst.request("PATCH", "/api/me/notices", "{}", { "content-type": "text/plain" });
    expect(text.status).toBe(415);
  });
});

describe("body limits, counted as the body arrives", () => {
  it("refuses a chunked JSON body past 1 MB with 413 and a clear message", async () => {
    const analyst = await as("analyst");
    const init = chunked(1024 * 1024 + 128 * 1024, "application/json");
    const res = await fetch(`${APP_URL}/api/cases`, {
      ...init,
      headers: { ...(init.headers as Record<string, string>), cookie: analyst.cookie },
    });
    expect(res.status).toBe(413);
    expect(((await res.json()) as { error: string }).error).toMatch(/larger than 1 MB.*nothing was changed/);
  });

  it("refuses a chunked fleet CSV past 20 MB with 413", async () => {
    const engineer = await as("engineer");
    const init = chunked(20 * 1024 * 1024 + 256 * 1024, "text/csv");
    const res = await fetch(`${APP_URL}/api/fleet`, {
      ...init,
      headers: { ...(init.headers as Record<string, string>), cookie: engineer.cookie },
    });
    expect(res.status).toBe(413);
    expect(((await res.json()) as { error: string }).error).toMatch(/fleet list is larger than 20 MB/);
  });

  it("refuses a chunked photo upload past the photo limit with 413", async () => {
    const analyst = await as("analyst");
    const c = await createCase({});
    const init = chunked(25 * 1024 * 1024 + 256 * 1024, "multipart/form-data; boundary=x");
    const res = await fetch(`${APP_URL}/api/cases/${c.id}/photos`, {
      ...init,
      headers: { ...(init.headers as Record<string, string>), cookie: analyst.cookie },
    });
    expect(res.status).toBe(413);
    expect(((await res.json()) as { error: string }).error).toMatch(/photo is larger than/i);
  });
});

describe("health", () => {
  it("answers the public only ok or not ok", async () => {
    const res = await new ApiClient().json("GET", "/api/health");
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ ok: true });
  });
});
