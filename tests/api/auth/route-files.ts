// Finds every API route file and the HTTP methods it exports, as "METHOD /api/path" keys.
import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";

export const API_DIR = path.resolve(import.meta.dirname, "../../../app/api");
const METHODS = ["GET", "POST", "PUT", "PATCH", "DELETE"];

function routeFiles(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const full = path.join(dir, e.name);
    if (e.isDirectory()) return routeFiles(full);
    return e.name === "route.ts" || e.name === "route.tsx" ? [full] : [];
  });
}

/** The methods a route module exports: `export const GET`, `export async function POST`, `export const { GET, POST }`. */
export function exportedMethods(source: string): string[] {
  const found = new Set<string>();
  for (const m of source.matchAll(/export\s+(?:const|let|async\s+function|function)\s+([A-Z]+)\b/g)) found.add(m[1]);
  for (const m of source.matchAll(/export\s+const\s*\{([^}]*)\}/g))
    for (const name of m[1].split(","))
      found.add(
        name
          .trim()
          .split(/\s*:\s*/)
          .pop()!,
      );
  for (const m of source.matchAll(/export\s*\{([^}]*)\}/g))
    for (const name of m[1].split(","))
      found.add(
        name
          .trim()
          .split(/\s+as\s+/)
          .pop()!,
      );
  return [...found].filter((n) => METHODS.includes(n));
}

/** "GET /api/cases/[id]" for every method of every route file under app/api. */
export function routeKeys(): string[] {
  return routeFiles(API_DIR).flatMap((file) => {
    const route = "/api/" + path.relative(API_DIR, path.dirname(file)).split(path.sep).join("/");
    return exportedMethods(readFileSync(file, "utf8")).map((method) => `${method} ${route}`);
  });
}

export const APP_DIR = path.resolve(import.meta.dirname, "../../../app");

function pageFiles(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const full = path.join(dir, e.name);
    if (e.isDirectory()) return e.name === "api" && dir === APP_DIR ? [] : pageFiles(full);
    return e.name === "page.tsx" || e.name === "page.ts" ? [full] : [];
  });
}

/** "/cases/[number]" for every page.tsx under app/ (route groups such as "(app)" are not part of the URL). */
export function pagePatterns(): string[] {
  return pageFiles(APP_DIR).map((file) => {
    const parts = path
      .relative(APP_DIR, path.dirname(file))
      .split(path.sep)
      .filter((p) => p && !/^\(.*\)$/.test(p));
    return "/" + parts.join("/");
  });
}
