/**
 * Named points just before a slow write opens its transaction, where a test can hold the
 * write to race it against another request deterministically (e.g. an upload held while a
 * submit completes). Nothing waits unless a test sets a point; production never does.
 */
export type PausePoint = "dataset.before-store" | "analysis.before-store";

const points = new Map<PausePoint, () => Promise<void>>();

export async function pauseAt(point: PausePoint): Promise<void> {
  const wait = points.get(point);
  if (wait) await wait();
}

/** Tests only: make `point` wait for `wait()`; returns the function that removes it. */
export function holdAt(point: PausePoint, wait: () => Promise<void>): () => void {
  points.set(point, wait);
  return () => points.delete(point);
}
