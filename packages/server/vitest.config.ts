import { defineConfig } from "vitest/config";

// Integration tests share one real PostgreSQL database (DATABASE_URL, set by `npm test`), so
// files run one after another; each file makes its own firms and users.
export default defineConfig({
  test: {
    include: ["src/**/*.test.ts", "test/**/*.test.ts"],
    globalSetup: ["test/global-setup.ts"],
    fileParallelism: false,
    testTimeout: 30_000,
    hookTimeout: 60_000,
  },
});
