import tailwindcss from "@tailwindcss/vite";
import react from "@vitejs/plugin-react";
import { fileURLToPath } from "node:url";
import { defineConfig } from "vitest/config";

export default defineConfig({
  plugins: [react(), tailwindcss()],
  resolve: { alias: { "@": fileURLToPath(new URL("./src", import.meta.url)) } },
  server: {
    port: 5173,
    // The fonts live in the repository's top-level fonts/ folder.
    fs: { allow: ["../.."] },
    proxy: { "/api": { target: `http://localhost:${process.env.PORT ?? 3000}`, changeOrigin: false } },
  },
  // The manifest (dist/.vite/manifest.json, not served: express.static ignores dot folders)
  // lets bench/bundle-size.mjs tell the first load from the lazy route chunks.
  build: { outDir: "dist", sourcemap: true, manifest: true },
  test: {
    environment: "jsdom",
    // One jsdom per worker instead of one per file (setting it up took most of the run). Files share
    // that window, so stubbed globals are put back after every test; the setup file unmounts
    // after every test.
    isolate: false,
    unstubGlobals: true,
    include: ["src/**/*.test.{ts,tsx}"],
    setupFiles: ["src/test/setup.ts"],
    testTimeout: 30_000,
  },
});
