// Two (or one) API processes from the compiled API on one throwaway PostgreSQL cluster, behind
// HAProxy with deploy/haproxy.cfg: the set-up shared by the two-instance test and the
// `bench:instances` benchmark. Needs `npm run build` (apps/api/dist) and Debian's postgresql and
// haproxy (scripts/ensure-system-deps.sh installs them).
import { execFileSync, spawn, type ChildProcess } from "node:child_process";
import fs from "node:fs";
import http from "node:http";
import net from "node:net";
import path from "node:path";
import { fileURLToPath, pathToFileURL } from "node:url";

export const repoRoot = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../..");
const serverJs = path.join(repoRoot, "apps", "api", "dist", "server.js");
export const PROXY_CONFIG = path.join(repoRoot, "deploy", "haproxy.cfg");
export const DEMO_PASSWORD = "trailhead-demo";
/** Shared by every instance: a session signed by one must verify on the other. */
export const SESSION_SECRET = "multi-instance-test-secret-0123456789";

export const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const s = net.createServer();
    s.unref();
    s.once("error", reject);
    s.listen(0, "127.0.0.1", () => {
      const { port } = s.address() as net.AddressInfo;
      s.close(() => resolve(port));
    });
  });
}

// ---------------------------------------------------------------------------------------------
// PostgreSQL

export interface Postgres {
  url: string;
  port: number;
  dir: string;
  stop(): void;
  /** Runs SQL through psql and returns the rows as arrays of text cells. */
  query(sql: string): string[][];
  /** The first cell of the first row as a number. */
  count(sql: string): number;
}

interface ClusterModule {
  startCluster(): Promise<{ url: string; port: number; dir: string; stop(): void }>;
  postgresBin(): string;
}

/** A throwaway cluster from scripts/pg-cluster.mjs (initdb in a temp folder, a free port on 127.0.0.1). */
export async function startPostgres(): Promise<Postgres> {
  // A plain-JS module shared with the API's own PostgreSQL suite; imported by URL so TypeScript
  // does not look for its declarations.
  const mod = (await import(
    pathToFileURL(path.join(repoRoot, "scripts", "pg-cluster.mjs")).href
  )) as ClusterModule;
  const cluster = await mod.startCluster();
  const psql = path.join(mod.postgresBin(), "psql");
  const query = (sql: string): string[][] => {
    const out = execFileSync(
      psql,
      ["-X", "-q", "-At", "-F", "\t", "-v", "ON_ERROR_STOP=1", "-d", cluster.url, "-c", sql],
      {
        encoding: "utf8",
        stdio: ["ignore", "pipe", "pipe"],
      },
    );
    return out
      .split("\n")
      .filter((l) => l.length > 0)
      .map((l) => l.split("\t"));
  };
  return {
    ...cluster,
    query,
    count: (sql) => Number(query(sql)[0]?.[0] ?? NaN),
  };
}

// ---------------------------------------------------------------------------------------------
// API instances

export interface Instance {
  name: string;
  port: number;
  url: string;
  child: ChildProcess;
  /** Resolves when the process has exited, with its code or signal. */
  exited: Promise<string>;
  kill(signal: NodeJS.Signals): Promise<string>;
  output(): string;
}

/** GET on a connection of its own (no kept-alive socket outlives a killed server); status, or 0 when refused. */
export function probe(url: string, timeoutMs = 5000): Promise<number> {
  return new Promise((resolve) => {
    const req = http.get(url, { agent: false, timeout: timeoutMs }, (res) => {
      res.resume();
      res.on("end", () => resolve(res.statusCode ?? 0));
    });
    req.on("timeout", () => req.destroy());
    req.on("error", () => resolve(0));
  });
}

export interface InstanceOptions {
  name: string;
  databaseUrl: string;
  publicUrl: string;
  /** Pins the process to these CPUs with taskset (benchmark), e.g. "1". */
  cpus?: string;
  env?: Record<string, string>;
  timeoutMs?: number;
}

/**
 * Starts `node apps/api/dist/server.js` in demo mode (demo accounts, the fake SMTP server that
 * files what it receives in the shared database) on DATABASE_URL, and resolves once its
 * readiness endpoint answers 200. The environment is given in full, so the developer's own
 * settings cannot leak in.
 */
export async function startInstance(o: InstanceOptions): Promise<Instance> {
  if (!fs.existsSync(serverJs)) throw new Error(`${serverJs} is missing: run \`npm run build\` first`);
  const port = await freePort();
  const env: Record<string, string> = {
    PATH: process.env.PATH ?? "/usr/bin:/bin",
    NODE_ENV: "production",
    WAYMARK_DEMO: "1",
    PORT: String(port),
    DATABASE_URL: o.databaseUrl,
    SESSION_SECRET,
    TRUST_PROXY: "1",
    PUBLIC_URL: o.publicUrl,
    BCRYPT_COST: "4",
    ...o.env,
  };
  const cmd = o.cpus ? "taskset" : process.execPath;
  const args = o.cpus ? ["-c", o.cpus, process.execPath, serverJs] : [serverJs];
  const child = spawn(cmd, args, { cwd: repoRoot, env, stdio: ["ignore", "pipe", "pipe"] });
  let log = "";
  child.stdout!.on("data", (b: Buffer) => (log += b.toString()));
  child.stderr!.on("data", (b: Buffer) => (log += b.toString()));
  const exited = new Promise<string>((resolve) =>
    child.once("exit", (code, signal) => resolve(signal ?? `exit ${code}`)),
  );
  const url = `http://127.0.0.1:${port}`;
  const inst: Instance = {
    name: o.name,
    port,
    url,
    child,
    exited,
    output: () => log,
    async kill(signal) {
      if (child.exitCode === null && child.signalCode === null) child.kill(signal);
      return exited;
    },
  };
  const deadline = Date.now() + (o.timeoutMs ?? 120_000);
  let done: string | null = null;
  void exited.then((r) => (done = r));
  while (Date.now() < deadline) {
    if (done) throw new Error(`API instance ${o.name} exited during start-up (${done}):\n${log}`);
    if ((await probe(`${url}/api/ready`)) === 200) return inst;
    await sleep(250);
  }
  await inst.kill("SIGKILL");
  throw new Error(`API instance ${o.name} was not ready within ${o.timeoutMs ?? 120_000} ms:\n${log}`);
}

// ---------------------------------------------------------------------------------------------
// The proxy

export interface Proxy {
  url: string;
  port: number;
  child: ChildProcess;
  stop(): Promise<void>;
  output(): string;
}

const haproxyBin = fs.existsSync("/usr/sbin/haproxy") ? "/usr/sbin/haproxy" : "haproxy";

/**
 * Runs HAProxy in the foreground with deploy/haproxy.cfg, its two server addresses filled in from
 * the environment (the same file the README shows). With `expectServers`, resolves once that
 * many distinct servers have answered through it (their health checks have passed).
 */
export async function startProxy(
  apiPorts: [number, number],
  {
    port,
    expectServers = 2,
    cpus,
    timeoutMs = 60_000,
  }: { port: number; expectServers?: number; cpus?: string; timeoutMs?: number },
): Promise<Proxy> {
  const env = {
    PATH: process.env.PATH ?? "/usr/bin:/bin",
    WAYMARK_PROXY_ADDR: `127.0.0.1:${port}`,
    WAYMARK_API1_ADDR: `127.0.0.1:${apiPorts[0]}`,
    WAYMARK_API2_ADDR: `127.0.0.1:${apiPorts[1]}`,
  };
  const cmd = cpus ? "taskset" : haproxyBin;
  const args = [...(cpus ? ["-c", cpus, haproxyBin] : []), "-f", PROXY_CONFIG, "-db"];
  const child = spawn(cmd, args, { env, stdio: ["ignore", "pipe", "pipe"] });
  let log = "";
  child.stdout!.on("data", (b: Buffer) => (log += b.toString()));
  child.stderr!.on("data", (b: Buffer) => (log += b.toString()));
  const exited = new Promise<void>((resolve) => child.once("exit", () => resolve()));
  const url = `http://127.0.0.1:${port}`;
  const proxy: Proxy = {
    url,
    port,
    child,
    output: () => log,
    async stop() {
      if (child.exitCode === null && child.signalCode === null) child.kill("SIGTERM");
      await exited;
    },
  };
  const deadline = Date.now() + timeoutMs;
  const seen = new Set<string>();
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`haproxy exited during start-up:\n${log}`);
    const server = await servedBy(`${url}/api/ready`);
    if (server) seen.add(server);
    if (seen.size >= expectServers) return proxy;
    await sleep(200);
  }
  await proxy.stop();
  throw new Error(
    `haproxy did not reach ${expectServers} ready servers within ${timeoutMs} ms (saw ${[...seen].join(", ") || "none"}):\n${log}`,
  );
}

/** Which server HAProxy sent a request to (the X-Served-By header of a 200), or null. */
function servedBy(url: string): Promise<string | null> {
  return new Promise((resolve) => {
    const req = http.get(url, { agent: false, timeout: 5000 }, (res) => {
      res.resume();
      res.on("end", () => {
        const h = res.headers["x-served-by"];
        resolve(res.statusCode === 200 && typeof h === "string" ? h : null);
      });
    });
    req.on("timeout", () => req.destroy());
    req.on("error", () => resolve(null));
  });
}
