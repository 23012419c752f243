import os from "node:os";
import { Piscina } from "piscina";
import { HttpError } from "../http/errors.js";
import * as tasks from "./tasks.js";

type Tasks = typeof tasks;
type TaskName = "analyzeTask" | "previewTask" | "extractTask";

/**
 * Runs the heavy tasks off the request thread, so a large upload or analysis does not stall
 * other requests. From compiled code the tasks go to a worker pool; from TypeScript sources
 * (tests, tsx) they run in-process, because workers cannot load .ts files by themselves.
 */
const compiled = import.meta.url.endsWith(".js");
let pool: Piscina | null = null;

function getPool(): Piscina {
  pool ??= new Piscina({
    filename: new URL("./worker.js", import.meta.url).href,
    maxThreads: Math.max(1, Math.min(4, os.availableParallelism() - 1)),
    idleTimeout: 60_000,
  });
  return pool;
}

export async function runTask<N extends TaskName>(
  name: N,
  input: Parameters<Tasks[N]>[0],
): Promise<Exclude<Awaited<ReturnType<Tasks[N]>>, tasks.TaskError>> {
  const out = (
    compiled ? await getPool().run(input, { name }) : await (tasks[name] as (i: unknown) => unknown)(input)
  ) as Awaited<ReturnType<Tasks[N]>>;
  if (out && typeof out === "object" && "error" in out) {
    const e = (out as tasks.TaskError).error;
    throw new HttpError(e.status, e.code, e.message, e.details);
  }
  return out as Exclude<Awaited<ReturnType<Tasks[N]>>, tasks.TaskError>;
}

export async function closeTaskPool(): Promise<void> {
  await pool?.destroy();
  pool = null;
}
