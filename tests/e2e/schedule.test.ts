/**
 * The observation schedule in Chromium against the running app
 * (HETEROLANE_TEST_URL): an engineer opens the shared-laser demo plan (one
 * laser pair, three chains), sees the cycle's timeline and the NEΔT bars,
 * edits the schedule, applies the best split and sees the new revision
 * checked clean; the printable report shows the schedule. Screenshots (with
 * the timeline chart) go to HETEROLANE_TEST_OUTPUT (default test-output).
 */
import { readFileSync } from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { BASE_URL, closeTestPool, makeTeamWithRoles, type TeamWithRoles, type TestClient } from "../setup/auth-helpers";
import { screenshot } from "../setup/browser";
import { signedInBrowser } from "../setup/signed-in-browser";

const PLAN = JSON.parse(readFileSync(path.join(__dirname, "../../docs/examples/shared-laser.plan.json"), "utf8"));

let team: TeamWithRoles;
let missionId = "";

async function json(c: TestClient, p: string, init: Parameters<TestClient["fetch"]>[1] = {}) {
  const res = await c.fetch(p, init);
  const text = await res.text();
  return { status: res.status, body: text ? JSON.parse(text) : null };
}

async function pageAs(c: TestClient): Promise<{ ctx: { close(): Promise<void> }; page: Page }> {
  const ctx = await signedInBrowser(c, { height: 1100 });
  return { ctx, page: ctx.page };
}

const revisionOf = async (page: Page) => Number(await page.getByTestId("revision-number").innerText());

beforeAll(async () => {
  team = await makeTeamWithRoles();
  const created = await json(team.engineer, "/api/v1/missions", {
    method: "POST",
    json: { name: "E2E shared-laser mission (test data)" },
  });
  expect(created.status).toBe(201);
  missionId = created.body.id;
  const imported = await json(team.engineer, `/api/v1/missions/${missionId}/plan`, { method: "POST", json: PLAN });
  expect(imported.status).toBe(201);
}, 420_000);

afterAll(async () => {
  await closeTestPool();
});

describe("observation schedule", () => {
  it("an engineer edits the schedule, applies the best split and sees the new revision", async () => {
    const { ctx, page } = await pageAs(team.engineer);
    await page.goto(`${BASE_URL}/missions/${missionId}`);
    const panel = page.getByTestId("schedule-LP1");
    const timeline = panel.getByTestId("timeline-LP1");
    await timeline.waitFor();
    await panel.getByTestId("nedt-bars-LP1").waitFor();
    // the cycle: three dwells with retunes, two relocks (between resonators R60 and R80)
    expect(await timeline.locator('[data-kind="dwell"]').count()).toBe(3);
    expect(await timeline.locator('[data-kind="relock"]').count()).toBe(2);
    const findings = page.getByTestId("findings-panel");
    await findings.locator('[data-code="shared-nedt-unmet"]').first().waitFor();
    await expect.poll(() => revisionOf(page), { timeout: 120_000 }).toBeGreaterThan(0);
    const first = await revisionOf(page);
    await panel.scrollIntoViewIfNeeded();
    await screenshot(page, "schedule-before");

    // Edit: shorten C320's dwell to 80 ms (10 ms of the cycle left idle)
    await panel.getByRole("button", { name: "Edit schedule" }).click();
    const editor = page.getByTestId("schedule-editor-LP1");
    await editor.getByLabel("Dwell of C320 (ms)").fill("80");
    await screenshot(page, "schedule-editing");
    await editor.getByRole("button", { name: "Save schedule" }).click();
    await editor.waitFor({ state: "detached", timeout: 60_000 }).catch(async (e) => {
      await screenshot(page, "schedule-save-failed");
      throw e;
    });
    await expect.poll(() => revisionOf(page), { timeout: 120_000 }).toBe(first + 1);
    await timeline.locator('[data-kind="idle"]').waitFor();
    const edited = await json(team.engineer, `/api/v1/missions/${missionId}/plan`);
    expect(edited.body.lasers[0].schedule.dwells.map((d: { dwellMs: number }) => d.dwellMs)).toEqual([50, 60, 80]);

    // Apply the best split: a new revision the server checks again, with no NEΔT finding left
    await panel.getByRole("button", { name: "Apply best split" }).click();
    await panel.getByTestId("schedule-saved").waitFor();
    expect(await panel.getByTestId("schedule-saved").innerText()).toMatch(new RegExp(`revision ${first + 2}\\b`));
    await expect.poll(() => revisionOf(page), { timeout: 120_000 }).toBe(first + 2);
    await expect.poll(() => findings.locator('[data-code="nedt-unmet"]').count(), { timeout: 120_000 }).toBe(0);
    await panel.scrollIntoViewIfNeeded();
    await screenshot(page, "schedule-best-split");
    const result = await json(team.engineer, `/api/v1/missions/${missionId}/result`);
    const doc = result.body.format ? result.body : result.body.result;
    expect(doc.findings.filter((f: { severity: string }) => f.severity === "error")).toEqual([]);
    expect(doc.schedules[0].bestSplit.commonMargin).toBeGreaterThan(0);

    // The printable report carries the schedule with its timeline
    await page.goto(`${BASE_URL}/missions/${missionId}/report`);
    const report = page.getByTestId("report-schedule-LP1");
    await report.getByTestId("timeline-LP1").waitFor();
    await report.scrollIntoViewIfNeeded();
    await screenshot(page, "schedule-report");
    await ctx.close();
  }, 600_000);

  it("a viewer sees the schedule but no edit controls", async () => {
    const { ctx, page } = await pageAs(team.viewer);
    await page.goto(`${BASE_URL}/missions/${missionId}`);
    const panel = page.getByTestId("schedule-LP1");
    await panel.getByTestId("timeline-LP1").waitFor();
    expect(await panel.getByRole("button", { name: "Apply best split" }).count()).toBe(0);
    expect(await panel.getByRole("button", { name: "Edit schedule" }).count()).toBe(0);
    await ctx.close();
  }, 420_000);
});
