import { expect, test } from "@playwright/test";

const PASSWORD = "trailhead-demo";

const ROLES = [
  { role: "analyst", label: "Analyst", heading: "You carry a study from question to result" },
  { role: "reviewer", label: "Reviewer", heading: "You decide whether an analysis is fit to leave the team" },
  { role: "writer", label: "Writer", heading: "You turn approved analyses into report text" },
  { role: "admin", label: "Admin", heading: "You look after the people and the rules" },
];

for (const r of ROLES) {
  test(`the demo ${r.role} signs in and sees their home page`, async ({ page }, info) => {
    await page.goto("/");
    await expect(page).toHaveURL(/\/sign-in$/);
    await expect(page.getByText("Demo mode")).toBeVisible();
    await page.getByLabel("E-mail").fill(`${r.role}@waymark.test`);
    await page.getByLabel("Password").fill(PASSWORD);
    await page.getByRole("button", { name: "Sign in" }).click();
    await expect(page.getByRole("heading", { level: 1 })).toHaveText(r.heading);
    await expect(page.getByTestId("signed-in-role")).toHaveText(r.label);
    await page.screenshot({ path: info.outputPath(`home-${r.role}.png`), fullPage: true });
    await page.getByRole("button", { name: "Sign out" }).click();
    await expect(page).toHaveURL(/\/sign-in$/);
  });
}

test("a wrong password keeps the visitor on the sign-in page with a clear message", async ({
  page,
}, info) => {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill("analyst@waymark.test");
  await page.getByLabel("Password").fill("not-the-password");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByText("That e-mail and password do not match an account.")).toBeVisible();
  await page.screenshot({ path: info.outputPath("sign-in-wrong-password.png"), fullPage: true });
});

test("an unknown address shows the 404 page", async ({ page }) => {
  await page.goto("/no/such/page");
  await expect(page.getByRole("heading", { level: 1 })).toHaveText("This trail has no marker here");
});
