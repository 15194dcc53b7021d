/**
 * Helpers beside the workspace fields, in Chromium against the running app
 * (HETEROLANE_TEST_URL): an engineer opens the drift budget beside the laser
 * pair's drift field, applies its result, saves, and the server re-checks the
 * plan as for any other edit (a new revision, a changed finding).
 * Screenshot: HETEROLANE_TEST_OUTPUT (default test-output)/e2e-helpers.png.
 */
import { readFileSync } from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { BASE_URL, closeTestPool, makeTeamWithRoles, type TeamWithRoles } from "../setup/auth-helpers";
import { launchBrowser, screenshot } from "../setup/browser";
import { call, missionWithPlan } from "../setup/workspace-helpers";

// Example 1 of the plan format: laser pair LP1 at 193.4 THz, step 10 MHz, drift ± 20 MHz, detector IF 0.05–6 GHz.
const PLAN = JSON.parse(readFileSync(path.join(__dirname, "../fixtures/plans/ex1-single-channel.plan.json"), "utf8"));

let team: TeamWithRoles;
let missionId = "";

beforeAll(async () => {
  team = await makeTeamWithRoles();
  missionId = await missionWithPlan(team.engineer, PLAN, "E2E helpers mission (test data)");
}, 420_000);

afterAll(async () => {
  await closeTestPool();
});

async function pageAs(c: TeamWithRoles["engineer"]) {
  const ctx = await launchBrowser({ width: 1400, height: 1100 });
  const host = new URL(BASE_URL).hostname;
  await ctx.context.addCookies([...c.cookies].map(([name, value]) => ({ name, value, domain: host, path: "/" })));
  ctx.page.setDefaultTimeout(120_000);
  ctx.page.setDefaultNavigationTimeout(180_000);
  return ctx;
}

describe("helpers beside the workspace fields", () => {
  it("the lane view offers Save as revision only to a role that may edit; the main navigation links Tools, Audit and Notifications", async () => {
    const viewer = await pageAs(team.viewer);
    try {
      await viewer.page.goto(`${BASE_URL}/missions/${missionId}/lanes`);
      await viewer.page.getByTestId("place-A").waitFor();
      expect(await viewer.page.getByTestId("save-A").count()).toBe(0);
      const nav = viewer.page.getByRole("navigation", { name: "Main" });
      for (const [name, href] of [
        ["Tools", "/tools"],
        ["Audit", "/audit"],
        ["Notifications", "/settings/notifications"],
      ] as const)
        expect(await nav.getByRole("link", { name }).getAttribute("href")).toBe(href);
    } finally {
      await viewer.close();
    }
    const engineer = await pageAs(team.engineer);
    try {
      await engineer.page.goto(`${BASE_URL}/missions/${missionId}/lanes`);
      await engineer.page.getByTestId("save-A").waitFor();
    } finally {
      await engineer.close();
    }
  }, 420_000);

  it("the notation helper in the channel form fills centre, DSB offset and bandwidth (not saved until the user saves)", async () => {
    const ctx = await pageAs(team.engineer);
    const page = ctx.page;
    try {
      await page.goto(`${BASE_URL}/missions/${missionId}`);
      await page.getByRole("button", { name: "Edit channel wv1" }).click();
      const dialog = page.getByRole("dialog");
      await dialog.getByRole("button", { name: "Helper: channel notation" }).click();
      const helper = dialog.locator('[data-helper="channel-notation"]');
      // MHS channel H3 as its channel table writes it (EUMETSAT MHS product description): 183.311 ± 3.00 GHz, 2 × 1000 MHz.
      await helper.getByLabel("Channel", { exact: true }).fill("183.311 ± 3.00 GHz, 2 × 1000 MHz");
      await helper.getByRole("button", { name: "Apply channel" }).click();
      expect(Number(await dialog.locator('input[name="centerGHz"]').inputValue())).toBe(183.311);
      expect(Number(await dialog.locator('input[name="dsbOffsetGHz"]').inputValue())).toBe(3);
      expect(Number(await dialog.locator('input[name="bandwidthMHz"]').inputValue())).toBe(1000);
      await dialog.getByRole("button", { name: "Cancel" }).click();
      const stored = await call(team.engineer, "GET", `/api/v1/missions/${missionId}/channels`);
      const wv1 = (
        stored.body as { channels: { key: string; centerGHz: number; dsbOffsetGHz: number | null }[] }
      ).channels.find((c) => c.key === "wv1");
      expect(wv1).toMatchObject({ centerGHz: 183.31, dsbOffsetGHz: null });
    } finally {
      await ctx.close();
    }
  }, 420_000);

  it("an engineer applies the drift budget to driftMHz, saves, and the plan is re-checked", async () => {
    const ctx = await launchBrowser({ width: 1400, height: 1100 });
    const host = new URL(BASE_URL).hostname;
    await ctx.context.addCookies(
      [...team.engineer.cookies].map(([name, value]) => ({ name, value, domain: host, path: "/" })),
    );
    const page = ctx.page;
    page.setDefaultTimeout(120_000);
    page.setDefaultNavigationTimeout(180_000);
    try {
      await page.goto(`${BASE_URL}/missions/${missionId}`);
      const panel = page.getByTestId("findings-panel");
      await expect
        .poll(async () => Number(await page.getByTestId("revision-number").innerText()), { timeout: 120_000 })
        .toBeGreaterThan(0);
      const revisionBefore = Number(await page.getByTestId("revision-number").innerText());
      // ± 20 MHz drift keeps every IF inside the detector band: no if-outside-detector finding yet.
      await panel.locator('[data-code="carrier-dominates-lo"]').first().waitFor();
      expect(await panel.locator('[data-code="if-outside-detector"]').count()).toBe(0);
      // The carrier is shown with its vacuum wavelength and grid channel (193.4 THz = 1550.116 nm, G.694.1 anchor channel).
      expect(await page.getByTestId("lasers-table").innerText()).toMatch(/1550\.1\d\d nm/);
      // Chain A: LO = 193.4 THz + 184.81 GHz = 193.58481 THz; upper sideband mode k = 1: 193.4 THz + 183.31 GHz = 193.58331 THz.
      const chainText = await page.locator('[data-chain="A"]').innerText();
      expect(chainText).toMatch(/LO \(laser 2\)\s*193\.5848 THz · 1548\.\d{3} nm/);
      expect(chainText).toMatch(/Sideband mode\s*193\.5833 THz/);

      await page.getByRole("button", { name: "Edit laser pair LP1" }).click();
      const dialog = page.getByRole("dialog");
      await dialog.getByRole("button", { name: "Helper: drift budget" }).click();
      const helper = dialog.locator('[data-helper="drift-budget"]');
      await helper.waitFor();
      // A free-running laser 2 of ± 2000 MHz dominates the budget; with the default terms (1 mK, 0.5 MHz lock, 10 MHz step)
      // the worst-case sum is a little above 2000 MHz.
      await helper.getByLabel(/Laser 2 stability/).fill("2000");
      const drift = await helper.getByTestId("db-drift").innerText();
      const shown = Number(/([\d.]+)/.exec(drift.replace(/±/, ""))?.[1]);
      expect(shown).toBeGreaterThan(2005);
      expect(shown).toBeLessThan(2020);
      await helper.getByRole("button", { name: "Apply drift" }).click();
      const field = dialog.locator('input[name="driftMHz"]');
      const applied = Number(await field.inputValue());
      expect(applied).toBeGreaterThanOrEqual(shown);
      expect(applied).toBeLessThan(shown + 0.1 + 1e-9);
      await screenshot(page, "e2e-helpers");
      await dialog.getByRole("button", { name: "Save laser pair" }).click();
      await dialog.waitFor({ state: "detached" });

      await expect
        .poll(async () => Number(await page.getByTestId("revision-number").innerText()), { timeout: 120_000 })
        .toBeGreaterThan(revisionBefore);
      // The wider drift pushes IF edges outside the 0.05–6 GHz detector band: the re-check reports it.
      await panel.locator('[data-code="if-outside-detector"]').first().waitFor();

      const lasers = await call(team.engineer, "GET", `/api/v1/missions/${missionId}/lasers`);
      expect(lasers.status).toBe(200);
      const body = lasers.body as { lasers: { driftMHz: number }[] };
      expect(body.lasers[0]?.driftMHz).toBe(applied);
    } finally {
      await ctx.close();
    }
  }, 420_000);
});
