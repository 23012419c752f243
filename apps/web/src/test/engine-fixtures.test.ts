import { describe, expect, it } from "vitest";
import { engineResult } from "./engine-fixtures";

describe("engine fixtures", () => {
  it("each scenario lands on the test it is built for", () => {
    expect(engineResult("equal-spread").recommendation.test).toBe("anova");
    expect(engineResult("unequal-spread").recommendation.test).toBe("welch");
    expect(engineResult("extreme-outlier").recommendation.test).toBe("kruskal-wallis");
    const none = engineResult("identical");
    expect(none.anova.available).toBe(false);
    expect(none.welch.available).toBe(false);
  });
});
