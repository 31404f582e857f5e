// Bundles the service worker (lib/offline/service-worker.ts, Serwist) into public/sw.js. next.config.ts calls it
// whenever Next builds or serves in development, so every `next build` ships a worker made from today's source.
import { buildSync } from "esbuild";
import path from "node:path";

export function buildServiceWorker(root: string, minify: boolean) {
  buildSync({
    entryPoints: [path.join(root, "lib/offline/service-worker.ts")],
    outfile: path.join(root, "public/sw.js"),
    bundle: true,
    format: "iife",
    target: "es2020",
    minify,
    legalComments: "none",
    logLevel: "warning",
  });
}
