import { expect, test, type Page } from "@playwright/test";

/**
 * At 390 px wide (a common phone width) no page may scroll sideways: wide tables scroll inside
 * their own box and the menu wraps. Each page is measured after it has rendered; the elements
 * wider than the window are named so a failure says where to look.
 */
const WIDTH = 390;
test.use({ viewport: { width: WIDTH, height: 844 } });

async function signIn(page: Page, role: string) {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(`${role}@waymark.test`);
  await page.getByLabel("Password").fill("trailhead-demo");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByTestId("signed-in-user")).toBeVisible();
}

/** How far the page scrolls sideways, and the outermost elements that stick out past the window. */
async function overflow(page: Page): Promise<{ scroll: number; culprits: string[] }> {
  return page.evaluate((width) => {
    const doc = document.documentElement;
    const culprits: string[] = [];
    for (const el of Array.from(document.body.querySelectorAll<HTMLElement>("*"))) {
      const r = el.getBoundingClientRect();
      if (r.right <= width + 1 || r.width === 0) continue;
      // Only the outermost offender: its parent fits, or scrolls it in its own box.
      const p = el.parentElement;
      const pr = p?.getBoundingClientRect();
      const parentScrolls = p
        ? ["auto", "scroll", "hidden", "clip"].includes(getComputedStyle(p).overflowX)
        : false;
      if (parentScrolls) continue;
      // An absolutely placed element escapes a scrolling box that is not positioned itself.
      const placed = ["absolute", "fixed"].includes(getComputedStyle(el).position);
      if (!placed && pr && pr.right > width + 1) continue;
      const id = el.id ? `#${el.id}` : "";
      const testId = el.dataset.testid ? `[data-testid=${el.dataset.testid}]` : "";
      culprits.push(
        `${el.tagName.toLowerCase()}${id}${testId}.${[...el.classList].slice(0, 4).join(".")} → ${Math.round(r.right)}px`,
      );
    }
    return { scroll: doc.scrollWidth - doc.clientWidth, culprits: culprits.slice(0, 5) };
  }, WIDTH);
}

async function studyId(page: Page, title: RegExp): Promise<number> {
  const res = await page.request.get("/api/studies");
  const { studies } = (await res.json()) as { studies: { id: number; title: string }[] };
  const s = studies.find((x) => title.test(x.title));
  expect(s, `a demo study matching ${title}`).toBeTruthy();
  return s!.id;
}

const ROLES: { role: string; pages: (page: Page) => Promise<string[]> }[] = [
  {
    role: "analyst",
    pages: async (page) => {
      const id = await studyId(page, /^Seedling height/);
      const steps = ["design", "plan", "data", "checks", "choice", "results"].map(
        (s) => `/studies/${id}/${s}`,
      );
      return ["/", "/studies", "/studies/new", `/studies/${id}`, ...steps];
    },
  },
  {
    role: "reviewer",
    pages: async (page) => ["/reviews", `/reviews/${await studyId(page, /^Call handling/)}`],
  },
  {
    role: "writer",
    pages: async (page) => ["/reports", `/reports/${await studyId(page, /^Compressive strength/)}`],
  },
  { role: "admin", pages: async () => ["/people", "/audit", "/settings"] },
];

test("the sign-in page fits 390 px", async ({ page }) => {
  await page.goto("/sign-in");
  await expect(page.getByLabel("E-mail")).toBeVisible();
  expect(await overflow(page)).toEqual({ scroll: 0, culprits: [] });
});

for (const r of ROLES) {
  test(`the ${r.role}'s main pages do not scroll sideways at 390 px`, async ({ page }, info) => {
    test.setTimeout(120_000);
    await signIn(page, r.role);
    const found: Record<string, { scroll: number; culprits: string[] }> = {};
    for (const path of await r.pages(page)) {
      await page.goto(path);
      await expect(page.locator("main")).toBeVisible();
      // Let the page's queries settle (no loading text left).
      await expect(page.getByText(/^Loading/)).toHaveCount(0, { timeout: 15_000 });
      const o = await overflow(page);
      if (o.scroll > 0) {
        found[path] = o;
        await page.screenshot({
          path: info.outputPath(`narrow${path.replaceAll("/", "-")}.png`),
          fullPage: true,
        });
      }
    }
    expect(found).toEqual({});
  });
}
