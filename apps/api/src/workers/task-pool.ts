import os from "node:os";
import { Piscina } from "piscina";
import { HttpError } from "../http/errors.js";
import * as tasks from "./tasks.js";

type Tasks = typeof tasks;
type TaskName = "analyzeTask" | "previewTask" | "extractTask";

/** Time and memory one task may take before its worker is ended (and the pool starts a new one). */
export interface TaskLimits {
  timeoutMs: number;
  memoryMb: number;
  /** Threads per pool; unset, the pool sizes itself to the machine. */
  threads?: number;
}

let limits: TaskLimits = { timeoutMs: 60_000, memoryMb: 1024 };

/** Set from the environment at start-up (config/env.ts); the pool is made on first use. */
export function configureTaskPool(next: TaskLimits): void {
  limits = next;
}

/**
 * Runs the heavy tasks off the request thread, so a large upload or analysis does not stall
 * other requests. From compiled code the tasks go to a worker pool; from TypeScript sources
 * (tests, tsx) they run in-process, because workers cannot load .ts files by themselves.
 */
const compiled = import.meta.url.endsWith(".js");
/**
 * Uploads and analyses have a pool each, so a hostile file being read (up to the time bound)
 * never queues another user's analysis behind it.
 */
const pools = new Map<"upload" | "analysis", Piscina>();

/**
 * A pool whose tasks are bounded: a task past `timeoutMs` is aborted, which ends its worker
 * thread; a worker past `memoryMb` of heap dies by V8's own limit. Either way piscina starts a
 * fresh worker for the next task, and other tasks carry on.
 */
export function createBoundedPool(filename: string, l: TaskLimits, maxThreads?: number): Piscina {
  return new Piscina({
    filename,
    maxThreads: maxThreads ?? Math.max(1, Math.min(4, os.availableParallelism() - 1)),
    idleTimeout: 60_000,
    resourceLimits: { maxOldGenerationSizeMb: l.memoryMb, maxYoungGenerationSizeMb: 64 },
  });
}

/** Runs one task on a bounded pool; a task ended by a bound becomes a 503 or 413 naming the bound. */
export async function runBounded(p: Piscina, name: string, input: unknown, l: TaskLimits): Promise<unknown> {
  try {
    return await p.run(input, { name, signal: AbortSignal.timeout(l.timeoutMs) });
  } catch (e) {
    const err = e as { name?: string; code?: string; message?: string };
    if (err.name === "AbortError" || err.name === "TimeoutError")
      throw new HttpError(
        503,
        "task_timeout",
        `This took longer than ${Math.round(l.timeoutMs / 1000)} s and was stopped; other work was not affected. Try a smaller file, or try again later.`,
      );
    if (err.code === "ERR_WORKER_OUT_OF_MEMORY" || /out of memory|heap limit/i.test(err.message ?? ""))
      throw new HttpError(
        413,
        "task_out_of_memory",
        `This needed more than ${l.memoryMb} MB of memory and was stopped; other work was not affected. Try a smaller file.`,
      );
    throw e;
  }
}

function getPool(kind: "upload" | "analysis"): Piscina {
  let p = pools.get(kind);
  if (!p)
    pools.set(
      kind,
      (p = createBoundedPool(new URL("./worker.js", import.meta.url).href, limits, limits.threads)),
    );
  return p;
}

export async function runTask<N extends TaskName>(
  name: N,
  input: Parameters<Tasks[N]>[0],
): Promise<Exclude<Awaited<ReturnType<Tasks[N]>>, tasks.TaskError>> {
  const out = (
    compiled
      ? await runBounded(getPool(name === "analyzeTask" ? "analysis" : "upload"), name, input, limits)
      : await (tasks[name] as (i: unknown) => unknown)(input)
  ) as Awaited<ReturnType<Tasks[N]>>;
  if (out && typeof out === "object" && "error" in out) {
    const e = (out as tasks.TaskError).error;
    throw new HttpError(e.status, e.code, e.message, e.details);
  }
  return out as Exclude<Awaited<ReturnType<Tasks[N]>>, tasks.TaskError>;
}

export async function closeTaskPool(): Promise<void> {
  await Promise.all([...pools.values()].map((p) => p.destroy()));
  pools.clear();
}
