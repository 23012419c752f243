import { render, screen } from "@testing-library/react";
import { describe, expect, it } from "vitest";
import { ROLES } from "@/lib/roles";
import { ROLE_GUIDES, TRAIL } from "../role-guides";
import { RoleHome } from "./role-home";

describe("RoleHome", () => {
  it.each(ROLES)("shows the %s's own title and marks only their steps as theirs", (role) => {
    render(
      <RoleHome user={{ id: 1, email: "x@waymark.test", displayName: "Sam Doe", role, active: true }} />,
    );
    expect(screen.getByRole("heading", { level: 1 }).textContent).toBe(ROLE_GUIDES[role].title);
    const mine = screen.queryAllByText("(your step)");
    expect(mine).toHaveLength(TRAIL.filter((t) => t.owner === role).length);
  });
});
