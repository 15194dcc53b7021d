/**
 * @mentions in the comment field (issue 16): typing @ and letters offers the
 * team's members, the field says who will be notified, the mention sends
 * mail; an unknown name is a field error and nothing is posted.
 * Screenshots go to HETEROLANE_TEST_OUTPUT (default test-output).
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { BASE_URL, closeTestPool, makeTeamWithRoles, readMail, type TeamWithRoles } from "../setup/auth-helpers";
import { screenshot, type TestBrowser } from "../setup/browser";
import { signedInBrowser } from "../setup/signed-in-browser";
import { call, missionWithPlan } from "../setup/workspace-helpers";
import { validPlanInput } from "../fixtures/valid-plan";

let team: TeamWithRoles;
let missionId = "";
const name = `E2E mention mission ${Math.random().toString(36).slice(2, 8)}`;
let browser: TestBrowser | null = null;

beforeAll(async () => {
  team = await makeTeamWithRoles();
  missionId = await missionWithPlan(team.engineer, { ...validPlanInput(), name });
}, 300_000);

afterAll(async () => {
  await browser?.close();
  await closeTestPool();
});

describe("@mentions in a comment", () => {
  it("completes a member by name, says who will be notified and mails them; refuses an unknown name", async () => {
    browser = await signedInBrowser(team.engineer, { timeoutMs: 240_000 });
    const page = browser.page;
    await page.goto(`${BASE_URL}/missions/${missionId}`);
    const field = page.getByLabel(/^Comment/);
    await field.waitFor();

    // The lead's name is "Test <address>"; the last word of it is unique in the team.
    const last = team.lead.name.split(" ").at(-1)!;
    await field.pressSequentially(`Please check the slot overlap, @${last.slice(0, 6)}`);
    const option = page.getByRole("option", { name: new RegExp(team.lead.name) });
    await option.waitFor();
    await screenshot(page, "mentions-completion");
    await field.press("Enter");
    expect(await field.inputValue()).toBe(`Please check the slot overlap, @${team.lead.name} `);
    const preview = page.getByTestId("mention-preview");
    await expect
      .poll(() => preview.innerText())
      .toContain(`Will notify by e-mail: ${team.lead.name} (${team.lead.email})`);
    await page.getByRole("button", { name: "Post comment" }).click();
    await page.getByTestId("comments").getByText("Please check the slot overlap").waitFor();
    const mail = await readMail(team.lead.email, `mentioned you on ${name}`, 30_000);
    expect(mail.text).toContain("Please check the slot overlap");

    await field.fill("And @nobody-in-this-team should see it too");
    await preview.getByRole("alert").waitFor();
    expect(await preview.innerText()).toContain("no team member is called @nobody-in-this-team");
    expect(await field.getAttribute("aria-invalid")).toBe("true");
    expect(await page.getByRole("button", { name: "Post comment" }).isDisabled()).toBe(true);
    await screenshot(page, "mentions-unknown-refused");
    const comments = (await call(team.viewer, "GET", `/api/v1/missions/${missionId}/review/comments`)).body.comments;
    expect(comments).toHaveLength(1);
  }, 600_000);
});
