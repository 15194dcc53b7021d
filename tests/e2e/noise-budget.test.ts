/**
 * Noise budget in Chromium against the running app (HETEROLANE_TEST_URL):
 * a mission with Example 1 given a measured conversion efficiency (demo
 * data) shows its channel's noise budget in the lane view with the dominant
 * term in words; moving the LO-power what-if control changes NEΔT live.
 * Screenshot: ${HETEROLANE_TEST_OUTPUT ?? "test-output"}/e2e-noise-budget.png.
 */
import { readFileSync } from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { BASE_URL, closeTestPool, makeTeamWithRoles, type TeamWithRoles } from "../setup/auth-helpers";
import { launchBrowser, screenshot, type TestBrowser } from "../setup/browser";

const PLAN = JSON.parse(readFileSync(path.join(__dirname, "../fixtures/plans/ex1-single-channel.plan.json"), "utf8"));
PLAN.format = "heterolane.plan/2";
PLAN.resonators[0].conversionEfficiency = 0.01;
PLAN.channels[0].receiverKSource = "computed";

let team: TeamWithRoles;
let browser: TestBrowser;
let missionId = "";

beforeAll(async () => {
  team = await makeTeamWithRoles();
  const created = await team.engineer.fetch("/api/v1/missions", {
    method: "POST",
    json: { name: "E2E noise budget mission (test data)" },
  });
  expect(created.status).toBe(201);
  missionId = ((await created.json()) as { id: string }).id;
  const imported = await team.engineer.fetch(`/api/v1/missions/${missionId}/plan`, { method: "POST", json: PLAN });
  expect(imported.status).toBe(201);
  browser = await launchBrowser({ width: 1400, height: 1000 });
}, 300_000);

afterAll(async () => {
  await browser?.close();
  await closeTestPool();
});

describe("noise budget", () => {
  it("shows a channel's budget and moves NEΔT when the LO power what-if changes", async () => {
    const host = new URL(BASE_URL).hostname;
    await browser.context.addCookies(
      [...team.engineer.cookies].map(([name, value]) => ({ name, value, domain: host, path: "/" })),
    );
    const page = await browser.context.newPage();
    await page.setViewportSize({ width: 1400, height: 1000 });
    await page.goto(`${BASE_URL}/missions/${missionId}/lanes`);
    await page.locator('[data-testid="lane-view"][data-ready="1"]').waitFor({ timeout: 120_000 });
    const panel = page.getByTestId("noise-budget");
    await panel.waitFor();
    expect(await page.getByTestId("noise-dominant").innerText()).toMatch(/dominates \(/);
    expect(await panel.locator('[data-caution="laser-safety"]').count()).toBeGreaterThanOrEqual(2);
    const before = await page.getByTestId("whatif-nedt").innerText();
    await page.getByTestId("whatif-lo").fill("8");
    await expect.poll(() => page.getByTestId("whatif-nedt").innerText()).not.toBe(before);
    await panel.scrollIntoViewIfNeeded();
    await screenshot(page, "e2e-noise-budget");
  }, 180_000);
});
