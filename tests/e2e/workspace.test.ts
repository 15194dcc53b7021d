/**
 * Mission workspace in Chromium against the running app (HETEROLANE_TEST_URL):
 * an engineer edits a channel and sees its findings change; a viewer sees no
 * edit controls and the server refuses a crafted write with 403.
 * Screenshots go to HETEROLANE_TEST_OUTPUT (default test-output).
 */
import { readFileSync } from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { BASE_URL, closeTestPool, makeTeamWithRoles, type TeamWithRoles, type TestClient } from "../setup/auth-helpers";
import { screenshot } from "../setup/browser";
import { signedInBrowser } from "../setup/signed-in-browser";

// Example 1 of the plan format (one 10 MHz channel at the 183.31 GHz water-vapour line; NEΔT 17.92 K against 20 K),
// with the lasers' drift set to 0: this test is about editing, so the operating envelope is the nominal point
// (with the example's ±20 MHz drift the worst NEΔT over the envelope is 81.1 K, docs/plan-format.md §12).
const EX1 = JSON.parse(readFileSync(path.join(__dirname, "../fixtures/plans/ex1-single-channel.plan.json"), "utf8"));
const PLAN = { ...EX1, lasers: EX1.lasers.map((l: { driftMHz: number }) => ({ ...l, driftMHz: 0 })) };

let team: TeamWithRoles;
let missionId = "";
let channel: { id: string; version: number; requiredNedtK: number | null };

async function json(c: TestClient, p: string, init: Parameters<TestClient["fetch"]>[1] = {}) {
  const res = await c.fetch(p, init);
  const text = await res.text();
  return { status: res.status, body: text ? JSON.parse(text) : null };
}

/** A fresh Chromium signed in as `c` (its session cookies copied into the browser). */
async function pageAs(c: TestClient): Promise<{ ctx: { close(): Promise<void> }; page: Page }> {
  const ctx = await signedInBrowser(c, { height: 1000 });
  return { ctx, page: ctx.page };
}

async function shot(page: Page, name: string) {
  await screenshot(page, `workspace-${name}`);
}

beforeAll(async () => {
  team = await makeTeamWithRoles();
  const created = await json(team.engineer, "/api/v1/missions", {
    method: "POST",
    json: { name: "E2E workspace mission (test data)" },
  });
  expect(created.status).toBe(201);
  missionId = created.body.id;
  const imported = await json(team.engineer, `/api/v1/missions/${missionId}/plan`, { method: "POST", json: PLAN });
  expect(imported.status).toBe(201);
  const list = await json(team.engineer, `/api/v1/missions/${missionId}/channels`);
  expect(list.status).toBe(200);
  channel = list.body.channels[0];
  expect(channel.requiredNedtK).toBe(20);
}, 420_000);

afterAll(async () => {
  await closeTestPool();
});

describe("mission workspace", () => {
  it("an engineer edits a channel and sees its findings change", async () => {
    const { ctx, page } = await pageAs(team.engineer);
    await page.goto(`${BASE_URL}/missions/${missionId}`);
    const row = page.locator('[data-channel="wv1"]');
    await row.waitFor();
    // Before: 17.92 K meets the 20 K requirement, so no nedt-unmet finding.
    await expect
      .poll(() => row.locator('[data-testid="nedt"]').innerText(), { timeout: 120_000 })
      .toMatch(/17\.9\d \/ 20\.00/);
    const panel = page.getByTestId("findings-panel");
    expect(await panel.locator('[data-code="nedt-unmet"]').count()).toBe(0);
    await expect
      .poll(async () => Number(await page.getByTestId("revision-number").innerText()), { timeout: 120_000 })
      .toBeGreaterThan(0);
    const revisionBefore = Number(await page.getByTestId("revision-number").innerText());
    await shot(page, "engineer-before");

    await page.getByRole("button", { name: "Edit channel wv1" }).click();
    const dialog = page.getByRole("dialog");
    await dialog.getByLabel(/Required NEΔT/).fill("10");
    await shot(page, "engineer-editing");
    await dialog.getByRole("button", { name: "Save channel" }).click();
    await dialog.waitFor({ state: "detached" });

    // After: the server re-checked; the channel now misses a 10 K requirement.
    const finding = panel.locator('[data-findings-channel="wv1"] [data-code="nedt-unmet"]');
    await finding.waitFor();
    expect(await finding.innerText()).toMatch(/wv1.*17\.92\d* K.*required 10 K/s);
    await expect
      .poll(() => row.locator('[data-testid="worst-finding"]').innerText(), { timeout: 120_000 })
      .toMatch(/error\s*nedt-unmet/i);
    await expect
      .poll(async () => Number(await page.getByTestId("revision-number").innerText()), { timeout: 120_000 })
      .toBeGreaterThan(revisionBefore);
    await shot(page, "engineer-after");

    const stored = await json(team.engineer, `/api/v1/missions/${missionId}/channels/${channel.id}`);
    expect(stored.body.requiredNedtK).toBe(10);
    expect(stored.body.version).toBeGreaterThan(channel.version);
    await ctx.close();
  }, 420_000);

  it("an engineer's stale save gets a clear conflict message and keeps the input", async () => {
    const current = (await json(team.engineer, `/api/v1/missions/${missionId}/channels/${channel.id}`)).body;
    const { ctx, page } = await pageAs(team.engineer);
    await page.goto(`${BASE_URL}/missions/${missionId}`);
    await page.getByRole("button", { name: "Edit channel wv1" }).click();
    const dialog = page.getByRole("dialog");
    // Someone else saves first.
    // (Retried only when the loaded shared test machine drops a database connection before any work: a 5xx.)
    let other = { status: 0, body: null as unknown };
    for (let attempt = 0; attempt < 3 && (other.status === 0 || other.status >= 500); attempt++)
      other = await json(team.lead, `/api/v1/missions/${missionId}/channels/${channel.id}`, {
        method: "PATCH",
        json: { integrationMs: 20, version: current.version },
      });
    expect(other.status).toBe(200);
    await dialog.getByLabel(/Bandwidth/).fill("12");
    await dialog.getByRole("button", { name: "Save channel" }).click();
    await dialog.getByText("Someone else saved this first.").waitFor();
    expect(await dialog.getByLabel(/Bandwidth/).inputValue()).toBe("12");
    await shot(page, "engineer-conflict");
    // Keeping the input and saving again replaces the newer version.
    await dialog.getByRole("button", { name: /Keep my input/ }).click();
    await dialog.getByRole("button", { name: "Save channel" }).click();
    await dialog.waitFor({ state: "detached" });
    const stored = (await json(team.engineer, `/api/v1/missions/${missionId}/channels/${channel.id}`)).body;
    expect(stored.bandwidthMHz).toBe(12);
    await ctx.close();
  }, 420_000);

  it("an engineer previews uploads before applying them", async () => {
    const { ctx, page } = await pageAs(team.engineer);
    await page.goto(`${BASE_URL}/missions/${missionId}/uploads`);
    // Tuning map: offsets every 20 MHz over 176–190 GHz and 192–195 GHz; with a 50 MHz gap, two intervals.
    const offsets = [
      ...Array.from({ length: 701 }, (_, i) => (176 + i * 0.02).toFixed(3)),
      ...Array.from({ length: 151 }, (_, i) => (192 + i * 0.02).toFixed(3)),
    ];
    await page.locator("#tuning-file").setInputFiles({
      name: "tuning.csv",
      mimeType: "text/csv",
      buffer: Buffer.from(`offsetGHz\n${offsets.join("\n")}\n`),
    });
    await page.getByRole("button", { name: "Preview" }).first().click();
    const tuning = page.getByTestId("tuning-preview");
    await tuning.waitFor();
    const text = await tuning.innerText();
    expect(text).toMatch(/852 points → 2 intervals/);
    expect(text).toMatch(/176\.000–190\.000 GHz/);
    expect(text).toMatch(/192\.000–195\.000 GHz/);
    await shot(page, "upload-tuning-preview");
    await tuning.getByRole("button", { name: /Replace the reach of LP1/ }).click();
    await page.getByText(/Reach of LP1 replaced/).waitFor();
    const lasers = await json(team.engineer, `/api/v1/missions/${missionId}/lasers`);
    expect(lasers.body.lasers[0].reach).toEqual([
      { minGHz: 176, maxGHz: 190 },
      { minGHz: 192, maxGHz: 195 },
    ]);

    // Channel list with one bad row: the preview names row and column, and nothing can be applied.
    const csv = [
      "key,name,chain,centerGHz,bandwidthMHz,integrationMs,antennaK,receiverK",
      "wv2,183.31 wing,A,183.9,10,10,250,5000",
      "wv3,broken row,A,-5,10,10,250,5000",
    ].join("\n");
    await page
      .locator("#channels-file")
      .setInputFiles({ name: "channels.csv", mimeType: "text/csv", buffer: Buffer.from(csv) });
    await page.getByRole("button", { name: "Preview" }).nth(1).click();
    const chPreview = page.getByTestId("channels-preview");
    await chPreview.waitFor();
    expect(await chPreview.innerText()).toMatch(/2 rows, 1 with errors/);
    expect(await chPreview.innerText()).toMatch(/centerGHz: must be greater than 0/);
    expect(await chPreview.getByRole("button", { name: /Apply 2 rows/ }).isDisabled()).toBe(true);
    await shot(page, "upload-channels-preview");
    const channels = await json(team.engineer, `/api/v1/missions/${missionId}/channels`);
    expect(channels.body.channels.map((c: { key: string }) => c.key)).toEqual(["wv1"]);
    await ctx.close();
  }, 420_000);

  it("a viewer sees no edit controls, and the server refuses a crafted write", async () => {
    const { ctx, page } = await pageAs(team.viewer);
    await page.goto(`${BASE_URL}/missions/${missionId}`);
    await page.locator('[data-channel="wv1"]').waitFor();
    await page.getByTestId("read-only-note").waitFor();
    const editControls = page.getByRole("button", { name: /^(Edit|\+ Add|Delete)/ });
    expect(await editControls.count()).toBe(0);
    expect(await page.getByRole("link", { name: "Upload data" }).count()).toBe(0);
    // Reading and exporting stay available.
    expect(await page.getByRole("link", { name: "Printable report" }).count()).toBe(1);
    await shot(page, "viewer");

    const before = (await json(team.viewer, `/api/v1/missions/${missionId}/channels/${channel.id}`)).body;
    const patch = await json(team.viewer, `/api/v1/missions/${missionId}/channels/${channel.id}`, {
      method: "PATCH",
      json: { requiredNedtK: 1, version: before.version },
    });
    expect(patch.status).toBe(403);
    const create = await json(team.viewer, `/api/v1/missions/${missionId}/channels`, {
      method: "POST",
      json: { ...PLAN.channels[0], key: "crafted", chainId: before.chainId, chain: undefined, id: undefined },
    });
    expect(create.status).toBe(403);
    const after = (await json(team.viewer, `/api/v1/missions/${missionId}/channels/${channel.id}`)).body;
    expect(after).toEqual(before);
    await ctx.close();
  }, 420_000);

  it("only an owner gets the delete control, and deleting a mission removes it", async () => {
    const created = await json(team.owner, "/api/v1/missions", {
      method: "POST",
      json: { name: "E2E mission to delete (test data)" },
    });
    expect(created.status).toBe(201);
    const doomed = created.body.id as string;

    const asEngineer = await pageAs(team.engineer);
    await asEngineer.page.goto(`${BASE_URL}/missions/${doomed}`);
    await asEngineer.page.getByTestId("revision-line").waitFor();
    expect(await asEngineer.page.getByRole("button", { name: "Delete this mission" }).count()).toBe(0);
    await asEngineer.ctx.close();

    const { ctx, page } = await pageAs(team.owner);
    await page.goto(`${BASE_URL}/missions/${doomed}`);
    const del = page.getByRole("button", { name: "Delete this mission" });
    await del.waitFor();
    page.once("dialog", (d) => void d.accept());
    await del.click();
    await page.waitForURL(`${BASE_URL}/missions`);
    expect((await json(team.owner, `/api/v1/missions/${doomed}`)).status).toBe(404);
    // the mission the other tests use is untouched
    expect((await json(team.owner, `/api/v1/missions/${missionId}`)).status).toBe(200);
    await ctx.close();
  }, 420_000);

  it("the printable report shows the plan, findings and cautions", async () => {
    const { ctx, page } = await pageAs(team.viewer);
    await page.goto(`${BASE_URL}/missions/${missionId}/report`);
    const report = page.getByTestId("report");
    await report.waitFor();
    const cautions = await page.getByTestId("report-cautions").innerText();
    expect(cautions).toMatch(/IEC 60825-1/);
    expect(cautions).toMatch(/design estimates, not calibration/);
    expect(cautions).toMatch(/balanced pair of photodiodes/);
    expect(await report.innerText()).toMatch(/nedt-unmet/);
    await page.emulateMedia({ media: "print" });
    await shot(page, "report-print");
    await ctx.close();
  }, 420_000);
});
