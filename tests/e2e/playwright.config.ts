import os from "node:os";
import path from "node:path";
import { defineConfig } from "@playwright/test";

/** Debian's chromium; Playwright's own browser download cannot work on this network. */
const CHROMIUM = process.env.CHROMIUM_PATH ?? "/usr/bin/chromium";
const PORT = Number(process.env.E2E_PORT ?? 3100);
const dbPath = path.join(os.tmpdir(), `waymark-e2e-${process.pid}.sqlite`);

export default defineConfig({
  testDir: ".",
  testMatch: "**/*.spec.ts",
  outputDir: "../test-results/e2e",
  timeout: 60_000,
  workers: 1,
  // A 2-core CI machine under load renders slower than a laptop.
  expect: { timeout: 10_000 },
  reporter: [["list"]],
  use: {
    baseURL: `http://localhost:${PORT}`,
    launchOptions: {
      executablePath: CHROMIUM,
      args: [
        "--no-sandbox",
        "--disable-gpu",
        "--disable-quic",
        "--no-first-run",
        "--disable-background-networking",
        "--disable-component-update",
        "--disable-sync",
      ],
    },
    headless: true,
    trace: "retain-on-failure",
  },
  webServer: {
    command: "node ../apps/api/dist/server.js",
    cwd: "..",
    url: `http://localhost:${PORT}/api/health`,
    reuseExistingServer: false,
    timeout: 60_000,
    env: {
      PORT: String(PORT),
      DATABASE_PATH: dbPath,
      WAYMARK_DEMO: "1",
      NODE_ENV: "production",
      BCRYPT_COST: "8",
    },
  },
});
