/**
 * Lane view in Chromium against the running app (HETEROLANE_TEST_URL): a
 * mission with Example 1 of the plan format (imported through the API) shows
 * its RF, optical-offset and IF lanes; dragging the LO into a blocked
 * interval shows the blocking rule and its finding; place clears it; saving
 * makes a revision that the server re-checked.
 * Screenshot: ${HETEROLANE_TEST_OUTPUT ?? "test-output"}/e2e-lane-view.png.
 */
import { readFileSync } from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { BrowserContext, Page } from "playwright-core";
import { BASE_URL, closeTestPool, makeTeamWithRoles, type TeamWithRoles, type TestClient } from "../setup/auth-helpers";
import { launchBrowser, screenshot, type TestBrowser } from "../setup/browser";

// Example 1 (demo data): one 10 MHz channel at 183.31 GHz, LO at 184.81 GHz, reach 150–200 GHz.
const PLAN = JSON.parse(readFileSync(path.join(__dirname, "../fixtures/plans/ex1-single-channel.plan.json"), "utf8"));

let team: TeamWithRoles;
let browser: TestBrowser;
let missionId = "";

async function json(c: TestClient, p: string, init: Parameters<TestClient["fetch"]>[1] = {}) {
  const res = await c.fetch(p, init);
  const text = await res.text();
  return { status: res.status, body: text ? JSON.parse(text) : null };
}

async function pageAs(c: TestClient): Promise<{ ctx: BrowserContext; page: Page }> {
  const ctx = browser.context;
  const host = new URL(BASE_URL).hostname;
  await ctx.addCookies([...c.cookies].map(([name, value]) => ({ name, value, domain: host, path: "/" })));
  const page = await ctx.newPage();
  await page.setViewportSize({ width: 1400, height: 1000 });
  return { ctx, page };
}

beforeAll(async () => {
  team = await makeTeamWithRoles();
  const created = await json(team.engineer, "/api/v1/missions", {
    method: "POST",
    json: { name: "E2E lane view mission (test data)" },
  });
  expect(created.status).toBe(201);
  missionId = created.body.id;
  const imported = await json(team.engineer, `/api/v1/missions/${missionId}/plan`, { method: "POST", json: PLAN });
  expect(imported.status).toBe(201);
  browser = await launchBrowser({ width: 1400, height: 1000 });
}, 300_000);

afterAll(async () => {
  await browser?.close();
  await closeTestPool();
});

describe("lane view", () => {
  it("draws three lanes, shows a blocked LO's finding, places and saves a re-checked revision", async () => {
    const { page } = await pageAs(team.engineer);
    await page.goto(`${BASE_URL}/missions/${missionId}/lanes`);
    // RF lane: the channel passband; optical-offset lane: the LO; IF lane: the channel's slot.
    await page.locator('[data-testid="lane-view"][data-ready="1"]').waitFor({ timeout: 120_000 });
    await page.locator('[data-item="rf:channel:wv1:0"]').waitFor();
    await page.locator('[data-item="optical:A:lo"]').waitFor();
    await page.locator('[data-item="if:A:slot:wv1"]').waitFor();
    expect(await page.locator('[data-kind="feasible"]').count()).toBeGreaterThan(0);
    expect(await page.getByTestId("lo-status-A").innerText()).toMatch(/inside the feasibility map/);
    await screenshot(page, "e2e-lane-view");

    // Drag the LO onto the middle of a blocked interval inside the reach (not one blocked only by lo-uncovered).
    const blocked = page.locator('[data-kind="blocked"]');
    let target: { x: number; y: number } | null = null;
    let widest = 0;
    for (let i = 0; i < (await blocked.count()); i++) {
      const b = blocked.nth(i);
      const label = (await b.getAttribute("aria-label")) ?? "";
      const box = await b.boundingBox();
      if (!box || /lo-uncovered/.test(label) || box.width < 6) continue;
      if (box.width > widest) {
        widest = box.width;
        target = { x: box.x + box.width / 2, y: box.y + box.height / 2 };
      }
    }
    expect(target, "a blocked interval inside the reach is drawn").not.toBeNull();
    const handle = await page.locator('[data-item="optical:A:lo"]').boundingBox();
    expect(handle).not.toBeNull();
    await page.mouse.move(handle!.x + handle!.width / 2, handle!.y + handle!.height - 6);
    await page.mouse.down();
    for (let k = 1; k <= 10; k++) {
      await page.mouse.move(
        handle!.x + handle!.width / 2 + ((target!.x - handle!.x - handle!.width / 2) * k) / 10,
        handle!.y + handle!.height - 6,
      );
    }
    await page.mouse.up();
    const status = page.getByTestId("lo-status-A");
    await expect.poll(() => status.innerText(), { timeout: 30_000 }).toMatch(/LO blocked by/);
    const codes = /LO blocked by ([a-z, -]+) \(/.exec(await status.innerText())?.[1]?.split(", ") ?? [];
    expect(codes.length).toBeGreaterThan(0);
    // The findings panel lists an error finding of the blocking rule (codes other than lo-uncovered are per channel).
    const panel = page.getByTestId("findings-panel");
    await expect.poll(() => panel.locator(`[data-code="${codes[0]}"]`).count(), { timeout: 30_000 }).toBeGreaterThan(0);
    await page.locator('[data-item="optical:A:lo"]').click();
    expect(await page.getByTestId("details-panel").innerText()).toContain(codes[0]);
    await screenshot(page, "e2e-lane-view-blocked");

    // Place clears it.
    await page.getByTestId("place-A").click();
    await expect.poll(() => status.innerText(), { timeout: 30_000 }).toMatch(/inside the feasibility map/);
    expect(await panel.locator(`[data-code="${codes[0]}"]`).count()).toBe(0);
    const placed = Number(await page.getByTestId("lo-input-A").inputValue());
    const stored = (await json(team.engineer, `/api/v1/missions/${missionId}/result`)).body;
    expect(placed).toBeCloseTo(stored.chains[0].placeGHz, 9);

    // Save as revision: the server re-checks and the page shows its revision number.
    const before = (await json(team.engineer, `/api/v1/missions/${missionId}/revisions`)).body;
    const beforeMax = Math.max(...(before.revisions ?? before).map((r: { number: number }) => r.number));
    await page.getByTestId("save-A").click();
    const saved = page.getByTestId("save-status-A");
    await expect.poll(() => saved.innerText(), { timeout: 60_000 }).toMatch(/Saved as revision (\d+)/);
    const number = Number(/revision (\d+)/.exec(await saved.innerText())?.[1]);
    expect(number).toBeGreaterThan(beforeMax);
    const plan = (await json(team.engineer, `/api/v1/missions/${missionId}/plan`)).body;
    expect(plan.chains[0].loOffsetGHz).toBeCloseTo(placed, 9);
    const result = (await json(team.engineer, `/api/v1/missions/${missionId}/result`)).body;
    // The server's own check of the saved plan: the LO lies in one of its feasible intervals, with no blocking error.
    const L = plan.chains[0].loOffsetGHz;
    expect(result.chains[0].feasibleGHz.some(([a, b]: [number, number]) => L >= a && L <= b)).toBe(true);
    expect(result.findings.filter((f: { code: string }) => codes.includes(f.code))).toEqual([]);
    const after = (await json(team.engineer, `/api/v1/missions/${missionId}/revisions`)).body;
    expect(Math.max(...(after.revisions ?? after).map((r: { number: number }) => r.number))).toBe(number);
    // After the refetch the page shows the server's result: still inside the map.
    await expect.poll(() => status.innerText(), { timeout: 30_000 }).toMatch(/inside the feasibility map/);
    await screenshot(page, "e2e-lane-view-saved");
  }, 300_000);
});
