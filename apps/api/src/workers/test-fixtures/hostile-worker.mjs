// Tasks that pass a bound on purpose, for task-pool.test.ts.
export function quick(x) {
  return x + 1;
}
export function spin() {
  for (;;);
}
export function hog() {
  const keep = [];
  for (;;) keep.push(new Array(1e6).fill(Math.random()));
}
