import { afterAll } from "vitest";
import { closeTestApps } from "./test-app.js";

// Vitest set-up file, run before each test file: the apps a file built are closed after it (on
// PostgreSQL their databases are dropped), so a run does not pile up connections and timers.
afterAll(closeTestApps);
