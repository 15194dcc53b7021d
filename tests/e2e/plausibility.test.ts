/**
 * A plausibility warning on an absurd resonator (issue 16): an engineer sets
 * a loaded Q of 5·10¹⁰ — inside the hard range, beyond what lithium niobate
 * reaches — saves, and the findings name it in words; a Q of 10³⁰ is a field
 * error beside the field and nothing is saved. Screenshots go to
 * HETEROLANE_TEST_OUTPUT (default test-output).
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { BASE_URL, closeTestPool, makeTeamWithRoles, type TeamWithRoles } from "../setup/auth-helpers";
import { screenshot, type TestBrowser } from "../setup/browser";
import { signedInBrowser } from "../setup/signed-in-browser";
import { missionWithPlan } from "../setup/workspace-helpers";
import { validPlanInput } from "../fixtures/valid-plan";

let team: TeamWithRoles;
let missionId = "";
let browser: TestBrowser | null = null;

beforeAll(async () => {
  team = await makeTeamWithRoles();
  missionId = await missionWithPlan(team.engineer, validPlanInput());
}, 300_000);

afterAll(async () => {
  await browser?.close();
  await closeTestPool();
});

describe("plausibility of a resonator", () => {
  it("warns in words about a Q beyond lithium niobate, and refuses a Q of 1e30 beside the field", async () => {
    browser = await signedInBrowser(team.engineer, { timeoutMs: 240_000 });
    const page = browser.page;
    await page.goto(`${BASE_URL}/missions/${missionId}`);
    const revision = page.getByTestId("revision-number");
    await expect.poll(async () => Number(await revision.innerText()), { timeout: 240_000 }).toBeGreaterThan(0);
    const before = Number(await revision.innerText());

    await page.getByRole("button", { name: "Edit resonator R1" }).click();
    let dialog = page.getByRole("dialog");
    const q = dialog.locator('input[name="loadedQ"]');
    await q.fill("1e30");
    await dialog.getByRole("button", { name: "Save resonator" }).click();
    await dialog.getByText(/must be at most 1000000000000/).waitFor();
    expect(await q.getAttribute("aria-invalid")).toBe("true");
    await screenshot(page, "plausibility-q-refused");
    expect(Number(await revision.innerText())).toBe(before);

    await q.fill("5e10");
    await dialog.getByRole("button", { name: "Save resonator" }).click();
    await dialog.waitFor({ state: "detached" });
    const panel = page.getByTestId("findings-panel");
    const warning = panel.locator('[data-code="q-beyond-lithium-niobate"]').first();
    await warning.waitFor({ timeout: 240_000 });
    expect(await warning.innerText()).toContain("lithium niobate");
    expect(Number(await revision.innerText())).toBeGreaterThan(before);
    await screenshot(page, "plausibility-q-warning");
    dialog = page.getByRole("dialog");
    expect(await dialog.count()).toBe(0);
  }, 600_000);
});
