import { uniformFloat64 } from "pure-rand/distribution/uniformFloat64";
import { xoroshiro128plus } from "pure-rand/generator/xoroshiro128plus";

/** Seeded draws for the invented demo data, so every demo database holds the same numbers. */
export function seededRandom(seed: number) {
  const rng = xoroshiro128plus(seed);
  const uniform = () => uniformFloat64(rng);
  /** Standard normal by the Box–Muller transform (Box & Muller 1958). */
  const normal = () => {
    const u = 1 - uniform();
    return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * uniform());
  };
  return { uniform, normal };
}
