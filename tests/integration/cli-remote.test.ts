/**
 * The command line against the running app and the real PostgreSQL: login
 * (config file mode 600), pull → push → pull gives the identical document, a
 * stale push is exit 3 naming the current revision with nothing overwritten,
 * every other exit status, check --remote and report; and the Python example
 * of docs/automation.md, run as written, pulls, changes a channel and pushes.
 */
import { spawnSync } from "node:child_process";
import { mkdtempSync, readFileSync, statSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { demoPlan } from "@db/seed/mission-demo-plan";
import { BASE_URL, closeTestPool, createTeam, newVerifiedUser, TestClient } from "../setup/auth-helpers";
import { call, missionWithPlan } from "../setup/workspace-helpers";
import { makeToken } from "./support/tokens";

const ROOT = join(__dirname, "../..");
const dir = mkdtempSync(join(tmpdir(), "heterolane-cli-remote-"));
const CONFIG = join(dir, "config", "config.json");

function cli(args: string[], opts: { input?: string; env?: Record<string, string | undefined> } = {}) {
  const r = spawnSync(join(ROOT, "node_modules/.bin/tsx"), [join(ROOT, "src/cli/heterolane.ts"), ...args], {
    cwd: ROOT,
    input: opts.input,
    encoding: "utf8",
    timeout: 60_000,
    env: {
      ...process.env,
      INIT_CWD: dir,
      HETEROLANE_URL: undefined,
      HETEROLANE_TOKEN: undefined,
      HETEROLANE_CONFIG: CONFIG,
      ...opts.env,
    },
  });
  return { code: r.status, stdout: r.stdout, stderr: r.stderr };
}

let owner: TestClient;
let teamId = "";
let missionId = "";
let engineerToken = "";
let viewerToken = "";
let limitedToken = "";

beforeAll(async () => {
  owner = await newVerifiedUser("cli");
  teamId = await createTeam(owner);
  const plan = { ...demoPlan(), name: `CLI demo ${Math.random().toString(36).slice(2, 8)}` };
  missionId = await missionWithPlan(owner, plan);
  engineerToken = (await makeToken(owner, { teamId, role: "engineer", name: "cli test" })).token;
  viewerToken = (await makeToken(owner, { teamId, role: "viewer" })).token;
  limitedToken = (await makeToken(owner, { teamId, role: "viewer", requestsPerMinute: 1 })).token;
}, 120_000);
afterAll(closeTestPool);
vi.setConfig({ testTimeout: 180_000 });

/**
 * A call as the owner, tried again once when the app had closed an idle
 * keep-alive socket while the command line ran (the request was not served).
 */
async function asOwner(method: string, path: string, json?: unknown) {
  try {
    return await call(owner, method, path, json);
  } catch (e) {
    if ((e as { cause?: { code?: string } }).cause?.code !== "UND_ERR_SOCKET") throw e;
    return call(owner, method, path, json);
  }
}
const read = (path: string) => asOwner("GET", path);

const latest = async () => (await read(`/api/v1/missions/${missionId}/revisions`)).body.revisions[0].number as number;

describe("heterolane against the server", () => {
  it("login reads the token from stdin and keeps it in a mode-600 file", () => {
    const r = cli(["login", "--url", BASE_URL], { input: `${engineerToken}\n` });
    expect(r.code).toBe(0);
    expect(JSON.parse(r.stdout)).toEqual({ server: BASE_URL, config: CONFIG, missions: 1 });
    expect(statSync(CONFIG).mode & 0o777).toBe(0o600);
    expect(r.stdout + r.stderr).not.toContain(engineerToken);
  });

  it("pull → push → pull gives the identical document, and a new revision", async () => {
    const before = await latest();
    const first = cli(["pull", missionId]);
    expect(first.code).toBe(0);
    expect(first.stderr).toBe(`pulled revision ${before} of mission ${missionId}\n`);
    writeFileSync(join(dir, "plan.json"), first.stdout);
    const pushed = cli(["push", missionId, "plan.json"]);
    expect(pushed.code).toBe(0);
    expect(JSON.parse(pushed.stdout)).toMatchObject({ mission: missionId, revision: { number: before + 1 } });
    const second = cli(["pull", missionId]);
    expect(second.code).toBe(0);
    expect(second.stdout).toBe(first.stdout);
    expect(await latest()).toBe(before + 1);
    // by name, and an older revision
    const byName = cli(["pull", JSON.parse(first.stdout).name, "--revision", String(before)]);
    expect(byName.stdout).toBe(first.stdout);
  });

  it("a stale push is exit 3, names the server's current revision, and overwrites nothing", async () => {
    const pulled = cli(["pull", missionId]);
    writeFileSync(join(dir, "mine.json"), pulled.stdout);
    // someone else saves meanwhile (a settings change stores a new revision)
    const s = await read(`/api/v1/missions/${missionId}/settings`);
    const saved = await asOwner("PUT", `/api/v1/missions/${missionId}/settings`, {
      ...s.body,
      updatedAt: undefined,
      guardMHz: s.body.guardMHz + 5,
    });
    expect(saved.status).toBe(200);
    const current = await latest();
    const r = cli(["push", missionId, "mine.json"]);
    expect(r.code).toBe(3);
    expect(r.stderr).toContain(`is at revision ${current}, not ${current - 1}`);
    expect(r.stderr).toContain("Nothing was overwritten");
    expect(await latest()).toBe(current);
    expect((await read(`/api/v1/missions/${missionId}/settings`)).body.guardMHz).toBe(s.body.guardMHz + 5);
  });

  it("check --remote prints the stored result; --table a table; report an HTML page", async () => {
    const r = cli(["check", "--remote", missionId]);
    expect(r.code).toBe(0);
    expect(JSON.parse(r.stdout)).toEqual((await read(`/api/v1/missions/${missionId}/result`)).body);
    const t = cli(["check", "--remote", missionId, "--table"]);
    expect(t.stdout.split("\n")[0]).toMatch(/^severity\s+code\s+chain\s+channel\s+message$/);
    const m = cli(["missions", "--table"]);
    expect(m.stdout).toContain(missionId);
    const html = cli(["report", missionId]);
    expect(html.code).toBe(0);
    expect(html.stdout).toMatch(/^<!doctype html>/);
    expect(html.stdout).toContain("Laser safety");
    expect(html.stdout).toContain(`revision ${await latest()}`);
  });

  it("exit statuses: 2 bad input, 4 no or refused token, 5 role, 6 not found, 7 rate limit, 8 unreachable", async () => {
    writeFileSync(join(dir, "bad.json"), JSON.stringify({ format: "heterolane.plan/1" }));
    writeFileSync(join(dir, "good.json"), JSON.stringify(demoPlan()));
    const bad = cli(["push", missionId, "bad.json", "--force"]);
    expect(bad.code).toBe(2);
    expect(bad.stderr).toMatch(/^name: /m);
    expect(cli(["pull"]).code).toBe(2);
    expect(cli(["pull", missionId, "--revision", "zero"]).code).toBe(2);
    expect(cli(["push", missionId, "good.json", "--base", "1", "--force"]).code).toBe(2);
    expect(cli(["missions", "--colour"]).code).toBe(2);

    const none = cli(["missions"], { env: { HETEROLANE_CONFIG: join(dir, "nowhere.json") } });
    expect(none.code).toBe(4);
    const forged = cli(["missions"], { env: { HETEROLANE_URL: BASE_URL, HETEROLANE_TOKEN: `hl_${"x".repeat(64)}` } });
    expect(forged.code).toBe(4);
    expect(forged.stderr).toContain("invalid-token");
    expect(forged.stderr).not.toContain("xxxxxxxx");

    const asViewer = { HETEROLANE_URL: BASE_URL, HETEROLANE_TOKEN: viewerToken };
    const refused = cli(["push", missionId, "good.json", "--force"], { env: asViewer });
    expect(refused.code).toBe(5);
    expect(refused.stderr).toMatch(/does not allow you to import plans/);

    expect(cli(["pull", missionId, "--revision", "999"]).code).toBe(6);
    expect(cli(["pull", "00000000-0000-4000-8000-000000000000"]).code).toBe(6);
    expect(cli(["check", "--remote", "no mission of this name"]).code).toBe(6);

    const asLimited = { HETEROLANE_URL: BASE_URL, HETEROLANE_TOKEN: limitedToken };
    expect(cli(["missions"], { env: asLimited }).code).toBe(0);
    const slow = cli(["missions"], { env: asLimited });
    expect(slow.code).toBe(7);
    expect(slow.stderr).toMatch(/too many requests/);

    const down = cli(["missions"], { env: { HETEROLANE_URL: "http://127.0.0.1:9", HETEROLANE_TOKEN: limitedToken } });
    expect(down.code).toBe(8);
    expect(down.stderr).toMatch(/^Cannot reach http:\/\/127\.0\.0\.1:9/);
  });

  it("--help lists every command and exit status", () => {
    const r = cli(["--help"]);
    expect(r.code).toBe(0);
    for (const s of [
      "login --url",
      "missions",
      "pull MISSION",
      "push MISSION FILE",
      "check --remote",
      "report MISSION",
    ])
      expect(r.stdout).toContain(s);
    for (let code = 0; code <= 8; code++) expect(r.stdout).toMatch(new RegExp(`^  ${code}  `, "m"));
  });
});

describe("the Python example of docs/automation.md", () => {
  it("runs as written with python3 and urllib: pulls, changes a channel, pushes a new revision", async () => {
    const doc = readFileSync(join(ROOT, "docs/automation.md"), "utf8");
    const script = doc.match(/```python\n([\s\S]*?)```/)?.[1];
    expect(script).toBeTruthy();
    expect(script).not.toMatch(/^\s*(import|from)\s+(requests|httpx)/m);
    writeFileSync(join(dir, "pull-change-push.py"), script!);
    const before = await latest();
    const channel = (await read(`/api/v1/missions/${missionId}/plan`)).body.channels[1];
    const r = spawnSync("python3", [join(dir, "pull-change-push.py"), missionId, channel.id, "37.5"], {
      encoding: "utf8",
      timeout: 60_000,
      env: { ...process.env, HETEROLANE_URL: BASE_URL, HETEROLANE_TOKEN: engineerToken },
    });
    expect({ code: r.status, stderr: r.stderr }).toEqual({ code: 0, stderr: "" });
    expect(r.stdout).toMatch(new RegExp(`^revision ${before} -> ${before + 1}: \\d+ errors, \\d+ warnings\\n$`));
    const after = (await read(`/api/v1/missions/${missionId}/plan`)).body.channels;
    expect(after.find((c: { id: string }) => c.id === channel.id).integrationMs).toBe(37.5);
    expect(await latest()).toBe(before + 1);
  });
});
