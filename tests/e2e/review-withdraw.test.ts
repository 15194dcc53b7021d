/**
 * Saving while a revision is in review asks first, naming the consequence;
 * "no" keeps the review (and the form's input), "yes" saves a new draft,
 * withdraws the review and mails the reviewers (issue 16). Screenshots go to
 * HETEROLANE_TEST_OUTPUT (default test-output).
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { BASE_URL, closeTestPool, makeTeamWithRoles, readMail, type TeamWithRoles } from "../setup/auth-helpers";
import { screenshot, type TestBrowser } from "../setup/browser";
import { signedInBrowser } from "../setup/signed-in-browser";
import { call, missionWithPlan } from "../setup/workspace-helpers";
import { validPlanInput } from "../fixtures/valid-plan";

let team: TeamWithRoles;
let missionId = "";
// No regular-expression characters: readMail matches the subject as a pattern.
const name = `E2E withdraw mission ${Math.random().toString(36).slice(2, 8)}`;
let browser: TestBrowser | null = null;

beforeAll(async () => {
  team = await makeTeamWithRoles();
  missionId = await missionWithPlan(team.engineer, { ...validPlanInput(), name });
  const s = await call(team.engineer, "POST", `/api/v1/missions/${missionId}/review/submit`, {});
  if (s.status !== 200) throw new Error(`submit answered ${s.status}: ${s.text}`);
}, 300_000);

afterAll(async () => {
  await browser?.close();
  await closeTestPool();
});

async function pageAsEngineer(): Promise<Page> {
  browser = await signedInBrowser(team.engineer, { timeoutMs: 240_000 });
  return browser.page;
}

describe("an edit during review", () => {
  it("asks before saving, keeps the review on no, and on yes withdraws it and mails the reviewers", async () => {
    const page = await pageAsEngineer();
    await page.goto(`${BASE_URL}/missions/${missionId}`);
    const badge = page.getByTestId("review-state");
    await expect.poll(() => badge.innerText(), { timeout: 240_000 }).toBe("In review");
    const revision = Number(await page.getByTestId("revision-number").innerText());

    const questions: string[] = [];
    let answer = false;
    page.on("dialog", (d) => {
      questions.push(d.message());
      void (answer ? d.accept() : d.dismiss());
    });

    await page.getByRole("button", { name: "Edit laser pair LP1" }).click();
    const dialog = page.getByRole("dialog");
    const drift = dialog.locator('input[name="driftMHz"]');
    await drift.fill("25");
    await dialog.getByRole("button", { name: "Save laser pair" }).click();
    await dialog.getByRole("alert").filter({ hasText: "stays in review" }).waitFor();
    expect(questions).toHaveLength(1);
    expect(questions[0]).toContain(`Revision ${revision} is in review`);
    expect(questions[0]).toContain("withdraws that review");
    expect(questions[0]).toContain("reviewers are told by e-mail");
    expect(await drift.inputValue()).toBe("25");
    await screenshot(page, "review-withdraw-declined");
    expect((await call(team.owner, "GET", `/api/v1/missions/${missionId}/review`)).body.state).toBe("in-review");

    answer = true;
    await dialog.getByRole("button", { name: "Save laser pair" }).click();
    await dialog.waitFor({ state: "detached" });
    expect(questions).toHaveLength(2);
    await expect.poll(() => badge.innerText(), { timeout: 240_000 }).toBe("Draft");
    await screenshot(page, "review-withdraw-saved");

    for (const reviewer of [team.lead, team.owner]) {
      const mail = await readMail(reviewer.email, `review withdrawn: ${name}, revision ${revision}`, 30_000);
      expect(mail.text).toContain(`draft revision ${revision + 1}`);
    }
  }, 600_000);
});
