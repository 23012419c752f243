import { defineConfig } from "vitest/config";

export default defineConfig({
  test: {
    include: ["reference/**/*.test.ts", "api/**/*.test.ts", "multi-instance/**/*.test.ts"],
    testTimeout: 120_000,
    hookTimeout: 120_000,
    // The reference suites are pure reads of committed fixtures and the one API suite builds its own
    // app and database, so the files share a module graph per worker. The two-instance test runs
    // its servers, database and proxy as child processes of its own.
    isolate: false,
  },
});
