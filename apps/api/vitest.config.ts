import { defineConfig } from "vitest/config";

export default defineConfig({
  // Each file builds its own app on its own in-memory database (test-support/test-app.ts) and no
  // test mocks a module, so the files share one module graph per worker: importing the app once
  // per file cost about two minutes of a run.
  test: { include: ["src/**/*.test.ts"], testTimeout: 30_000, isolate: false },
});
