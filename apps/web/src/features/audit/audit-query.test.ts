import { describe, expect, it } from "vitest";
import { filtersFromParams, filtersToQuery } from "./audit-query";

describe("audit filters in the address", () => {
  it("round-trips the set filters and leaves the empty ones out", () => {
    const f = filtersFromParams(
      new URLSearchParams("studyId=12&actor=ada&action=study.approved&from=2025-12-01&to=2025-12-31"),
    );
    expect(f).toEqual({
      studyId: "12",
      actor: "ada",
      action: "study.approved",
      from: "2025-12-01",
      to: "2025-12-31",
    });
    expect(filtersToQuery(f)).toBe(
      "studyId=12&actor=ada&action=study.approved&from=2025-12-01&to=2025-12-31",
    );
    expect(filtersToQuery({ ...f, actor: "", from: "", to: "" })).toBe("studyId=12&action=study.approved");
  });

  it("drops values the server would refuse", () => {
    expect(filtersFromParams(new URLSearchParams("studyId=abc&from=yesterday&to=2025-13"))).toEqual({
      studyId: "",
      actor: "",
      action: "",
      from: "",
      to: "",
    });
  });
});
