// The browser's one API helper: how refusals are read, and that a silent server ends in a message.
// The timeout cases talk to a real local HTTP server that never answers (no mocked fetch).
import { createServer, type Server } from "node:http";
import type { AddressInfo } from "node:net";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import {
  callApi,
  clientTimeoutMs,
  CLIENT_TIMEOUT_MS,
  problemFrom,
  noAnswerProblem,
  stripPrefixes,
  TIMEOUT_MESSAGE,
  OFFLINE_MESSAGE,
  CANCELLED_MESSAGE,
} from "@/lib/client/api";

describe("problemFrom reads every error shape the server sends (lib/http/handler.ts errorResponse)", () => {
  it("a zod refusal: message and field problems, prefixes removed when asked", () => {
    const p = problemFrom(
      400,
      {
        error: "Pick the site (and 1 more to fix)",
        code: "bad-request",
        fields: { "data.site": "Pick the site", "finding.zone": "Pick a zone" },
      },
      { fieldPrefixes: ["data", "finding"] },
    );
    expect(p).toMatchObject({ status: 400, code: "bad-request", message: "Pick the site (and 1 more to fix)", conflict: false });
    expect(p.fields).toEqual({ site: "Pick the site", zone: "Pick a zone" });
  });

  it("keeps field keys as sent when no prefix is named", () => {
    expect(problemFrom(400, { error: "x", fields: { "data.site": "Pick" } }).fields).toEqual({ "data.site": "Pick" });
  });

  it("an HttpError with fields in details", () => {
    const p = problemFrom(400, { error: "That code is taken.", code: "bad-request", details: { fields: { code: "Already used" } } });
    expect(p.fields).toEqual({ code: "Already used" });
    expect(p.message).toBe("That code is taken.");
  });

  it("a stale save (409): conflict, the server's words and the facts in details", () => {
    const details = { currentVersion: 4, updatedBy: "Ana Ruiz", updatedAt: "2026-01-01T10:00:00Z", current: { site: "x" } };
    const p = problemFrom(409, { error: "Ana Ruiz saved this case at 10:00 UTC while you were editing.", code: "conflict", details });
    expect(p.conflict).toBe(true);
    expect(p.code).toBe("conflict");
    expect(p.details).toEqual(details);
    expect(p.message).toMatch(/^Ana Ruiz saved/);
  });

  it("a route's own keys stay readable in body (fleet rows)", () => {
    const rows = [{ row: 3, column: "mounted_on", message: "Not a date" }];
    const p = problemFrom(400, { error: "The fleet list has 1 problem; nothing was stored.", code: "invalid-rows", rows, errorCount: 1 });
    expect(p.body.rows).toEqual(rows);
    expect(p.code).toBe("invalid-rows");
  });

  it("an answer that is not JSON, or has no message, falls back to the caller's words, then to plain ones", () => {
    expect(problemFrom(502, null, { fallback: "Photos could not be loaded." }).message).toBe("Photos could not be loaded.");
    expect(problemFrom(502, "<html>").message).toMatch(/error 502/);
    expect(problemFrom(401, {}).message).toMatch(/Sign in again/);
    expect(problemFrom(409, {}).conflict).toBe(true);
    expect(problemFrom(400, { error: "   " }).message).toMatch(/refused/);
  });

  it("ignores field values that are not strings", () => {
    expect(problemFrom(400, { fields: { a: "ok", b: 3, c: null } }).fields).toEqual({ a: "ok" });
  });

  it("stripPrefixes keeps the first message when two keys meet", () => {
    expect(stripPrefixes({ "data.site": "one", site: "two" }, ["data"])).toEqual({ site: "one" });
  });

  it("no answer at all: status 0 and a plain message", () => {
    expect(noAnswerProblem("timeout")).toMatchObject({ status: 0, code: "timeout", message: TIMEOUT_MESSAGE });
    expect(noAnswerProblem("offline").message).toBe(OFFLINE_MESSAGE);
    expect(noAnswerProblem("cancelled").message).toBe(CANCELLED_MESSAGE);
  });
});

describe("callApi against a real HTTP server", () => {
  let server: Server;
  let base = "";
  const seen: { method?: string; type?: string; body: string }[] = [];
  beforeAll(async () => {
    server = createServer((req, res) => {
      let body = "";
      req.on("data", (c) => (body += c));
      req.on("end", () => {
        seen.push({ method: req.method, type: req.headers["content-type"], body });
        if (req.url === "/silent") return; // never answers
        if (req.url === "/refuse") {
          res.writeHead(400, { "content-type": "application/json" });
          return res.end(JSON.stringify({ error: "Pick the site", code: "bad-request", fields: { "data.site": "Pick the site" } }));
        }
        res.writeHead(200, { "content-type": "application/json" });
        res.end(JSON.stringify({ echo: body }));
      });
    });
    await new Promise<void>((r) => server.listen(0, "127.0.0.1", r));
    base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  });
  afterAll(async () => {
    server.closeAllConnections();
    await new Promise((r) => server.close(r));
  });

  it("sends JSON with its content type and returns the data", async () => {
    const r = await callApi<{ echo: string }>("PATCH", `${base}/ok`, { json: { a: 1 } });
    expect(r).toEqual({ ok: true, status: 200, data: { echo: '{"a":1}' } });
    expect(seen.at(-1)).toMatchObject({ method: "PATCH", type: "application/json" });
  });

  it("sends a form as multipart", async () => {
    const form = new FormData();
    form.set("file", new Blob(["unit,months\n"], { type: "text/csv" }), "fleet.csv");
    const r = await callApi("POST", `${base}/ok`, { form });
    expect(r.ok).toBe(true);
    expect(seen.at(-1)?.type).toMatch(/^multipart\/form-data; boundary=/);
  });

  it("reads a refusal into fields and message", async () => {
    const r = await callApi("POST", `${base}/refuse`, { json: {}, fieldPrefixes: ["data"] });
    expect(r).toMatchObject({ ok: false, status: 400, message: "Pick the site", fields: { site: "Pick the site" } });
  });

  it("gives up on a silent server after the time limit with the timeout message", async () => {
    const started = Date.now();
    const r = await callApi("GET", `${base}/silent`, { timeoutMs: 150 });
    expect(r).toMatchObject({ ok: false, status: 0, code: "timeout", message: TIMEOUT_MESSAGE });
    expect(Date.now() - started).toBeLessThan(5_000); // arithmetic: 150 ms limit, generous margin for a loaded machine
  });

  it("without a limit of its own a call uses the page's limit when one is set, else 20 s", async () => {
    const g = globalThis as { tearlineClientTimeoutMs?: unknown };
    expect(clientTimeoutMs()).toBe(CLIENT_TIMEOUT_MS);
    for (const bad of [0, -5, Number.NaN, "100"]) {
      g.tearlineClientTimeoutMs = bad;
      expect(clientTimeoutMs()).toBe(CLIENT_TIMEOUT_MS);
    }
    g.tearlineClientTimeoutMs = 150;
    try {
      expect(await callApi("GET", `${base}/silent`)).toMatchObject({ ok: false, status: 0, code: "timeout", message: TIMEOUT_MESSAGE });
    } finally {
      delete g.tearlineClientTimeoutMs;
    }
  });

  it("a caller's cancel is not reported as a timeout", async () => {
    const c = new AbortController();
    const pending = callApi("GET", `${base}/silent`, { timeoutMs: 10_000, signal: c.signal });
    setTimeout(() => c.abort(), 50);
    expect(await pending).toMatchObject({ ok: false, status: 0, code: "cancelled" });
  });

  it("a refused connection reads as offline", async () => {
    const closed = createServer();
    await new Promise<void>((r) => closed.listen(0, "127.0.0.1", r));
    const port = (closed.address() as AddressInfo).port;
    await new Promise((r) => closed.close(r));
    expect(await callApi("GET", `http://127.0.0.1:${port}/x`)).toMatchObject({
      ok: false,
      status: 0,
      code: "offline",
      message: OFFLINE_MESSAGE,
    });
  });
});
