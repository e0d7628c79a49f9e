import { fileURLToPath } from "node:url";
import { defineConfig } from "vitest/config";

// One runner for every layer: unit (pure math), integration (real PostgreSQL and
// the real HTTP route) and browser tests (Debian's Chromium via playwright-core).
// scripts/test.sh sets up the services and the environment they read.
export default defineConfig({
  resolve: {
    alias: {
      "@": fileURLToPath(new URL(".", import.meta.url)),
      // `server-only` throws outside a React Server Components bundle; in tests
      // the same modules run in plain Node, where the guard has nothing to guard.
      "server-only": fileURLToPath(new URL("./tests/helpers/server-only-stub.ts", import.meta.url)),
    },
  },
  test: {
    include: ["tests/**/*.test.ts"],
    testTimeout: 60_000,
    hookTimeout: 120_000,
    pool: "forks",
    reporters: ["default"],
  },
});
