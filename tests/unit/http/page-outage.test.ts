// Which requests get the "cannot be reached" page during a database outage, and where its retry link may lead.
import { describe, expect, it } from "vitest";
import { UNAVAILABLE_PATH, isPageRequest, retryPath } from "@/lib/http/page-outage";

describe("isPageRequest", () => {
  it("covers page navigations, with or without a query", () => {
    for (const p of ["/", "/cases", "/cases/TL-26-00042", "/sign-in", "/tallies/life", UNAVAILABLE_PATH]) {
      expect(isPageRequest("GET", p), p).toBe(true);
      expect(isPageRequest("HEAD", p), p).toBe(true);
    }
  });
  it("leaves the API (which answers its own 503), built files, public files and writes alone", () => {
    for (const p of ["/api/cases", "/api", "/_next/static/chunks/app.js", "/sw.js", "/favicon.ico", "/manifest.webmanifest"])
      expect(isPageRequest("GET", p), p).toBe(false);
    for (const m of ["POST", "PATCH", "PUT", "DELETE", "OPTIONS"]) expect(isPageRequest(m, "/cases"), m).toBe(false);
  });
});

describe("retryPath", () => {
  it("keeps a path on this site with its query", () => {
    expect(retryPath("/cases?stage=bench&page=2")).toBe("/cases?stage=bench&page=2");
    expect(retryPath("/sign-in")).toBe("/sign-in");
  });
  it("sends anything else home: missing, another host, a scheme, the outage page itself, overlong", () => {
    for (const v of [
      null,
      undefined,
      "",
      "cases",
      "//evil.example/x",
      "/\\evil.example",
      "https://evil.example/",
      "javascript:alert(1)",
      UNAVAILABLE_PATH,
      `${UNAVAILABLE_PATH}?x=1`,
      "/" + "a".repeat(2001),
    ]) {
      expect(retryPath(v), String(v)).toBe("/");
    }
  });
});
