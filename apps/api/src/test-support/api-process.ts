import { spawn, type ChildProcess } from "node:child_process";
import http from "node:http";
import net from "node:net";
import path from "node:path";
import { fileURLToPath } from "node:url";

const apiRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../..");

/** A port nobody holds right now: the OS picks one for port 0, and we hand it back. */
async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const s = net.createServer();
    s.once("error", reject);
    s.listen(0, "127.0.0.1", () => {
      const { port } = s.address() as net.AddressInfo;
      s.close(() => resolve(port));
    });
  });
}

/** GET /api/health on a connection of its own, so no kept-alive socket outlives a killed server. */
function healthStatus(url: string): Promise<number> {
  return new Promise((resolve, reject) => {
    http
      .get(`${url}/api/health`, { agent: false }, (res) => {
        res.resume();
        res.on("end", () => resolve(res.statusCode ?? 0));
      })
      .on("error", reject);
  });
}

export interface ApiProcess {
  url: string;
  child: ChildProcess;
  /** SIGKILL: no shutdown handler runs, as in a power cut or an OOM kill. Resolves once the process is gone. */
  kill(): Promise<void>;
  /** What the process wrote, for failure messages. */
  output(): string;
}

/**
 * Starts the real server from its TypeScript sources (tsx, so no build is needed) on a given
 * database file or PostgreSQL URL, and resolves once /api/health answers. The environment is given in full rather
 * than inherited, so the developer's own settings cannot leak in; `extraEnv` adds settings a test needs.
 */
export async function startApi(
  databasePath: string,
  timeoutMs = 60_000,
  extraEnv: Record<string, string> = {},
): Promise<ApiProcess> {
  const port = await freePort();
  const child = spawn(process.execPath, ["--import", "tsx", "src/server.ts"], {
    cwd: apiRoot,
    env: {
      NODE_ENV: "test",
      PORT: String(port),
      ...(/^postgres(ql)?:\/\//.test(databasePath)
        ? { DATABASE_URL: databasePath }
        : { DATABASE_PATH: databasePath }),
      WAYMARK_DEMO: "1",
      BCRYPT_COST: "4",
      ...extraEnv,
    },
    stdio: ["ignore", "pipe", "pipe"],
  });
  let log = "";
  child.stdout!.on("data", (b: Buffer) => (log += b.toString()));
  child.stderr!.on("data", (b: Buffer) => (log += b.toString()));
  const exited = new Promise<void>((resolve) => {
    if (child.exitCode !== null || child.signalCode !== null) resolve();
    else child.once("exit", () => resolve());
  });
  const url = `http://127.0.0.1:${port}`;
  const api: ApiProcess = {
    url,
    child,
    output: () => log,
    async kill() {
      if (child.exitCode === null && child.signalCode === null) child.kill("SIGKILL");
      await exited;
    },
  };
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`The API exited during start-up:\n${log}`);
    try {
      if ((await healthStatus(url)) === 200) return api;
    } catch {
      // Not listening yet.
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  await api.kill();
  throw new Error(`The API did not answer /api/health within ${timeoutMs} ms:\n${log}`);
}
