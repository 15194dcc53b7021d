/**
 * The operating envelope's screens in Chromium against the running app
 * (HETEROLANE_TEST_URL), on the demo mission's plan (demo data, imported
 * through the API): the lane view's envelope bands and mode drift, the
 * chain cards' temperature windows, the per-channel plots and the chain's
 * LO × temperature chart with their keyboard read-out and tables, the
 * details panel's nominal and worst figures, and the printable report's
 * window, nominal/worst table and static plots.
 * Screenshots: ${HETEROLANE_TEST_OUTPUT ?? "test-output"}/e2e-envelope-*.png.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { demoPlan } from "@db/seed/mission-demo-plan";
import { BASE_URL, closeTestPool, makeTeamWithRoles, type TeamWithRoles, type TestClient } from "../setup/auth-helpers";
import { launchBrowser, screenshot, TEST_OUTPUT, type TestBrowser } from "../setup/browser";

let team: TeamWithRoles;
let browser: TestBrowser;
let missionId = "";

async function json(c: TestClient, p: string, init: Parameters<TestClient["fetch"]>[1] = {}) {
  const res = await c.fetch(p, init);
  const text = await res.text();
  return { status: res.status, body: text ? JSON.parse(text) : null };
}

async function pageAs(c: TestClient): Promise<Page> {
  const host = new URL(BASE_URL).hostname;
  await browser.context.addCookies([...c.cookies].map(([name, value]) => ({ name, value, domain: host, path: "/" })));
  const page = await browser.context.newPage();
  await page.setViewportSize({ width: 1400, height: 1000 });
  return page;
}

beforeAll(async () => {
  team = await makeTeamWithRoles();
  const created = await json(team.engineer, "/api/v1/missions", {
    method: "POST",
    json: { name: "E2E envelope mission (demo data)" },
  });
  expect(created.status).toBe(201);
  missionId = created.body.id;
  const imported = await json(team.engineer, `/api/v1/missions/${missionId}/plan`, {
    method: "POST",
    json: demoPlan(),
  });
  expect(imported.status).toBe(201);
  browser = await launchBrowser({ width: 1400, height: 1000 });
}, 300_000);

afterAll(async () => {
  await browser?.close();
  await closeTestPool();
});

describe("the operating envelope on screen", () => {
  it("lane view: envelope bands, temperature windows, plots with keyboard read-out, nominal and worst in the details", async () => {
    const page = await pageAs(team.viewer);
    await page.goto(`${BASE_URL}/missions/${missionId}/lanes`);
    await page.locator('[data-testid="lane-view"][data-ready="1"]').waitFor({ timeout: 120_000 });
    // Received bands at the envelope's ends for the slot-filter channels (not for the occupied-band 183 GHz chain).
    await page.locator('[data-item="rf:envelope:o2-core:0:lo"]').waitFor();
    expect(await page.locator('[data-item^="rf:envelope:wv-"]').count()).toBe(0);
    expect(await page.locator('[data-kind="mode-drift"]').count()).toBeGreaterThan(0);
    // The chain cards' temperature windows: the 243 GHz control is too loose, the 183 GHz one has margin.
    expect(await page.getByTestId("temperature-window-WIN-243").innerText()).toMatch(
      /Temperature window −8\.\d+ to 8\.\d+ K · control ±10 K · the control must tighten by 1\.\d+ K/,
    );
    expect(await page.getByTestId("temperature-window-H2O-183").innerText()).toMatch(/control ±0\.5 K · margin \d/);
    await screenshot(page, "e2e-envelope-lane-view");

    // The envelope section: the 243 GHz chain's LO × temperature chart and its first channel's plots.
    const section = page.getByTestId("envelope-section");
    await section.getByTestId("envelope-chain").selectOption("WIN-243");
    await section.getByTestId("temperature-map-WIN-243").waitFor();
    const byLo = section.getByTestId("envelope-plot-win-1-lo");
    const byT = section.getByTestId("envelope-plot-win-1-temperature");
    await byLo.waitFor();
    await byT.waitFor();
    expect(await byT.locator("svg").first().getAttribute("aria-label")).toMatch(
      /NEΔT and mode response against Resonator temperature offset t \(K\), envelope ±10 K, requirement 3\.5 K/,
    );
    expect(await byT.innerText()).toContain("Resonator temperature offset t (K)");
    // Keyboard: focus the plot and step the cursor to the right end.
    await byT.locator("svg").first().focus();
    await page.keyboard.press("End");
    expect(await byT.locator("[aria-live]").innerText()).toMatch(
      /^t = \d+(\.\d+)? K: NEΔT \d+(\.\d+)? K, mode response 0\.\d+/,
    );
    // The table alternative of the chart lists its rows.
    await section.getByText("Table of the map").click();
    expect(await section.getByTestId("temperature-map-WIN-243").locator("tbody tr").count()).toBe(21);
    await section.screenshot({ path: `${TEST_OUTPUT}/e2e-envelope-plots.png` });

    // Details: a channel's nominal and worst figures side by side.
    await page.locator('[data-item="rf:channel:win-1:0"]').click();
    const details = page.getByTestId("details-envelope");
    await details.waitFor();
    const text = await details.innerText();
    expect(text).toContain("Nominal and worst over the operating envelope");
    expect(text).toMatch(/NEΔT\s+3\.\d+ K\s+3\.58\d* K\s+u −20 MHz, t −10 K/);
    await screenshot(page, "e2e-envelope-details");
  }, 300_000);

  it("report: temperature window and margin per chain, nominal and worst per channel, plots as SVG", async () => {
    const page = await pageAs(team.viewer);
    await page.goto(`${BASE_URL}/missions/${missionId}/report`);
    await page.getByTestId("report-envelope").waitFor({ timeout: 120_000 });
    expect(await page.getByTestId("report-window-WIN-243").innerText()).toMatch(/^-8\.\d+–8\.\d+$/);
    const row = page.locator('[data-testid="report-envelope"] tr[data-channel="win-3"]');
    expect(await row.innerText()).toMatch(/slot\s+3\.\d+\s+3\.58\d*\s+u 20\.000 MHz, t 10\.000 K\s+3\.50/);
    const plots = page.getByTestId("report-envelope-plots");
    // four chain charts and two plots for each of the twelve channels
    expect(await plots.locator('svg[role="img"]').count()).toBe(4 + 2 * 12);
    await screenshot(page, "e2e-envelope-report");
  }, 300_000);
});
