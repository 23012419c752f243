import { defineConfig } from "vitest/config";

export default defineConfig({
  // Some tests run on millions of values; a loaded 2-core machine needs more than the 5 s default.
  // The engine is pure (no module state, no mocks), so the files share one module graph per
  // worker instead of importing it again per file (19 s → 4 s measured).
  test: { include: ["src/**/*.test.ts"], testTimeout: 60_000, isolate: false },
});
