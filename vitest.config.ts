import { defineConfig } from "vitest/config";

export default defineConfig({
  resolve: {
    tsconfigPaths: true,
    // The marker package throws outside React Server Components; tests run db code directly.
    alias: { "server-only": new URL("./tests/support/empty-module.ts", import.meta.url).pathname },
  },
  test: {
    environment: "node",
    include: ["tests/unit/**/*.test.ts", "tests/integration/**/*.test.ts"],
    testTimeout: 30_000,
    hookTimeout: 60_000,
    // Integration tests share one MariaDB database; run files one at a time.
    fileParallelism: false,
  },
});
