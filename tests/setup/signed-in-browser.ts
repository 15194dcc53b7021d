/**
 * Chromium signed in as a test client: its session cookies copied into the
 * browser context, the page's timeouts set for a loaded test machine.
 */
import type { BrowserContext } from "playwright-core";
import { BASE_URL, type TestClient } from "./auth-helpers";
import { launchBrowser, type TestBrowser } from "./browser";

/** Copies `c`'s session cookies into `context` (for the app's host). */
export async function addSessionCookies(context: BrowserContext, c: TestClient): Promise<void> {
  const host = new URL(BASE_URL).hostname;
  await context.addCookies([...c.cookies].map(([name, value]) => ({ name, value, domain: host, path: "/" })));
}

/** A fresh Chromium signed in as `c`; its page waits up to `timeoutMs` for actions, 180 s for navigations. */
export async function signedInBrowser(
  c: TestClient,
  { width = 1400, height = 1000, timeoutMs = 120_000 }: { width?: number; height?: number; timeoutMs?: number } = {},
): Promise<TestBrowser> {
  const b = await launchBrowser({ width, height });
  await addSessionCookies(b.context, c);
  b.page.setDefaultTimeout(timeoutMs);
  b.page.setDefaultNavigationTimeout(180_000);
  return b;
}
