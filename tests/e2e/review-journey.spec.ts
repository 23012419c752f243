import { expect, test, type Page, type TestInfo } from "@playwright/test";

const DEMO_PASSWORD = "trailhead-demo";
const STUDY_TITLE = "Seedling height under three light schedules";
const NEW_REVIEWER = {
  email: "noor.haddad@waymark.test",
  name: "Noor Haddad",
  password: "lantern orchard gravel tide 42",
};

async function shot(page: Page, info: TestInfo, step: string) {
  await page.evaluate(() => window.scrollTo(0, 0));
  await page.screenshot({ path: info.outputPath(`review-${step}.png`), fullPage: true });
}

async function signIn(page: Page, email: string, password = DEMO_PASSWORD) {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByTestId("signed-in-user")).toBeVisible();
}

async function signOut(page: Page) {
  await page.getByRole("button", { name: "Sign out" }).click();
  await expect(page).toHaveURL(/\/sign-in$/);
}

const nav = (page: Page, name: string) =>
  page.getByRole("navigation", { name: "Main" }).getByRole("link", { name, exact: true });

test("a study goes from submission through a newly invited reviewer's signed approval back to its analyst", async ({
  page,
  browser,
}, info) => {
  test.setTimeout(180_000);

  // 1. The demo reviewer sent this study back with comments at two steps. The analyst finds it
  // first on the home page, replies at each step and submits it again.
  await signIn(page, "analyst@waymark.test");
  const list = await page.request.get("/api/studies");
  expect(list.ok()).toBe(true);
  const study = (
    (await list.json()) as {
      studies: { id: number; title: string; status: string; progress: { state: string } }[];
    }
  ).studies.find((s) => s.title === STUDY_TITLE);
  expect(study, `the demo study "${STUDY_TITLE}" is seeded`).toBeTruthy();
  expect(study!.status).toBe("draft");
  expect(study!.progress.state).toBe("changes-requested");
  const waiting = page.getByTestId("waiting-item");
  await expect(waiting.first()).toContainText(STUDY_TITLE);
  await expect(waiting.first()).toContainText("Changes requested");
  await shot(page, info, "01-home-sent-back");
  await waiting.first().getByRole("link", { name: STUDY_TITLE }).click();
  await expect(page.getByTestId("progress-banner")).toContainText("Changes requested");
  await page.goto(`/studies/${study!.id}/data`);
  const dataComments = page.getByTestId("step-comments");
  await expect(dataComments).toContainText("Two plants (16 h and 20 h light) are far taller");
  await dataComments
    .getByLabel("Your reply")
    .fill("Both plants stay in: the logbook shows no handling error.");
  await dataComments.getByRole("button", { name: "Reply" }).click();
  await expect(dataComments.getByRole("list", { name: "Replies" })).toContainText("Both plants stay in");
  await shot(page, info, "01-reply-at-data");
  await page.goto(`/studies/${study!.id}/results`);
  const resultComments = page.getByTestId("step-comments");
  await expect(resultComments).toContainText("Give the shift of each schedule against 12 h light");
  await expect(resultComments).toContainText("Please say how the two bolted plants are handled");
  const shiftComment = resultComments
    .locator("li")
    .filter({ hasText: "Give the shift of each schedule" })
    .first();
  await shiftComment.getByLabel("Your reply").fill("The intervals are now in the comparisons table.");
  await shiftComment.getByRole("button", { name: "Reply" }).click();
  await expect(shiftComment.getByRole("list", { name: "Replies" })).toContainText("The intervals are now");
  await page.getByRole("button", { name: "Submit for review…" }).click();
  await page.getByRole("button", { name: "Yes, submit" }).click();
  await expect(page.getByText("Submitted for review: a reviewer will approve it")).toBeVisible();
  await nav(page, "Studies").click();
  const row = page.getByRole("listitem").filter({ hasText: STUDY_TITLE });
  await expect(row.getByTestId("progress-badge")).toHaveText("Awaiting review");
  await shot(page, info, "01-submitted");
  await signOut(page);

  // 2. The admin invites a new reviewer.
  await signIn(page, "admin@waymark.test");
  await nav(page, "People").click();
  await expect(page.getByRole("heading", { level: 1, name: "People" })).toBeVisible();
  const form = page.getByRole("form", { name: "Invite a person" });
  await form.getByLabel("E-mail").fill(NEW_REVIEWER.email);
  await form.getByLabel("Role").selectOption("reviewer");
  await form.getByRole("button", { name: "Send invitation" }).click();
  await expect(
    page.getByRole("status").filter({ hasText: `Invitation sent to ${NEW_REVIEWER.email}` }),
  ).toBeVisible();
  await expect(page.getByTestId("invitations-table").getByText(NEW_REVIEWER.email)).toBeVisible();
  await shot(page, info, "02-invited");

  // 3. The admin finds the invitation in the demo mailbox.
  await nav(page, "Mailbox").click();
  await expect(page.getByRole("heading", { level: 1, name: "Mailbox" })).toBeVisible();
  const message = page
    .getByRole("list", { name: "Messages" })
    .getByRole("button")
    .filter({ hasText: NEW_REVIEWER.email })
    .filter({ hasText: "invited you as reviewer" });
  await expect(message.first()).toBeVisible({ timeout: 20_000 });
  await message.first().click();
  const inviteLink = page.getByTestId("mail-text").getByRole("link", { name: /\/invite\// });
  await expect(inviteLink).toBeVisible();
  await shot(page, info, "03-mailbox");
  const href = await inviteLink.getAttribute("href");
  expect(href).toMatch(/\/invite\/[\w-]+$/);

  // 4. The invitee opens the link in their own browser and accepts.
  const inviteeContext = await browser.newContext();
  const invitee = await inviteeContext.newPage();
  await invitee.goto(new URL(href!).pathname);
  await expect(invitee.getByTestId("invited-email")).toHaveText(NEW_REVIEWER.email);
  await invitee.getByLabel("Your name").fill(NEW_REVIEWER.name);
  await invitee.getByLabel("Password", { exact: true }).fill(NEW_REVIEWER.password);
  await invitee.getByLabel("Password again").fill(NEW_REVIEWER.password);
  await shot(invitee, info, "04-accept");
  await invitee.getByRole("button", { name: "Create account and sign in" }).click();
  await expect(invitee.getByTestId("signed-in-user")).toHaveText(NEW_REVIEWER.name);
  await expect(invitee.getByTestId("signed-in-role")).toHaveText("Reviewer");
  await shot(invitee, info, "05-signed-in");

  // 5. The new reviewer opens the study from the queue and approves it with a signature.
  await nav(invitee, "Review queue").click();
  await expect(invitee.getByRole("heading", { level: 1, name: "Review queue" })).toBeVisible();
  await expect(invitee.getByTestId("review-queue").getByRole("link", { name: STUDY_TITLE })).toBeVisible();
  await shot(invitee, info, "06-queue");
  await invitee.getByTestId("review-queue").getByRole("link", { name: STUDY_TITLE }).click();
  await expect(invitee.getByRole("heading", { level: 1, name: STUDY_TITLE })).toBeVisible();
  await expect(invitee.getByTestId("results-panel")).toBeVisible();
  await expect(invitee.getByTestId("history-timeline")).toBeVisible();
  // Round 2: the reviewer sees what changed since round 1, and the analyst's replies.
  await expect(invitee.getByTestId("round-changes")).toContainText("What changed since round 1");
  await expect(invitee.getByTestId("history-timeline")).toContainText("Both plants stay in");
  await shot(invitee, info, "07-review-page");
  const decision = invitee.getByTestId("decision-panel");
  await expect(decision.getByLabel("Meaning of your signature")).toHaveValue(
    "Approved as the analysis of record",
  );
  await decision.getByLabel("Your password").fill("not the password");
  await decision.getByRole("button", { name: "Sign and approve" }).click();
  await expect(
    decision.getByText("The password is not correct, so the approval was not signed."),
  ).toBeVisible();
  await shot(invitee, info, "08-wrong-password");
  await decision.getByLabel("Your password").fill(NEW_REVIEWER.password);
  await decision.getByRole("button", { name: "Sign and approve" }).click();
  await expect(decision.getByRole("heading", { name: "Approved" })).toBeVisible();
  await expect(invitee.getByTestId("signature-record")).toContainText(NEW_REVIEWER.name);
  await shot(invitee, info, "09-approved");
  // The link cannot be used twice; the page says so plainly.
  await invitee.goto(new URL(href!).pathname);
  await expect(invitee.getByRole("heading", { name: "This invitation has been used" })).toBeVisible();
  await shot(invitee, info, "10-link-used");
  await inviteeContext.close();

  // 6. The analyst sees the approval.
  // The admin's tab is still on the mailbox, which sits outside the app's shell.
  await page.goto("/");
  await signOut(page);
  await signIn(page, "analyst@waymark.test");
  await nav(page, "Studies").click();
  await expect(
    page.getByRole("listitem").filter({ hasText: STUDY_TITLE }).getByTestId("progress-badge"),
  ).toHaveText("Approved");
  await shot(page, info, "11-analyst-sees-approval");
  await signOut(page);

  // 7. A writer reads the approved report; the download is a plain link to the DOCX.
  await signIn(page, "writer@waymark.test");
  await nav(page, "Reports").click();
  await page.getByTestId("approved-studies").getByRole("link", { name: STUDY_TITLE }).click();
  await expect(page.getByTestId("report-preview").getByRole("heading", { name: "Methods" })).toBeVisible();
  await expect(page.getByRole("link", { name: /Download DOCX/ })).toHaveAttribute(
    "href",
    `/api/studies/${study!.id}/report.docx`,
  );
  await expect(page.getByTestId("report-preview")).not.toContainText(/NaN|undefined/);
  await shot(page, info, "12-report");
  await signOut(page);

  // 8. The admin finds the signature in the audit trail and looks at the settings.
  await signIn(page, "admin@waymark.test");
  await nav(page, "Audit trail").click();
  await page
    .getByRole("form", { name: "Filter the audit trail" })
    .getByLabel("Action")
    .selectOption("study.approved");
  await page.getByRole("button", { name: "Show events" }).click();
  await expect(page).toHaveURL(/\/audit\?action=study\.approved$/);
  await expect(page.getByTestId("audit-table").getByText(NEW_REVIEWER.email).first()).toBeVisible();
  await expect(page.getByRole("link", { name: "Export these events as CSV" })).toHaveAttribute(
    "href",
    "/api/audit/export.csv?action=study.approved",
  );
  await shot(page, info, "13-audit");
  await nav(page, "Settings").click();
  await expect(page.getByRole("form", { name: "Organization settings" })).toBeVisible();
  await shot(page, info, "14-settings");
});
