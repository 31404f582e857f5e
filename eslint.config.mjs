// Lint rules: Next.js's own (core web vitals, TypeScript), import cycles, the layer map of
// DEVELOPERS.md as import boundaries, and Drizzle's guard against UPDATE or DELETE without WHERE.
import { defineConfig, globalIgnores } from "eslint/config";
import nextVitals from "eslint-config-next/core-web-vitals";
import nextTs from "eslint-config-next/typescript";
import drizzle from "eslint-plugin-drizzle";

// The layer map (DEVELOPERS.md, "Layers"): pure rules, services, db/, routes and components.
// Pure rules: no database, no services, no framework. The services among them are left out by name.
const PURE = [
  "lib/field/**",
  "lib/stats/**",
  "lib/similarity/**",
  "lib/classification/**",
  "lib/damage-map/**",
  "lib/tallies/**",
  "lib/search/**",
  "lib/csv.ts",
  "lib/cases/access.ts",
  "lib/cases/bearing-classes.ts",
  "lib/cases/compute.ts",
  "lib/cases/safety-flag.ts",
  "lib/cases/signature-content.ts",
  "lib/cases/stages.ts",
  "lib/cases/workflow.ts",
];
const SERVICES_IN_PURE = ["lib/**/*-service.ts"];
const noDb = {
  group: ["@/db", "@/db/*", "@/db/**", "drizzle-orm", "drizzle-orm/*", "pg"],
  message: "Pure rules do not touch the database: take the rows as arguments.",
};
// Services and the server helpers they use: by name (*-service, service) and by folder. Of lib/auth
// only the permission table is pure.
const noServices = {
  group: [
    "server-only",
    "**/*-service",
    "**/service",
    "@/lib/auth/*",
    "!@/lib/auth/permissions",
    "@/lib/http/*",
    "@/lib/mail/*",
    "@/lib/mail/**",
    "@/lib/jobs/*",
    "@/lib/storage/*",
    "@/lib/digest/*",
    "@/lib/env",
    "@/lib/security/audit",
    "@/lib/security/sign-in-guard",
    "@/lib/notify/case-notices",
    "@/lib/photos/object-store",
    "@/lib/cases/diff",
    "@/lib/cases/history-view",
    "@/lib/cases/notices",
    "@/lib/cases/reference-rules",
    "@/lib/cases/step-write",
  ],
  message: "Pure rules call no services or server helpers: the service loads the rows and passes them in.",
};
// Routes and components reach data only through the services in lib/.
const noDbInUi = {
  group: ["@/db", "@/db/*", "@/db/**", "drizzle-orm", "drizzle-orm/*", "pg", "pg/*"],
  message: "Routes and components call a service in lib/ (which calls db/), never db/ or the driver.",
};
const noReact = { group: ["react", "react-dom", "next", "next/*"], message: "Pure rules do not import React or Next.js." };
const zodDirect = { name: "zod", message: "Import zod from @/lib/validation/zod (it sets the browser's no-eval mode)." };
const noHttp = {
  group: ["@/lib/http/*", "next/server"],
  message: "db/ returns rows or null and refuses with db/refusals.ts, never HTTP errors.",
};

export default defineConfig([
  ...nextVitals,
  ...nextTs,
  globalIgnores([
    ".next*/**",
    "node_modules/**",
    ".data/**",
    ".test-data*/**",
    ".bench-data/**",
    "next-env.d.ts",
    "public/sw.js",
    "storage-fake/**",
  ]),
  {
    plugins: { drizzle },
    rules: {
      "import/no-cycle": ["error", { maxDepth: 6, ignoreExternal: true }],
      "drizzle/enforce-delete-with-where": ["error", { drizzleObjectName: ["db", "tx"] }],
      "drizzle/enforce-update-with-where": ["error", { drizzleObjectName: ["db", "tx"] }],
      // These judge code for the React Compiler, which this app does not build with; refs read in
      // render, effects that sync state and Date.now in server components are deliberate here.
      "react-hooks/refs": "off",
      "react-hooks/set-state-in-effect": "off",
      "react-hooks/purity": "off",
      "react-hooks/incompatible-library": "off",
      "@typescript-eslint/no-unused-vars": [
        "error",
        { argsIgnorePattern: "^_", varsIgnorePattern: "^_", destructuredArrayIgnorePattern: "^_" },
      ],
    },
  },
  // zod comes through lib/validation/zod.ts, which keeps it from compiling with eval in the browser.
  {
    files: ["app/**", "components/**", "lib/**"],
    ignores: ["lib/validation/zod.ts"],
    rules: { "no-restricted-imports": ["error", { paths: [zodDirect] }] },
  },
  { files: ["app/**", "components/**"], rules: { "no-restricted-imports": ["error", { paths: [zodDirect], patterns: [noDbInUi] }] } },
  {
    files: PURE,
    ignores: SERVICES_IN_PURE,
    rules: { "no-restricted-imports": ["error", { paths: [zodDirect], patterns: [noDb, noReact, noServices] }] },
  },
  { files: ["db/**"], rules: { "no-restricted-imports": ["error", { patterns: [noHttp] }] } },
]);
