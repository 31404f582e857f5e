import type { NextConfig } from "next";

const config: NextConfig = {
  // The test command builds into its own folder so it never disturbs a running demo.
  distDir: process.env.NEXT_DIST_DIR ?? ".next",
  serverExternalPackages: ["sharp", "pdfkit", "pg", "archiver", "nodemailer"],
  poweredByHeader: false,
  // Type checking runs once in the test suite (tests/unit/typecheck.test.ts), not in every build.
  typescript: { ignoreBuildErrors: true },
  typedRoutes: false,
  experimental: { serverActions: { bodySizeLimit: "30mb" } },
};

export default config;
