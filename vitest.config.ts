import { defineConfig } from "vitest/config";
import path from "node:path";

// Unit tests run alone; API and browser tests need the services that scripts/test.sh starts.
export default defineConfig({
  resolve: {
    alias: {
      "@": path.resolve(import.meta.dirname),
      "server-only": path.resolve(import.meta.dirname, "tests/support/empty.ts"),
    },
  },
  test: {
    include: ["tests/**/*.test.ts"],
    environment: "node",
    testTimeout: 30_000,
    hookTimeout: 120_000,
    fileParallelism: false,
    server: { deps: { inline: [] } },
  },
});
