import { describe, expect, it } from "vitest";
import { ApiError } from "./api-client";
import { fieldError } from "./field-error";

describe("fieldError", () => {
  it("reads the field from the validation details first", () => {
    expect(
      fieldError(
        new ApiError(400, "validation", "displayName: Too short", {
          issues: [{ field: "displayName", message: "Too short" }],
        }),
      ),
    ).toEqual({
      field: "displayName",
      message: "Too short",
    });
  });
  it("falls back to a 'field: message' prefix", () => {
    expect(fieldError(new ApiError(400, "weak_password", "password: Use at least 12 characters."))).toEqual({
      field: "password",
      message: "Use at least 12 characters.",
    });
  });
  it("is null for messages that name no field", () => {
    expect(
      fieldError(new ApiError(410, "invitation_used", "This invitation has already been used.")),
    ).toBeNull();
    expect(fieldError(new Error("x"))).toBeNull();
  });
});
