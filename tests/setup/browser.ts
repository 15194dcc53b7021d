/**
 * Chromium for end-to-end tests: Debian's /usr/bin/chromium through
 * playwright-core (never a downloaded browser), a fresh profile per launch
 * under /tmp, and screenshots under HETEROLANE_TEST_OUTPUT.
 */
import { mkdirSync, mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { chromium, type BrowserContext, type Page } from "playwright-core";

export const TEST_OUTPUT = process.env.HETEROLANE_TEST_OUTPUT ?? "test-output";
export const E2E_BASE_URL = (process.env.HETEROLANE_TEST_URL ?? "http://localhost:3000").replace(/\/$/, "");

const ARGS = [
  "--headless",
  "--no-sandbox",
  "--disable-gpu",
  "--disable-quic",
  "--no-first-run",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
];

export interface TestBrowser {
  context: BrowserContext;
  page: Page;
  close(): Promise<void>;
}

/** A persistent context on a fresh --user-data-dir (removed again on close). */
export async function launchBrowser(opts: { width?: number; height?: number } = {}): Promise<TestBrowser> {
  const userDataDir = mkdtempSync(path.join(tmpdir(), "heterolane-chromium-"));
  const context = await chromium.launchPersistentContext(userDataDir, {
    executablePath: process.env.HETEROLANE_CHROMIUM ?? "/usr/bin/chromium",
    headless: true,
    args: ARGS,
    viewport: { width: opts.width ?? 1280, height: opts.height ?? 800 },
    baseURL: E2E_BASE_URL,
  });
  context.setDefaultTimeout(60_000);
  context.setDefaultNavigationTimeout(90_000);
  const page = context.pages()[0] ?? (await context.newPage());
  return {
    context,
    page,
    async close() {
      await context.close().catch(() => undefined);
      rmSync(userDataDir, { recursive: true, force: true });
    },
  };
}

/** Saves a full-page screenshot as TEST_OUTPUT/<name>.png and returns its path. */
export async function screenshot(page: Page, name: string): Promise<string> {
  mkdirSync(TEST_OUTPUT, { recursive: true });
  const file = path.join(TEST_OUTPUT, `${name}.png`);
  await page.screenshot({ path: file, fullPage: true });
  return file;
}
