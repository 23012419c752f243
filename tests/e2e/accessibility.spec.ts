import { createRequire } from "node:module";
import { expect, test, type Page } from "@playwright/test";

const require = createRequire(import.meta.url);

// axe is injected as an inline script, which the app's Content-Security-Policy rightly blocks.
test.use({ bypassCSP: true });
const AXE = require.resolve("axe-core/axe.min.js");

interface AxeViolation {
  id: string;
  impact: string | null;
  help: string;
  nodes: { target: string[] }[];
}

/** Runs axe-core (Deque, WCAG 2.1 A/AA rules) in the page and returns the serious and critical findings. */
async function seriousViolations(page: Page): Promise<string[]> {
  await page.addScriptTag({ path: AXE });
  const violations = await page.evaluate(async () => {
    const axe = (
      window as unknown as {
        axe: { run: (ctx: Document, opts: object) => Promise<{ violations: AxeViolation[] }> };
      }
    ).axe;
    const r = await axe.run(document, {
      runOnly: { type: "tag", values: ["wcag2a", "wcag2aa", "wcag21a", "wcag21aa"] },
    });
    return r.violations;
  });
  return violations
    .filter((v) => v.impact === "serious" || v.impact === "critical")
    .map((v) => `${v.id} (${v.impact}): ${v.help} at ${v.nodes.map((n) => n.target.join(" ")).join(", ")}`);
}

async function signIn(page: Page, email: string) {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill("trailhead-demo");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByTestId("signed-in-role")).toBeVisible();
}

test("the sign-in page has no serious accessibility violations", async ({ page }) => {
  await page.goto("/sign-in");
  await expect(page.getByRole("button", { name: "Sign in" })).toBeVisible();
  expect(await seriousViolations(page)).toEqual([]);
});

test("the analyst's study pages have no serious accessibility violations", async ({ page }) => {
  await signIn(page, "analyst@waymark.test");
  const res = await page.request.get("/api/studies");
  expect(res.status(), await res.text()).toBe(200);
  const { studies } = (await res.json()) as { studies: { id: number }[] };
  for (const step of ["", "/design", "/plan", "/data", "/checks", "/choice", "/results"]) {
    await page.goto(`/studies/${studies[0]!.id}${step}`);
    await page.waitForLoadState("networkidle");
    expect(await seriousViolations(page), `page /studies/:id${step}`).toEqual([]);
  }
});

test("signing in and answering a design question work from the keyboard alone", async ({ page }) => {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").focus();
  await page.keyboard.type("analyst@waymark.test");
  await page.keyboard.press("Tab");
  await page.keyboard.type("trailhead-demo");
  await page.keyboard.press("Enter");
  await expect(page.getByTestId("signed-in-role")).toHaveText("Analyst");

  // A fresh study, so its design questions are still open.
  const { token } = (await (await page.request.get("/api/auth/csrf")).json()) as { token: string };
  const created = await page.request.post("/api/studies", {
    headers: { "x-csrf-token": token },
    data: {
      title: "Keyboard check",
      objective: "Answer by keyboard.",
      outcomeName: "Mass",
      outcomeUnit: "g",
      factorName: "Batch",
      levels: ["A", "B", "C"],
      context: "general",
    },
  });
  expect(created.status()).toBe(201);
  const { study } = (await created.json()) as { study: { id: number } };
  await page.goto(`/studies/${study.id}/design`);
  const answer = page.getByRole("radio", { name: /Yes, independent groups/ });
  await answer.focus();
  await page.keyboard.press("Space");
  await expect(answer).toBeChecked();
  // The answer is saved as it is given: the server has it.
  await expect
    .poll(
      async () =>
        (
          (await (await page.request.get(`/api/studies/${study.id}`)).json()) as {
            study: { design: { independence?: string } };
          }
        ).study.design.independence,
    )
    .toBe("independent");
});
