/**
 * What the process does when it is asked to stop (SIGTERM from the orchestrator, Ctrl-C).
 *
 * Pieces that hold shared work (outbox claims, claimed analysis runs) register a hook here to give
 * that work back, so another instance takes it up at once rather than after its lease expires.
 * server.ts runs the hooks after the HTTP server has stopped taking requests and the in-flight
 * ones have finished, and before the database is closed — a hook may still use the database.
 */

export type ShutdownHook = () => void | Promise<void>;

const hooks: { name: string; run: ShutdownHook }[] = [];
let draining = false;

/** Registers work to do at shutdown; returns a function that removes it again. */
export function onShutdown(name: string, run: ShutdownHook): () => void {
  const entry = { name, run };
  hooks.push(entry);
  return () => {
    const i = hooks.indexOf(entry);
    if (i >= 0) hooks.splice(i, 1);
  };
}

/** True once shutdown has begun: readiness answers 503 so the load balancer stops sending requests. */
export function isDraining(): boolean {
  return draining;
}

export function startDraining(): void {
  draining = true;
}

/**
 * Runs every hook, most recently registered first (like unwinding a stack), each bounded by
 * `timeoutMs`; a hook that fails or hangs is reported and does not stop the others.
 */
export async function runShutdownHooks({
  timeoutMs = 10_000,
  log = console.error,
}: { timeoutMs?: number; log?: (msg: string) => void } = {}): Promise<void> {
  for (const { name, run } of [...hooks].reverse()) {
    let timer: NodeJS.Timeout | undefined;
    try {
      await Promise.race([
        Promise.resolve().then(run),
        new Promise((_, reject) => {
          timer = setTimeout(() => reject(new Error(`did not finish within ${timeoutMs} ms`)), timeoutMs);
        }),
      ]);
    } catch (e) {
      log(`shutdown step "${name}" failed: ${e instanceof Error ? e.message : String(e)}`);
    } finally {
      clearTimeout(timer);
    }
  }
}

/** For tests: forget registered hooks and the draining mark. */
export function resetShutdownForTests(): void {
  hooks.length = 0;
  draining = false;
}
