import { defineConfig } from "vitest/config";

export default defineConfig({
  // Some tests run on millions of values; a loaded 2-core machine needs more than the 5 s default.
  test: { include: ["src/**/*.test.ts"], testTimeout: 60_000 },
});
