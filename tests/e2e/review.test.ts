/**
 * The review flow in Chromium against the running app: an engineer submits a
 * plan with open error findings and comments with an @mention; the lead
 * records a waiver for each error and baselines it; the report states the
 * approval and the waivers; the e-mails reach the right people.
 * Screenshots go to HETEROLANE_TEST_OUTPUT (default test-output).
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import {
  BASE_URL,
  closeTestPool,
  makeTeamWithRoles,
  readMail,
  testPool,
  type TeamWithRoles,
  type TestClient,
} from "../setup/auth-helpers";
import { launchBrowser, screenshot, type TestBrowser } from "../setup/browser";
import { call, missionWithPlan } from "../setup/workspace-helpers";
import { validPlanInput } from "../fixtures/valid-plan";

let team: TeamWithRoles;
let missionId = "";
// No regular-expression characters: readMail matches the subject as a pattern.
const name = `E2E review mission ${Math.random().toString(36).slice(2, 8)}, test data`;
const open: TestBrowser[] = [];

async function pageAs(c: TestClient): Promise<Page> {
  const b = await launchBrowser({ width: 1400, height: 1000 });
  open.push(b);
  const host = new URL(BASE_URL).hostname;
  await b.context.addCookies([...c.cookies].map(([n, value]) => ({ name: n, value, domain: host, path: "/" })));
  b.page.setDefaultTimeout(240_000);
  b.page.setDefaultNavigationTimeout(180_000);
  return b.page;
}

beforeAll(async () => {
  team = await makeTeamWithRoles();
  missionId = await missionWithPlan(team.engineer, { ...validPlanInput(), name });
}, 300_000);

afterAll(async () => {
  for (const b of open) await b.close();
  await closeTestPool();
});

describe("review flow", () => {
  it("submit → comment with @mention → waivers → baseline, with e-mails and the report's approval section", async () => {
    const errors: { id: string }[] = (await call(team.viewer, "GET", `/api/v1/missions/${missionId}/review`)).body
      .errors;
    expect(errors.length).toBeGreaterThan(0);

    // The engineer submits and comments.
    const eng = await pageAs(team.engineer);
    await eng.goto(`${BASE_URL}/missions/${missionId}`);
    const badge = eng.getByTestId("review-state");
    await expect.poll(() => badge.innerText(), { timeout: 240_000 }).toBe("Draft");
    expect(await eng.getByRole("button", { name: /Baseline revision/ }).count()).toBe(0);
    await eng.getByRole("button", { name: /Submit revision \d+ for review/ }).click();
    await expect.poll(() => badge.innerText(), { timeout: 240_000 }).toBe("In review");
    await eng.getByLabel(/^Comment/).fill(`@${team.lead.email} the slot overlap on wv1 is known; please waive it.`);
    await eng.getByRole("button", { name: "Post comment" }).click();
    await eng.getByTestId("comments").getByText("the slot overlap on wv1 is known").waitFor();
    await screenshot(eng, "review-engineer-submitted");

    // The lead is notified twice: review requested and mentioned.
    await readMail(team.lead.email, `submitted for review: ${name}`);
    const mention = await readMail(team.lead.email, `mentioned you on ${name}`);
    expect(mention.text).toContain("please waive it");

    // The lead waives every open error and baselines.
    const lead = await pageAs(team.lead);
    await lead.goto(`${BASE_URL}/missions/${missionId}`);
    await expect.poll(() => lead.getByTestId("review-state").innerText(), { timeout: 240_000 }).toBe("In review");
    const reasonBoxes = lead.getByLabel("Why is this error acceptable?");
    await expect.poll(() => reasonBoxes.count(), { timeout: 240_000 }).toBe(errors.length);
    // Trying to baseline first is refused by the server with the reason.
    await lead.getByRole("button", { name: /Baseline revision/ }).click();
    await lead
      .getByRole("alert")
      .filter({ hasText: /no waiver/ })
      .first()
      .waitFor();
    for (let left = errors.length; left > 0; left--) {
      await reasonBoxes.first().fill(`Accepted for the breadboard (test ${left})`);
      await lead.getByRole("button", { name: "Record waiver" }).first().click();
      await expect.poll(() => reasonBoxes.count(), { timeout: 240_000 }).toBe(left - 1);
    }
    await screenshot(lead, "review-lead-waived");
    await lead.getByLabel(/^Note/).fill("Baselined for ordering the breadboard parts.");
    await lead.getByRole("button", { name: /Baseline revision/ }).click();
    await expect.poll(() => lead.getByTestId("review-state").innerText(), { timeout: 240_000 }).toBe("Baselined");
    await screenshot(lead, "review-baselined");

    // The author hears about the decision.
    const decided = await readMail(team.engineer.email, `baselined: ${name}`);
    expect(decided.text).toContain("Baselined for ordering");

    // The report states the approval and the waivers.
    await lead.goto(`${BASE_URL}/missions/${missionId}/report`);
    const approval = lead.getByTestId("report-approval");
    await approval.waitFor();
    const text = await approval.innerText();
    expect(text).toContain("Baselined");
    expect(text).toContain(team.lead.name);
    expect(await approval.locator("tbody tr").count()).toBe(errors.length);
    await screenshot(lead, "review-report");

    // The audit trail lists the review actions of this mission.
    await lead.goto(`${BASE_URL}/audit?mission=${missionId}`);
    const audit = await lead.getByTestId("audit-table").innerText();
    for (const a of ["review-submit", "comment", "waiver-create", "review-baseline"]) expect(audit).toContain(a);
    await screenshot(lead, "review-audit");

    // The compare page shows the earlier and the later revision side by side.
    await lead.goto(`${BASE_URL}/missions/${missionId}/compare?from=1&to=2`);
    const view = lead.getByTestId("compare-view");
    await view.waitFor();
    expect(await view.innerText()).toContain("Plan differences");
    await screenshot(lead, "review-compare");

    // The lead switches review-request e-mails off on the settings page; the choice is stored.
    await lead.goto(`${BASE_URL}/settings/notifications`);
    const box = lead.getByLabel("A plan is submitted for review");
    expect(await box.isChecked()).toBe(true);
    await box.uncheck();
    await lead.getByRole("button", { name: "Save" }).click();
    await lead.getByRole("status").filter({ hasText: "Saved" }).waitFor();
    const { rows } = await testPool().query(
      `select review_requested, review_decided, mentioned from notification_preferences where user_id = $1`,
      [team.lead.userId],
    );
    expect(rows).toEqual([{ review_requested: false, review_decided: true, mentioned: true }]);
  }, 1_500_000);
});
