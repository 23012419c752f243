/**
 * An invented long-layout CSV ("Group,Value") of `rows` values across groups A, B and C, large
 * enough that parsing and storing it takes a noticeable time. Deterministic (a fixed LCG), so
 * every run uploads the same bytes.
 */
export function largeCsv(rows: number): Buffer {
  const groups = ["A", "B", "C"];
  const means = [50, 51, 52.5];
  let state = 0x2545f491;
  const uniform = () => {
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
    return state / 2 ** 32;
  };
  const lines = ["Group,Value"];
  for (let i = 0; i < rows; i++) {
    const g = i % 3;
    // A sum of four uniforms: roughly bell-shaped, with SD about 5.8 × 0.29.
    const noise = (uniform() + uniform() + uniform() + uniform() - 2) * 10;
    lines.push(`${groups[g]},${(means[g]! + noise).toFixed(4)}`);
  }
  return Buffer.from(lines.join("\n") + "\n", "utf8");
}
