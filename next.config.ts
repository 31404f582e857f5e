import type { NextConfig } from "next";
import { PHASE_DEVELOPMENT_SERVER, PHASE_PRODUCTION_BUILD } from "next/constants";
import { buildServiceWorker } from "./lib/offline/build-worker";

const config: NextConfig = {
  // The test command builds into its own folder so it never disturbs a running demo.
  distDir: process.env.NEXT_DIST_DIR ?? ".next",
  serverExternalPackages: ["sharp", "pdfkit", "pg", "pg-boss", "archiver", "nodemailer"],
  poweredByHeader: false,
  // Type checking runs once in the test suite (tests/unit/typecheck.test.ts), not in every build.
  typescript: { ignoreBuildErrors: true },
  typedRoutes: false,
  // proxy.ts makes Next buffer request bodies, silently cut at this size; it must stay above every cap of our own
  // (photo 25 MB + form, fleet list 20 MB, lib/http/body.ts), which refuse with 413 before it matters.
  experimental: { serverActions: { bodySizeLimit: "30mb" }, proxyClientMaxBodySize: "40mb" },
};

export default function nextConfig(phase: string): NextConfig {
  // The offline worker is built beside the app, so a build never ships a worker from older source.
  if (phase === PHASE_PRODUCTION_BUILD || phase === PHASE_DEVELOPMENT_SERVER)
    buildServiceWorker(process.cwd(), phase === PHASE_PRODUCTION_BUILD);
  return config;
}
