// Starts the built API (apps/api/dist/server.js) for a benchmark: a free loopback port, a
// fresh SQLite file in a temporary folder, demo mode (4 demo accounts, 3 demo studies with
// stored analyses) and NODE_ENV=production. Builds the API first when dist is missing.
// Used by apps/api/bench/load.mjs and apps/web/bench/bundle-size.mjs.
import { execFileSync, spawn } from "node:child_process";
import { copyFileSync, existsSync, mkdirSync, mkdtempSync, openSync, readFileSync, rmSync } from "node:fs";
import net from "node:net";
import { tmpdir } from "node:os";
import path from "node:path";
import { fileURLToPath } from "node:url";

const here = path.dirname(fileURLToPath(import.meta.url));
export const repoRoot = path.resolve(here, "../../..");
const serverJs = path.join(repoRoot, "apps", "api", "dist", "server.js");

export const DEMO_PASSWORD = "trailhead-demo";
export const DEMO_ANALYST = "analyst@waymark.test";

/** A port the kernel says is free on 127.0.0.1 right now. */
export function freePort() {
  return new Promise((resolve, reject) => {
    const srv = net.createServer();
    srv.unref();
    srv.on("error", reject);
    srv.listen(0, "127.0.0.1", () => {
      const { port } = srv.address();
      srv.close(() => resolve(port));
    });
  });
}

/**
 * Starts the API and waits until /api/health answers (at most `timeoutMs`).
 * Returns { baseUrl, port, stop() }; stop({ keepLogAs }) sends SIGTERM, waits for the exit,
 * copies the server's log to `keepLogAs` when given, and removes the temporary folder.
 */
export async function startApi({ timeoutMs = 60_000, extraEnv = {}, nodeArgs = [] } = {}) {
  if (!existsSync(serverJs)) {
    console.log("apps/api/dist/server.js is missing: building @waymark/api …");
    execFileSync("npm", ["run", "build", "-w", "@waymark/api"], { cwd: repoRoot, stdio: "inherit" });
  }
  const port = await freePort();
  const dir = mkdtempSync(path.join(tmpdir(), "waymark-bench-"));
  const logFile = path.join(dir, "server.log");
  const log = openSync(logFile, "a");
  const child = spawn(process.execPath, [...nodeArgs, serverJs], {
    cwd: repoRoot,
    env: {
      ...process.env,
      ...extraEnv,
      PORT: String(port),
      DATABASE_PATH: path.join(dir, "waymark.sqlite"),
      WAYMARK_DEMO: "1",
      NODE_ENV: "production",
    },
    stdio: ["ignore", log, log],
  });
  const exited = new Promise((resolve) => child.once("exit", (code, signal) => resolve({ code, signal })));
  const baseUrl = `http://127.0.0.1:${port}`;

  let stopped = false;
  const stop = async ({ keepLogAs } = {}) => {
    if (stopped) return;
    stopped = true;
    if (child.exitCode === null && child.signalCode === null) child.kill("SIGTERM");
    const timer = setTimeout(() => child.kill("SIGKILL"), 10_000);
    await exited;
    clearTimeout(timer);
    if (keepLogAs) {
      mkdirSync(path.dirname(keepLogAs), { recursive: true });
      copyFileSync(logFile, keepLogAs);
    }
    rmSync(dir, { recursive: true, force: true });
  };

  const deadline = Date.now() + timeoutMs;
  let early = null;
  void exited.then((r) => (early = r));
  for (;;) {
    if (early) {
      const text = readFileSync(logFile, "utf8");
      rmSync(dir, { recursive: true, force: true });
      throw new Error(`The API exited during start-up (${JSON.stringify(early)}):\n${text}`);
    }
    try {
      const res = await fetch(`${baseUrl}/api/health`);
      if (res.ok) break;
    } catch {
      // not listening yet
    }
    if (Date.now() > deadline) {
      await stop();
      throw new Error(`The API did not answer /api/health within ${timeoutMs} ms`);
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  return { baseUrl, port, stop, logFile, pid: child.pid };
}

/** The `name=value` pairs of a response's Set-Cookie headers, merged over `jar`. */
function mergeCookies(jar, res) {
  const next = new Map(jar);
  for (const line of res.headers.getSetCookie()) {
    const [pair] = line.split(";");
    const eq = pair.indexOf("=");
    next.set(pair.slice(0, eq).trim(), pair.slice(eq + 1).trim());
  }
  return next;
}

const cookieHeader = (jar) => [...jar].map(([k, v]) => `${k}=${v}`).join("; ");

/**
 * Signs in as one user with its own session: GET /api/auth/csrf, then POST /api/auth/login
 * with the token. Returns { cookie, csrfToken } for later requests.
 */
export async function signIn(baseUrl, email, password = DEMO_PASSWORD) {
  const first = await fetch(`${baseUrl}/api/auth/csrf`);
  if (!first.ok) throw new Error(`GET /api/auth/csrf → ${first.status}`);
  let jar = mergeCookies(new Map(), first);
  let { token } = await first.json();
  const login = await fetch(`${baseUrl}/api/auth/login`, {
    method: "POST",
    headers: { "content-type": "application/json", "x-csrf-token": token, cookie: cookieHeader(jar) },
    body: JSON.stringify({ email, password }),
  });
  if (!login.ok) throw new Error(`POST /api/auth/login as ${email} → ${login.status}: ${await login.text()}`);
  jar = mergeCookies(jar, login);
  token = login.headers.get("x-csrf-token") ?? token;
  await login.arrayBuffer();
  return { cookie: cookieHeader(jar), csrfToken: token };
}
