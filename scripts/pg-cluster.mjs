// A throwaway PostgreSQL cluster for tests and benchmarks: initdb in a temporary folder owned by
// the `postgres` user, started on a free port on 127.0.0.1, stopped (and the folder removed) at the
// end. Uses Debian's `postgresql` package (scripts/ensure-system-deps.sh --postgres installs it).
//
//   import { startCluster } from "../../scripts/pg-cluster.mjs";
//   const pg = await startCluster();  // { url, port, dir, stop }
//
// From a shell: `node scripts/pg-cluster.mjs start` prints DATABASE_URL and the folder;
// `node scripts/pg-cluster.mjs stop DIR` stops it.
import { execFileSync } from "node:child_process";
import fs from "node:fs";
import net from "node:net";
import os from "node:os";
import path from "node:path";
import { fileURLToPath } from "node:url";

/** The newest installed server's bin folder, e.g. /usr/lib/postgresql/15/bin. */
export function postgresBin() {
  const root = "/usr/lib/postgresql";
  const versions = fs.existsSync(root)
    ? fs
        .readdirSync(root)
        .filter((v) => fs.existsSync(path.join(root, v, "bin", "initdb")))
        .sort((a, b) => Number(b) - Number(a))
    : [];
  if (versions.length === 0)
    throw new Error("PostgreSQL server not found under /usr/lib/postgresql: apt-get install -y postgresql");
  return path.join(root, versions[0], "bin");
}

async function freePort() {
  return new Promise((resolve, reject) => {
    const s = net.createServer();
    s.unref();
    s.on("error", reject);
    s.listen(0, "127.0.0.1", () => {
      const { port } = s.address();
      s.close(() => resolve(port));
    });
  });
}

/** Runs a command as the `postgres` user when we are root (initdb refuses to run as root). */
function asPostgres(cmd, args) {
  if (process.getuid?.() === 0) {
    const line = [cmd, ...args].map((a) => `'${String(a).replace(/'/g, `'\\''`)}'`).join(" ");
    return execFileSync("su", ["postgres", "-s", "/bin/sh", "-c", line], { stdio: "pipe" });
  }
  return execFileSync(cmd, args, { stdio: "pipe" });
}

export async function startCluster({ port } = {}) {
  const bin = postgresBin();
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), "waymark-pg-"));
  fs.chmodSync(dir, 0o700);
  if (process.getuid?.() === 0) execFileSync("chown", ["postgres:postgres", dir]);
  const p = port ?? (await freePort());
  asPostgres(path.join(bin, "initdb"), [
    "-D",
    dir,
    "-A",
    "trust",
    "-U",
    "postgres",
    "-E",
    "UTF8",
    "--no-locale",
  ]);
  asPostgres(path.join(bin, "pg_ctl"), [
    "-D",
    dir,
    "-l",
    path.join(dir, "server.log"),
    "-o",
    `-p ${p} -k ${dir} -c listen_addresses=127.0.0.1 -c max_connections=300 -c fsync=off -c full_page_writes=off`,
    "-w",
    "start",
  ]);
  const url = `postgres://postgres@127.0.0.1:${p}/postgres`;
  let stopped = false;
  const stop = () => {
    if (stopped) return;
    stopped = true;
    stopCluster(dir);
  };
  return { url, port: p, dir, stop };
}

export function stopCluster(dir) {
  try {
    asPostgres(path.join(postgresBin(), "pg_ctl"), ["-D", dir, "-m", "fast", "-w", "stop"]);
  } finally {
    fs.rmSync(dir, { recursive: true, force: true });
  }
}

if (process.argv[1] && fileURLToPath(import.meta.url) === path.resolve(process.argv[1])) {
  const [cmd, dir] = process.argv.slice(2);
  if (cmd === "start") {
    const c = await startCluster();
    console.log(`DATABASE_URL=${c.url}\nPGCLUSTER_DIR=${c.dir}`);
  } else if (cmd === "stop" && dir) {
    stopCluster(dir);
  } else {
    console.error("usage: node scripts/pg-cluster.mjs start | stop DIR");
    process.exit(2);
  }
}
