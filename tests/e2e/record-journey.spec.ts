import { readFileSync, writeFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { expect, test, type APIRequestContext, type Page, type TestInfo } from "@playwright/test";
import JSZip from "jszip";

/**
 * One record from upload to report: the submission must name an analysis of the active data
 * version, a review round can be answered at its steps, the next round says what changed, and
 * the approved DOCX names the data version, the test and the family size of that analysis.
 */
const PASSWORD = "trailhead-demo";
const CSV = fileURLToPath(new URL("../fixtures/curing-study.csv", import.meta.url));
const LEVELS = ["Water bath", "Wet burlap", "Curing compound", "Air dried"];
const TITLE = "Curing methods, one record from upload to report";

async function shot(page: Page, info: TestInfo, name: string) {
  await page.evaluate(() => window.scrollTo(0, 0));
  await page.screenshot({ path: info.outputPath(`record-${name}.png`), fullPage: true });
}

async function signIn(page: Page, role: string) {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(`${role}@waymark.test`);
  await page.getByLabel("Password").fill(PASSWORD);
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByTestId("signed-in-user")).toBeVisible();
}

async function signOut(page: Page) {
  await page.getByRole("button", { name: "Sign out" }).click();
  await expect(page).toHaveURL(/\/sign-in$/);
}

/** A state-changing API call from the signed-in page, with the session's CSRF token. */
async function send(req: APIRequestContext, method: "post" | "put", url: string, data: object) {
  const { token } = (await (await req.get("/api/auth/csrf")).json()) as { token: string };
  const res = await req[method](url, { headers: { "x-csrf-token": token }, data });
  expect(res.ok(), `${method.toUpperCase()} ${url}: ${res.status()} ${await res.text()}`).toBe(true);
  return res.json();
}

async function upload(page: Page, file: string, version: number) {
  await page.getByLabel("Data file").setInputFiles(file);
  await expect(page.getByRole("table", { name: "First rows of the file" })).toBeVisible();
  await page.getByRole("button", { name: "Upload this file" }).click();
  await expect(page.getByText(`Stored as version ${version} of the data`)).toBeVisible();
}

async function docxText(bytes: Buffer): Promise<string> {
  const zip = await JSZip.loadAsync(bytes);
  const xml = await zip.file("word/document.xml")!.async("string");
  return xml
    .replace(/<w:tab\/>/g, " ")
    .replace(/<\/w:p>/g, "\n")
    .replace(/<[^>]+>/g, "")
    .replace(/&amp;/g, "&")
    .replace(/&lt;/g, "<")
    .replace(/&gt;/g, ">")
    .replace(/&quot;/g, '"')
    .replace(/&apos;/g, "'");
}

test("upload, analyse, submit the active version, answer the review, approve and download a matching report", async ({
  page,
}, info) => {
  test.setTimeout(240_000);
  // Version 2 drops the first two rows of version 1.
  const lines = readFileSync(CSV, "utf8").trimEnd().split("\n");
  const v2 = info.outputPath("curing-v2.csv");
  writeFileSync(v2, [lines[0], ...lines.slice(3)].join("\n") + "\n");

  // The analyst sets up a study with a locked plan (through the API: the design journey is its own test).
  await signIn(page, "analyst");
  const { study } = (await send(page.request, "post", "/api/studies", {
    title: TITLE,
    objective: "Does the curing method change the 28-day strength of test cylinders?",
    outcomeName: "Compressive strength",
    outcomeUnit: "MPa",
    factorName: "Curing method",
    levels: LEVELS,
    context: "general",
  })) as { study: { id: number } };
  const id = study.id;
  await send(page.request, "put", `/api/studies/${id}/design`, {
    independence: "independent",
    scale: "continuous",
    question: "means",
    groupSizes: "equal",
    hasControl: "no",
    comparisons: "all-pairs",
    assignment: "randomized",
  });
  await send(page.request, "post", `/api/studies/${id}/plan/lock`, {});

  // Upload v1 and run the planned analysis on it.
  await page.goto(`/studies/${id}/data`);
  await upload(page, CSV, 1);
  const datasets = async () =>
    (
      (await (await page.request.get(`/api/studies/${id}/datasets`)).json()) as {
        datasets: { id: number; version: number; active: boolean }[];
      }
    ).datasets;
  const d1 = (await datasets()).find((d) => d.version === 1)!;
  const a1 = (await send(page.request, "post", `/api/studies/${id}/analyses`, { datasetId: d1.id })) as {
    analysis: { id: number };
  };
  expect(a1.analysis.id).toBeGreaterThan(0);

  // Upload v2: it becomes the active version, so the analysis of v1 cannot be submitted.
  await page.goto(`/studies/${id}/data`);
  await upload(page, v2, 2);
  await expect(page.getByTestId("version-2")).toContainText("Active");
  await expect(page.getByTestId("progress-banner")).toContainText("Data not yet analysed");
  const refused = await page.request.post(`/api/studies/${id}/submit`, {
    headers: {
      "x-csrf-token": ((await (await page.request.get("/api/auth/csrf")).json()) as { token: string }).token,
    },
    data: { analysisId: a1.analysis.id },
  });
  expect(refused.status()).toBe(409);
  expect(((await refused.json()) as { error: { code: string } }).error.code).toBe(
    "analysis_not_on_active_version",
  );
  // The same refusal through the page: the results step still shows the analysis of v1.
  await page.goto(`/studies/${id}/results`);
  await page.getByRole("button", { name: "Submit for review…" }).click();
  await page.getByRole("button", { name: "Yes, submit" }).click();
  await expect(page.getByText("The study was not submitted")).toBeVisible();
  await expect(page.getByText(/the active version is 2/)).toBeVisible();
  await shot(page, info, "01-v2-not-analysed");

  // Run on v2 and submit from the results step.
  const d2 = (await datasets()).find((d) => d.version === 2)!;
  await send(page.request, "post", `/api/studies/${id}/analyses`, { datasetId: d2.id });
  await page.goto(`/studies/${id}/results`);
  await expect(page.getByTestId("progress-banner")).toContainText("Ready to submit");
  await page.getByRole("button", { name: "Submit for review…" }).click();
  await page.getByRole("button", { name: "Yes, submit" }).click();
  await expect(page.getByText("Submitted for review: a reviewer will approve it")).toBeVisible();
  await signOut(page);

  // The reviewer sends it back with a comment at the data step.
  await signIn(page, "reviewer");
  await page.goto(`/reviews/${id}`);
  const decision = page.getByTestId("decision-panel");
  await decision.getByRole("button", { name: "Request changes" }).click();
  await decision.getByLabel("What needs to change").fill("Say why two cylinders were dropped in version 2.");
  await decision.getByText("Add a comment on a particular step (optional)").click();
  await decision.getByLabel("Data step").fill("Name the two dropped rows and the reason.");
  await decision.getByRole("button", { name: "Send back to the analyst" }).click();
  await expect(page.getByText("The study went back to its analyst with your comments.")).toBeVisible();
  await signOut(page);

  // The analyst sees "Changes requested" first, replies at the data step, makes v1 active again,
  // analyses it and submits again.
  await signIn(page, "analyst");
  await expect(page.getByTestId("waiting-item").first()).toContainText(TITLE);
  await expect(page.getByTestId("waiting-item").first()).toContainText("Changes requested");
  await page.goto(`/studies/${id}/data`);
  await expect(page.getByTestId("progress-banner")).toContainText("Changes requested");
  const comments = page.getByTestId("step-comments");
  await expect(comments).toContainText("Name the two dropped rows and the reason.");
  await comments
    .getByLabel("Your reply")
    .fill("They were mislabelled; version 1 with every row is used again.");
  await comments.getByRole("button", { name: "Reply" }).click();
  await expect(comments.getByRole("list", { name: "Replies" })).toContainText("They were mislabelled");
  await page.getByRole("button", { name: "Make version 1 active" }).click();
  await expect(page.getByTestId("version-1")).toContainText("Active");
  await shot(page, info, "02-reply-and-make-active");
  const a3 = (await send(page.request, "post", `/api/studies/${id}/analyses`, { datasetId: d1.id })) as {
    analysis: { id: number; chosenTest: string };
  };
  await page.goto(`/studies/${id}/results`);
  await page.getByRole("button", { name: "Submit for review…" }).click();
  await page.getByRole("button", { name: "Yes, submit" }).click();
  await expect(page.getByText("Submitted for review: a reviewer will approve it")).toBeVisible();
  await signOut(page);

  // The reviewer sees what changed since round 1 and approves.
  await signIn(page, "reviewer");
  await page.goto(`/reviews/${id}`);
  const changes = page.getByTestId("round-changes");
  await expect(changes).toContainText("What changed since round 1");
  await expect(changes).toContainText("Data version 2 → 1.");
  await expect(page.getByTestId("history-timeline")).toContainText("They were mislabelled");
  await shot(page, info, "03-what-changed");
  await decision.getByLabel("Your password").fill(PASSWORD);
  await decision.getByRole("button", { name: "Sign and approve" }).click();
  await expect(decision.getByRole("heading", { name: "Approved" })).toBeVisible();
  await signOut(page);

  // The writer downloads the DOCX: data version, test and family size are those of the approved analysis.
  await signIn(page, "writer");
  const docx = await page.request.get(`/api/studies/${id}/report.docx`);
  expect(docx.ok()).toBe(true);
  const text = await docxText(await docx.body());
  const stored = (
    (await (await page.request.get(`/api/studies/${id}/analyses/${a3.analysis.id}`)).json()) as {
      analysis: { datasetVersion: number; chosenTest: string; result: { familyWiseError?: { m?: number } } };
    }
  ).analysis;
  expect(stored.datasetVersion).toBe(1);
  expect(text).toContain("dataset version 1");
  // Four groups, all pairs: m = 4 · 3 / 2 = 6 (common practice).
  expect(text).toContain("With m = 6 comparisons");
  const testWords: Record<string, RegExp> = {
    anova: /one-way ANOVA/i,
    welch: /Welch/,
    "kruskal-wallis": /Kruskal–Wallis/,
  };
  expect(text).toMatch(testWords[stored.chosenTest]!);
  expect(text).not.toMatch(/NaN|undefined|Infinity|figure not available/);
});
