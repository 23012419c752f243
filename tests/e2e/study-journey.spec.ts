import { fileURLToPath } from "node:url";
import { expect, test, type Page, type TestInfo } from "@playwright/test";

const PASSWORD = "trailhead-demo";
const CSV = fileURLToPath(new URL("../fixtures/curing-study.csv", import.meta.url));

async function shot(page: Page, info: TestInfo, name: string) {
  // The trail is sticky: from the top, the full-page picture shows it beside its steps.
  await page.evaluate(() => window.scrollTo(0, 0));
  await page.screenshot({ path: info.outputPath(`step-${name}.png`), fullPage: true });
}

test("the demo analyst walks a study from question to results", async ({ page }, info) => {
  test.setTimeout(120_000);
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill("analyst@waymark.test");
  await page.getByLabel("Password").fill(PASSWORD);
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByTestId("signed-in-role")).toHaveText("Analyst");

  // Study
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Studies" }).click();
  await expect(page.getByRole("heading", { level: 1, name: "Studies" })).toBeVisible();
  await page.getByRole("link", { name: "Start a study" }).click();
  await page.getByLabel("Title").fill("Curing methods for test cylinders");
  await page
    .getByLabel("Objective")
    .fill("Does the curing method change the 28-day compressive strength of concrete test cylinders?");
  await page.getByLabel("Outcome", { exact: true }).fill("Compressive strength");
  await page.getByLabel("Unit").fill("MPa");
  await page.getByLabel("Grouping factor").fill("Curing method");
  await page.getByRole("button", { name: "Add a level" }).click();
  const levels = ["Water bath", "Wet burlap", "Curing compound", "Air dried"];
  for (const [i, name] of levels.entries())
    await page.getByLabel(`Level ${i + 1}`, { exact: true }).fill(name);
  await page.getByLabel(/Safety-critical/).check();
  await shot(page, info, "study");
  await page.getByRole("button", { name: "Create the study" }).click();

  // Design questions
  await expect(page).toHaveURL(/\/studies\/\d+\/design$/);
  await expect(page.getByText("Question 1 of 7")).toBeVisible();
  // A question about means, with the same number of units in every group: the plan keeps classic ANOVA.
  const answers = [
    /Yes, independent groups/,
    /A measured quantity/,
    /Whether the average amounts differ/,
    /Yes, the same number in every group/,
    /^No All groups/,
    /Every pair of groups/,
    /Assigned at random/,
  ];
  for (const [i, answer] of answers.entries()) {
    await page.getByRole("radio", { name: answer }).check();
    await expect(page.getByText(`Question ${i + 1} of 7 · answer saved`)).toBeVisible();
    await page
      .getByRole("button", { name: i === answers.length - 1 ? "See all answers" : "Next question" })
      .click();
  }
  await expect(page.getByLabel("Design answers")).toBeVisible();
  await expect(page.getByTestId("trail-design")).toHaveAttribute("data-state", "done");
  await shot(page, info, "design");

  // Plan and sample size
  await page.getByRole("link", { name: "Go on to the plan" }).click();
  await expect(page.getByRole("heading", { name: "Plan and sample size" })).toBeVisible();
  await page.getByRole("button", { name: "Calculate" }).click();
  await expect(page.getByTestId("power-answer")).toContainText("per group");
  await page.getByRole("button", { name: "Use this sample size in the plan" }).click();
  await expect(page.getByText("Saved to the plan.")).toBeVisible();
  await page.getByRole("button", { name: "Lock the plan…" }).click();
  await expect(page.getByText("This cannot be undone.", { exact: false })).toBeVisible();
  await shot(page, info, "plan-confirm");
  await page.getByRole("button", { name: "Yes, lock the plan" }).click();
  await expect(page.getByTestId("plan-locked-note")).toContainText("Plan locked");
  await expect(page.getByTestId("trail-plan")).toHaveAttribute("data-state", "done");
  await shot(page, info, "plan");

  // Data
  await page.getByTestId("trail-data").getByRole("link").click();
  await page.getByLabel("Data file").setInputFiles(CSV);
  await expect(page.getByRole("table", { name: "First rows of the file" })).toBeVisible();
  await page.getByRole("button", { name: "Upload this file" }).click();
  await expect(page.getByText(/Stored as version 1 of the data/)).toBeVisible();
  await expect(page.getByText(/32 rows read, 32 used/).first()).toBeVisible();
  await expect(page.getByTestId("trail-data")).toContainText("n = 32 in 4 groups");
  await shot(page, info, "data");

  // Checks
  await page.getByTestId("trail-checks").getByRole("link").click();
  await expect(page.getByRole("heading", { name: "Normality of the residuals" })).toBeVisible();
  await expect(
    page.getByRole("img", { name: "Normal Q–Q plot of the residuals" }).locator("svg"),
  ).toBeVisible();
  await expect(page.getByRole("img", { name: /Box and points plot/ }).locator("svg")).toBeVisible();
  await shot(page, info, "checks");

  // Test choice
  await page.getByRole("link", { name: "See the plan's test for these data" }).click();
  await expect(page.getByTestId("recommended-test")).toBeVisible();
  await shot(page, info, "choice");
  await page.getByRole("button", { name: "Run the analysis" }).click();

  // Results
  await expect(page).toHaveURL(/\/results$/);
  await expect(page.getByTestId("results-panel")).toBeVisible();
  await expect(page.getByTestId("plain-summary")).not.toBeEmpty();
  await expect(page.getByTestId("caution-note")).toContainText(
    "does not replace, the judgement of a qualified statistician",
  );
  await expect(page.getByTestId("trail-results")).toHaveAttribute("data-state", "done");
  const text = (await page.getByTestId("results-panel").textContent()) ?? "";
  expect(text).not.toMatch(/NaN|undefined|Infinity/);
  await shot(page, info, "results");
});
