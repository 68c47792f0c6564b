import { defineConfig } from "vitest/config";

// Browser tests drive Debian's Chromium against the real server, database and mail fake, which
// the global setup starts on free loopback ports. One file at a time: they share that server.
export default defineConfig({
  test: {
    include: ["test/**/*.test.ts"],
    globalSetup: ["src/global-setup.ts"],
    fileParallelism: false,
    testTimeout: 60_000,
    hookTimeout: 120_000,
  },
});
