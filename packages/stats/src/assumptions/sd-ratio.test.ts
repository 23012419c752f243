import { describe, expect, it } from "vitest";
import { sdRatio } from "./sd-ratio.js";

describe("sdRatio", () => {
  it("divides the largest SD by the smallest", () => {
    // SDs 1 (1,2,3) and 2 (2,4,6).
    expect(
      sdRatio([
        { name: "A", values: [1, 2, 3] },
        { name: "B", values: [2, 4, 6] },
      ]),
    ).toMatchObject({ ratio: 2, largest: { group: "B" } });
  });
  it("is unavailable when a group has zero SD", () => {
    expect(
      sdRatio([
        { name: "A", values: [1, 2] },
        { name: "B", values: [3, 3] },
      ]),
    ).toMatchObject({ available: false });
  });
});
