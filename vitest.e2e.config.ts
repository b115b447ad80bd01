import { defineConfig } from "vitest/config";

// End-to-end tests: Playwright (playwright-core) driving Debian's chromium against the
// production build that scripts/test.sh serves on BASE_URL.
export default defineConfig({
  resolve: { tsconfigPaths: true },
  test: {
    environment: "node",
    include: ["tests/e2e/**/*.test.ts"],
    testTimeout: 60_000,
    hookTimeout: 60_000,
    fileParallelism: false,
  },
});
