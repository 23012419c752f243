import { afterAll, describe, expect, it } from "vitest";
import { describeGroups } from "../../packages/stats/src/descriptives/describe.js";
import { referenceDatasets } from "./datasets.js";
import { runPython } from "./python.js";

interface Ref {
  versions: Record<string, string>;
  results: Record<string, number | string>[];
}

const datasets = referenceDatasets().filter((d) => !d.hard);
const samples = datasets.flatMap((d) =>
  d.groups.map((g) => ({ id: `${d.id}/${g.name}`, values: g.values as number[] })),
);
// scipy 1.10.1 / numpy 1.24.2 (Debian) via tests/reference/python/descriptives_runner.py; the t quantile of the
// interval from mpmath there, because scipy 1.10.1 t.ppf errs by up to 4e-9 (measured).
const ref = runPython<Ref>("descriptives_runner.py", { samples });
const worst: Record<string, number> = {};
afterAll(() =>
  console.log(`descriptives reference (${JSON.stringify(ref.versions)}) worst relative errors:`, worst),
);

// Relative to max(|reference|, scale): a location near zero (e.g. a mean of 0.001 in data with
// SD 1) is judged against the data's scale, skewness/kurtosis against 1.
const close = (key: string, x: unknown, r: unknown, tol = 1e-9, scale = 1) => {
  expect(typeof x).toBe("number");
  const e = Math.abs((x as number) - (r as number)) / Math.max(Math.abs(r as number), scale);
  worst[key] = Math.max(worst[key] ?? 0, e);
  expect(e).toBeLessThan(tol);
};

describe("descriptives against scipy.stats.describe / skew(bias=False) / kurtosis(bias=False) / numpy.percentile (linear)", () => {
  for (const s of samples) {
    const r = ref.results.find((x) => x.id === s.id) as Record<string, number>;
    it(s.id, () => {
      const [g] = describeGroups([{ name: "g", values: s.values }]);
      if (!g) throw new Error("no result");
      expect(g.n).toBe(r.n);
      for (const key of [
        "mean",
        "sd",
        "se",
        "ciLower",
        "ciUpper",
        "min",
        "max",
        "q1",
        "median",
        "q3",
      ] as const) {
        if (s.values.length < 2 && ["sd", "se", "ciLower", "ciUpper"].includes(key)) continue;
        close(key, g[key], r[key], 1e-9, r.sd ?? 1);
      }
      if (r.skewness !== undefined) close("skewness", g.skewness, r.skewness, 1e-8);
      if (r.kurtosis !== undefined) close("kurtosis", g.kurtosis, r.kurtosis, 1e-8);
    });
  }
});
