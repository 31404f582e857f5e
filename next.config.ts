import type { NextConfig } from "next";

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

export default config;
