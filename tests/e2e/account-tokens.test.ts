/**
 * A token made on the account page in Chromium drives the command line of
 * docs/automation.md: login reads it from stdin, pull writes the mission's
 * plan document, push of that file stores the next revision, and a second
 * pull gives the identical document. Screenshot: account-token-made.png.
 */
import { spawnSync } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { demoPlan } from "@db/seed/mission-demo-plan";
import { BASE_URL, closeTestPool, createTeam, newVerifiedUser, type TestClient } from "../setup/auth-helpers";
import { call, missionWithPlan } from "../setup/workspace-helpers";
import { screenshot } from "../setup/browser";
import { signedInBrowser } from "../setup/signed-in-browser";

const ROOT = join(__dirname, "../..");
const dir = mkdtempSync(join(tmpdir(), "heterolane-token-e2e-"));

/** The command line as a user runs it, with its config file in a private folder. */
function cli(args: string[], input?: string) {
  const env: NodeJS.ProcessEnv = { ...process.env, INIT_CWD: dir, HETEROLANE_CONFIG: join(dir, "config.json") };
  delete env.HETEROLANE_URL;
  delete env.HETEROLANE_TOKEN;
  const r = spawnSync(join(ROOT, "node_modules/.bin/tsx"), [join(ROOT, "src/cli/heterolane.ts"), ...args], {
    cwd: ROOT,
    input,
    encoding: "utf8",
    timeout: 60_000,
    env,
  });
  return { code: r.status, stdout: r.stdout, stderr: r.stderr };
}

let owner: TestClient;
let missionId = "";
const missionName = `Token e2e mission ${Math.random().toString(36).slice(2, 8)} (test data)`;

beforeAll(async () => {
  owner = await newVerifiedUser("token-e2e");
  await createTeam(owner);
  missionId = await missionWithPlan(owner, { ...demoPlan(), name: missionName });
}, 240_000);
afterAll(closeTestPool);
vi.setConfig({ testTimeout: 240_000 });

describe("a token made in the browser", () => {
  it("is shown once on the account page and lets the command line pull and push the plan", async () => {
    const browser = await signedInBrowser(owner, { width: 1280, height: 900 });
    let token = "";
    try {
      const page = browser.page;
      await page.goto(`${BASE_URL}/account`);
      await page.getByLabel("Name", { exact: true }).fill("CI pull and push");
      await page.getByRole("button", { name: "Make token" }).click();
      const shown = page.getByTestId("new-token");
      await shown.waitFor();
      token = (await shown.innerText()).trim();
      await screenshot(page, "account-token-made");
    } finally {
      await browser.close();
    }
    expect(token.length).toBeGreaterThan(20);

    const login = cli(["login", "--url", BASE_URL], `${token}\n`);
    expect(login.code).toBe(0);
    expect(JSON.parse(login.stdout)).toMatchObject({ server: BASE_URL, missions: 1 });

    // Read as the owner; once more when the app closed an idle keep-alive socket while the command line ran.
    const list = () => call(owner, "GET", `/api/v1/missions/${missionId}/revisions`);
    const revisions = async () =>
      (await list().catch((e) => (e?.cause?.code === "UND_ERR_SOCKET" ? list() : Promise.reject(e)))).body.revisions;
    const before = (await revisions())[0].number as number;
    const pulled = cli(["pull", missionName]);
    expect(pulled.code).toBe(0);
    expect(JSON.parse(pulled.stdout)).toMatchObject({ format: "heterolane.plan/2", name: missionName });
    writeFileSync(join(dir, "plan.json"), pulled.stdout);

    const pushed = cli(["push", missionName, "plan.json"]);
    expect(pushed.code).toBe(0);
    expect(JSON.parse(pushed.stdout)).toMatchObject({ mission: missionId, revision: { number: before + 1 } });
    expect((await revisions())[0].number).toBe(before + 1);
    expect(cli(["pull", missionName]).stdout).toBe(pulled.stdout);
  });
});
