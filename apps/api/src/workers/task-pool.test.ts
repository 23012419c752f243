import { afterAll, describe, expect, it } from "vitest";
import { HttpError } from "../http/errors.js";
import { createBoundedPool, runBounded } from "./task-pool.js";

const limits = { timeoutMs: 500, memoryMb: 64 };
const pool = createBoundedPool(
  new URL("./test-fixtures/hostile-worker.mjs", import.meta.url).href,
  limits,
  1,
);
afterAll(() => pool.destroy());

async function outcome(name: string, input: unknown = 1, l = limits): Promise<string> {
  try {
    return `ok ${String(await runBounded(pool, name, input, l))}`;
  } catch (e) {
    return e instanceof HttpError ? `${e.status} ${e.code}` : `other ${(e as Error).message}`;
  }
}

describe("the bounded worker pool", () => {
  it("ends a task past its time bound with 503, and the next task runs on a fresh worker", async () => {
    expect(await outcome("spin")).toBe("503 task_timeout");
    expect(await outcome("quick", 41)).toBe("ok 42");
  });

  it("ends a task past its memory bound with 413, and the next task runs", async () => {
    // A generous time bound, so only the memory bound can end it even on a busy machine.
    expect(await outcome("hog", 1, { ...limits, timeoutMs: 30_000 })).toBe("413 task_out_of_memory");
    expect(await outcome("quick", 1)).toBe("ok 2");
  });

  it("keeps other work going on the other thread while one task spins", async () => {
    const two = createBoundedPool(
      new URL("./test-fixtures/hostile-worker.mjs", import.meta.url).href,
      limits,
      2,
    );
    try {
      const spin = runBounded(two, "spin", 0, limits).catch((e: HttpError) => `${e.status}`);
      const quick = await runBounded(two, "quick", 6, limits);
      expect(quick).toBe(7);
      expect(await spin).toBe("503");
    } finally {
      await two.destroy();
    }
  });
});
