/**
 * Waived findings are shown as waived everywhere a viewer reads them: the
 * missions list, the header counts, the findings panel (who and why on
 * keyboard focus), the channel table, the lane view and the report
 * (issue 16). Screenshots go to HETEROLANE_TEST_OUTPUT (default test-output).
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { BASE_URL, closeTestPool, makeTeamWithRoles, type TeamWithRoles } from "../setup/auth-helpers";
import { screenshot, type TestBrowser } from "../setup/browser";
import { signedInBrowser } from "../setup/signed-in-browser";
import { call, missionWithPlan } from "../setup/workspace-helpers";
import { validPlanInput } from "../fixtures/valid-plan";

let team: TeamWithRoles;
let missionId = "";
let errorCount = 0;
const name = `E2E waived mission ${Math.random().toString(36).slice(2, 8)}`;
const REASON = "Accepted for the breadboard by the lead";
let browser: TestBrowser | null = null;

beforeAll(async () => {
  team = await makeTeamWithRoles();
  missionId = await missionWithPlan(team.engineer, { ...validPlanInput(), name });
  const R = `/api/v1/missions/${missionId}/review`;
  if ((await call(team.engineer, "POST", `${R}/submit`, {})).status !== 200) throw new Error("submit failed");
  const errors = (await call(team.lead, "GET", R)).body.errors as { id: string }[];
  errorCount = errors.length;
  for (const e of errors) {
    const w = await call(team.lead, "POST", `${R}/waivers`, { findingId: e.id, reason: REASON });
    if (w.status !== 201) throw new Error(`waiver: ${w.status} ${w.text}`);
  }
  const d = await call(team.lead, "POST", `${R}/decide`, { decision: "baseline", note: "ordered" });
  if (d.status !== 200) throw new Error(`baseline: ${d.status} ${d.text}`);
}, 300_000);

afterAll(async () => {
  await browser?.close();
  await closeTestPool();
});

async function pageAsViewer(): Promise<Page> {
  browser = await signedInBrowser(team.viewer, { timeoutMs: 240_000 });
  return browser.page;
}

describe("waived findings, as a viewer reads them", () => {
  it("are marked as waived in the list, the header, the findings, the channel table, the lane view and the report", async () => {
    expect(errorCount).toBe(4);
    const page = await pageAsViewer();

    await page.goto(`${BASE_URL}/missions`);
    const row = page.locator("tr", { hasText: name });
    await row.getByTestId("mission-waived").waitFor();
    expect(await row.getByTestId("mission-waived").innerText()).toBe("all waived");
    expect(await row.getByTestId("mission-state").innerText()).toBe("Baselined");
    await screenshot(page, "waivers-missions-list");

    await page.goto(`${BASE_URL}/missions/${missionId}`);
    const count = page.getByTestId("error-count");
    await expect.poll(() => count.innerText(), { timeout: 240_000 }).toBe("4 errors, all waived");
    const panel = page.getByTestId("findings-panel");
    await expect.poll(() => panel.locator('[data-waived="true"]').count(), { timeout: 240_000 }).toBe(4);
    // Who and why on keyboard focus: the mark is focusable and its tooltip becomes visible.
    const mark = panel.getByTestId("waived").first();
    await mark.locator("[tabindex]").focus();
    const tip = mark.getByRole("tooltip");
    await expect.poll(() => tip.isVisible()).toBe(true);
    expect(await tip.innerText()).toContain(`Waived by ${team.lead.name}`);
    expect(await tip.innerText()).toContain(REASON);
    await screenshot(page, "waivers-findings-focus");
    expect(await page.getByTestId("worst-finding").getByTestId("waived").count()).toBeGreaterThan(0);
    await screenshot(page, "waivers-channel-table");

    await page.goto(`${BASE_URL}/missions/${missionId}/lanes`);
    const live = page.getByTestId("findings-panel");
    await expect.poll(() => live.locator('[data-waived="true"]').count(), { timeout: 240_000 }).toBe(4);
    expect(await live.locator("h2").innerText()).toContain("4 errors, all waived");
    await screenshot(page, "waivers-lane-view");

    await page.goto(`${BASE_URL}/missions/${missionId}/report`);
    await expect.poll(() => page.getByTestId("report-waived").count(), { timeout: 240_000 }).toBe(4);
    expect(await page.getByTestId("report-waived").first().innerText()).toContain(REASON);
    const approval = await page.getByTestId("report-approval").innerText();
    expect(approval).not.toMatch(/\|/);
    await screenshot(page, "waivers-report");
  }, 600_000);
});
