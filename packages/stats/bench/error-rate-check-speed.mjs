// Speed of errorRateCheck() (a benchmark that prints figures, not a test). Seeded normal
// groups with unequal SDs at several total sizes; prints runs and wall time per size.
// Usage (after `npm run build -w @waymark/stats`): node bench/error-rate-check-speed.mjs
import { uniformFloat64 } from "pure-rand/distribution/uniformFloat64";
import { xoroshiro128plus } from "pure-rand/generator/xoroshiro128plus";
import { loadavg } from "node:os";
import { errorRateCheck } from "../dist/choice/error-rate-check.js";

const rng = xoroshiro128plus(20_261_202);
const normal = () => {
  const u = 1 - uniformFloat64(rng);
  return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * uniformFloat64(rng));
};
console.log(
  `load average ${loadavg()
    .map((x) => x.toFixed(1))
    .join(" ")}`,
);
for (const sizes of [
  [10, 10, 10],
  [8, 25, 15, 40],
  [100, 300, 200, 400],
  [500, 500, 500, 500],
  [2500, 2500, 2500, 2500],
]) {
  const groups = sizes.map((n, g) => ({
    name: `G${g + 1}`,
    values: Array.from({ length: n }, () => Math.round((50 + (g + 1) * normal()) * 1000) / 1000),
  }));
  errorRateCheck(groups, { runs: 50 }); // warm-up
  const t0 = performance.now();
  const r = errorRateCheck(groups);
  const ms = performance.now() - t0;
  const N = sizes.reduce((a, b) => a + b, 0);
  console.log(`N = ${String(N).padStart(5)} (${sizes.join("/")}): ${r.runs} runs in ${ms.toFixed(0)} ms`);
}
