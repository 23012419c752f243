import { defineConfig } from "vitest/config";

export default defineConfig({
  // Each file builds its own app on its own database (test-support/test-app.ts) and no test mocks
  // a module, so the files share one module graph per worker: importing the app once per file
  // cost about two minutes of a run. WAYMARK_TEST_DB=postgres (npm run test:pg) runs the same
  // files on PostgreSQL: the global set-up starts a throwaway cluster.
  test: {
    include: ["src/**/*.test.ts"],
    testTimeout: 30_000,
    hookTimeout: 60_000,
    isolate: false,
    globalSetup: ["src/test-support/pg-global-setup.ts"],
    setupFiles: ["src/test-support/close-apps.ts"],
  },
});
