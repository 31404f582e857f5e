import type { NextConfig } from "next";

const config: NextConfig = {
  // The test command builds into its own folder so it never disturbs a running demo.
  distDir: process.env.NEXT_DIST_DIR ?? ".next",
  serverExternalPackages: ["sharp", "pdfkit", "pg", "archiver", "nodemailer"],
  poweredByHeader: false,
  typedRoutes: false,
  experimental: { serverActions: { bodySizeLimit: "30mb" } },
};

export default config;
