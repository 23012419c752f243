import { analyze, type AnalysisResult, type AnalyzeOptions } from "@waymark/stats";
import { uniformFloat64 } from "pure-rand/distribution/uniformFloat64";
import { xoroshiro128plus } from "pure-rand/generator/xoroshiro128plus";

/**
 * Engine output for component tests: `analyze()` run on invented, seeded data, so a test fails
 * when the engine's result changes shape. Each scenario is built to land on one test (the
 * vocabulary test in @waymark/stats and the engine's own tests check the choice rules).
 */
export type Scenario =
  /** Three adhesives, similar spread, near-normal: classic ANOVA. */
  | "equal-spread"
  /** Three routings whose spreads differ about fourfold: Welch's ANOVA. */
  | "unequal-spread"
  /** Three light schedules with an extreme value: Kruskal–Wallis. */
  | "extreme-outlier"
  /** Every value the same: no test can run, every part says why. */
  | "identical";

export const ADHESIVES = ["Epoxy", "Acrylic", "Urethane"] as const;

/** Seeded normal draws (Box & Muller 1958) from pure-rand's xoroshiro128+. */
function normals(seed: number) {
  const rng = xoroshiro128plus(seed);
  return () => {
    const u = 1 - uniformFloat64(rng);
    return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * uniformFloat64(rng));
  };
}

function groupsFor(scenario: Scenario): { name: string; values: number[] }[] {
  const normal = normals(
    { "equal-spread": 7004, "unequal-spread": 7002, "extreme-outlier": 7003, identical: 7004 }[scenario],
  );
  const round = (x: number) => Math.round(x * 100) / 100;
  const draw = (mean: number, sd: number, n: number) =>
    Array.from({ length: n }, () => round(mean + sd * normal()));
  switch (scenario) {
    case "equal-spread":
      return [
        { name: "Epoxy", values: draw(24, 1.5, 10) },
        { name: "Acrylic", values: draw(21, 1.5, 10) },
        { name: "Urethane", values: draw(22.5, 1.5, 10) },
      ];
    case "unequal-spread":
      return [
        { name: "Epoxy", values: draw(24, 0.6, 12) },
        { name: "Acrylic", values: draw(21, 2.8, 12) },
        { name: "Urethane", values: draw(22.5, 1.2, 12) },
      ];
    case "extreme-outlier": {
      const epoxy = draw(24, 1.2, 12);
      epoxy[3] = 48; // a value copied wrongly, far out for a group of its size
      return [
        { name: "Epoxy", values: epoxy },
        { name: "Acrylic", values: draw(21, 1.2, 12) },
        { name: "Urethane", values: draw(22.5, 1.2, 12) },
      ];
    }
    case "identical":
      return ADHESIVES.map((name) => ({ name, values: [20, 20, 20, 20, 20] }));
  }
}

const cache = new Map<string, AnalysisResult>();

/**
 * The plan each scenario is built for: the plan, not the data, decides the test. Equal spread
 * under a classic-first plan with equal planned sizes → classic ANOVA; a question about means
 * with unequal planned sizes → Welch's ANOVA; a question about larger values → Kruskal–Wallis.
 */
const PLANS: Record<Scenario, AnalyzeOptions> = {
  "equal-spread": { policy: "classic-first", question: "means", plannedSizes: "equal" },
  "unequal-spread": { question: "means", plannedSizes: "unequal" },
  "extreme-outlier": { question: "larger-values" },
  identical: {},
};

/** The engine's result for a scenario (cached per scenario and options). */
export function engineResult(scenario: Scenario, options: AnalyzeOptions = {}): AnalysisResult {
  const key = `${scenario} ${JSON.stringify(options)}`;
  let r = cache.get(key);
  if (!r) {
    r = analyze({ groups: groupsFor(scenario), options: { ...PLANS[scenario], ...options } });
    cache.set(key, r);
  }
  // A fresh copy, so a test may edit its own without touching another's.
  return structuredClone(r);
}
