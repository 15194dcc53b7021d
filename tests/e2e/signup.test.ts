/**
 * A new person in Chromium: sign up (after a refused first attempt), confirm
 * through the captured mail, create a first team and land on the signed-in
 * home with the team active.
 */
import { existsSync, statSync } from "node:fs";
import { afterAll, beforeAll, expect, it } from "vitest";
import { closeTestPool, firstLink, readMail, uniqueEmail } from "../setup/auth-helpers";
import { launchBrowser, screenshot, type TestBrowser } from "../setup/browser";

let b: TestBrowser;
beforeAll(async () => {
  b = await launchBrowser();
});
afterAll(async () => {
  await b?.close();
  await closeTestPool();
});

it("signs up, confirms the e-mail, creates a team and lands on Missions", async () => {
  const { page } = b;
  const email = uniqueEmail("e2e");
  await page.goto("/sign-up");
  await page.getByLabel("Name").fill("Eva End-to-end");
  await page.getByLabel("E-mail address").fill(email);
  await page.getByLabel("Password", { exact: true }).fill("short");
  await page.getByRole("button", { name: "Create account" }).click();
  // Field error beside the field, input kept, no navigation.
  await expect
    .poll(() => page.locator("#sign-up-password-error").textContent(), { timeout: 30_000 })
    .toContain("at least 10 characters");
  expect(await page.getByLabel("Password", { exact: true }).getAttribute("aria-invalid")).toBe("true");
  expect(await page.getByLabel("E-mail address").inputValue()).toBe(email);
  expect(new URL(page.url()).pathname).toBe("/sign-up");

  await page.getByLabel("Password", { exact: true }).fill("a-long-enough-password-1");
  await page.getByRole("button", { name: "Create account" }).click();
  await page.waitForURL(/\/verify-email\?/);
  expect(await page.getByRole("heading", { level: 1 }).textContent()).toContain("Check your inbox");

  const link = firstLink(await readMail(email, /confirm your e-mail/i));
  await page.goto(link);
  await page.waitForURL(/\/verify-email\/result/);
  expect(await page.getByRole("heading", { level: 1 }).textContent()).toContain("Your e-mail address is confirmed");
  await page.getByRole("link", { name: "Continue" }).click();

  await page.waitForURL(/\/teams\/new/);
  expect(await page.getByRole("heading", { name: "Create your first team" }).isVisible()).toBe(true);
  await page.getByLabel("Team name").fill("E2E receiver team");
  await page.getByRole("button", { name: "Create team" }).click();
  await page.waitForURL(/\/missions$/);
  await page.getByRole("navigation", { name: "Main" }).waitFor();
  const switcher = page.locator("#team-switcher");
  expect(await switcher.locator("option:checked").textContent()).toContain("E2E receiver team (owner)");
  expect(await page.getByRole("link", { name: "Missions" }).getAttribute("aria-current")).toBe("page");

  await page.waitForLoadState("networkidle").catch(() => undefined);
  const file = await screenshot(page, "e2e-signup");
  expect(existsSync(file)).toBe(true);
  expect(statSync(file).size).toBeGreaterThan(5_000);
});
