import { mkdtempSync, statSync, writeFileSync, chmodSync, readFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { validPlanInput } from "../../../tests/fixtures/valid-plan";
import { checkRemote, login, missions, pull, push, report, type Io } from "./commands";
import { CliError, EXIT } from "./errors";
import { table } from "./table";

// The remote commands against a fake server (a fetch that answers from a
// table). Exit statuses and messages are what is tested here; the real server
// round trip is tests/integration/cli-remote.test.ts.
const TOKEN = `hl_${"z".repeat(64)}`;
const MID = "11111111-2222-4333-8444-555555555555";

type Handler = (req: { method: string; path: string; auth: string | null; body: unknown }) => [number, unknown];

function fakeFetch(handler: Handler, seen: string[] = []): typeof fetch {
  return (async (input: string | URL | Request, init?: RequestInit) => {
    const url = new URL(String(input));
    const headers = new Headers(init?.headers);
    seen.push(`${init?.method ?? "GET"} ${url.pathname}${url.search}`);
    const [status, body] = handler({
      method: init?.method ?? "GET",
      path: `${url.pathname}${url.search}`,
      auth: headers.get("authorization"),
      body: init?.body ? JSON.parse(String(init.body)) : undefined,
    });
    return new Response(JSON.stringify(body), { status, headers: { "content-type": "application/json" } });
  }) as typeof fetch;
}

function io(handler: Handler, extra: Partial<Io> = {}, seen?: string[]): Io {
  const dir = mkdtempSync(join(tmpdir(), "hl-cli-"));
  return {
    env: { HETEROLANE_CONFIG: join(dir, "config.json"), HETEROLANE_URL: "http://srv", HETEROLANE_TOKEN: TOKEN },
    cwd: dir,
    readStdin: async () => "",
    fetch: fakeFetch(handler, seen),
    ...extra,
  };
}

const missionList = {
  missions: [
    {
      id: MID,
      name: "Aurora",
      status: "draft",
      chainCount: 1,
      channelCount: 2,
      openErrors: 0,
      openWarnings: 1,
      updatedAt: "2026-01-02T03:04:05.000Z",
      version: 1,
    },
  ],
};
const plan = validPlanInput();

/** A small fake of the API: one mission at `latest`, which a push of a matching base moves on. */
function server(state: { latest: number }): Handler {
  return ({ method, path, auth, body }) => {
    if (auth !== `Bearer ${TOKEN}`)
      return [401, { error: { code: "invalid-token", message: "This API token is not valid." } }];
    if (method === "GET" && path === "/api/v1/missions") return [200, missionList];
    if (method === "GET" && path === `/api/v1/missions/${MID}/revisions`)
      return [200, { revisions: Array.from({ length: state.latest }, (_, i) => ({ number: state.latest - i })) }];
    const rev = path.match(new RegExp(`^/api/v1/missions/${MID}/revisions/(\\d+)$`));
    if (method === "GET" && rev) {
      const n = Number(rev[1]);
      if (n > state.latest) return [404, { error: { code: "not-found", message: "No such revision." } }];
      return [
        200,
        {
          number: n,
          status: "draft",
          authorName: "Erin",
          createdAt: "2026-01-02T03:04:05.000Z",
          summary: "s",
          plan,
          result: { findings: [] },
        },
      ];
    }
    if (method === "POST" && path.startsWith(`/api/v1/missions/${MID}/plan`)) {
      const base = new URL(`http://x${path}`).searchParams.get("baseRevision");
      if (base !== null && Number(base) !== state.latest)
        return [409, { error: { code: "stale-version", message: "stale", current: { revision: state.latest } } }];
      expect(body).toEqual(plan);
      state.latest += 1;
      return [201, { revision: { number: state.latest, errorCount: 0, warningCount: 0, infoCount: 0 } }];
    }
    if (method === "GET" && path === `/api/v1/missions/${MID}/result`)
      return [200, { findings: [{ severity: "info", code: "x", chain: "A", channel: null, message: "m" }] }];
    if (method === "GET" && path === `/api/v1/missions/${MID}`)
      return [200, { id: MID, name: "Aurora <b>", description: "", status: "draft" }];
    return [404, { error: { code: "not-found", message: "No such mission." } }];
  };
}

async function failure(p: Promise<unknown>): Promise<CliError> {
  try {
    await p;
  } catch (e) {
    if (e instanceof CliError) return e;
    throw e;
  }
  throw new Error("expected a CliError");
}

describe("remote commands", () => {
  it("pull then push with the remembered base stores a new revision; a second push of the old file is exit 3 naming the current revision", async () => {
    const state = { latest: 4 };
    const x = io(server(state));
    const pulled = await pull(x, "aurora", undefined, false);
    expect(JSON.parse(pulled.stdout)).toEqual(plan);
    const file = join(x.cwd, "plan.json");
    writeFileSync(file, pulled.stdout);
    const pushed = await push(x, MID, "plan.json", { force: false, asTable: false });
    expect(JSON.parse(pushed.stdout)).toMatchObject({ mission: MID, revision: { number: 5 } });
    // someone else saves: the server moves to 6; our file was pulled at 4, our last push made 5
    state.latest = 6;
    const stale = await failure(push(x, MID, file, { force: false, asTable: false }));
    expect(stale.exitCode).toBe(EXIT.stale);
    expect(stale.message).toMatch(/is at revision 6, not 5.*Nothing was overwritten/);
    expect(state.latest).toBe(6);
  });

  it("push without a known base is refused (exit 2) unless --base or --force", async () => {
    const state = { latest: 2 };
    const x = io(server(state));
    writeFileSync(join(x.cwd, "p.json"), JSON.stringify(plan));
    expect((await failure(push(x, MID, "p.json", { force: false, asTable: false }))).exitCode).toBe(EXIT.invalidInput);
    expect(state.latest).toBe(2);
    await push(x, MID, "p.json", { base: 2, force: false, asTable: false });
    expect(state.latest).toBe(3);
    await push(x, MID, "p.json", { force: true, asTable: false });
    expect(state.latest).toBe(4);
  });

  it("an invalid file is exit 2 with one line per problem, and nothing is sent", async () => {
    const seen: string[] = [];
    const x = io(server({ latest: 1 }), {}, seen);
    writeFileSync(join(x.cwd, "bad.json"), JSON.stringify({ ...plan, lasers: "none" }));
    const e = await failure(push(x, MID, "bad.json", { base: 1, force: false, asTable: false }));
    expect(e.exitCode).toBe(EXIT.invalidInput);
    expect(e.details.join("\n")).toMatch(/^lasers: /m);
    expect(seen).toEqual([]);
  });

  it("maps refusals to exit statuses: 401 → 4, 404 → 6, a missing revision → 6, an unknown name → 6", async () => {
    const bad = io(server({ latest: 1 }), {});
    bad.env.HETEROLANE_TOKEN = `hl_${"y".repeat(64)}`;
    const e401 = await failure(missions(bad, false));
    expect(e401.exitCode).toBe(EXIT.auth);
    expect(e401.message).not.toContain("yyyyyyyy");
    const x = io(server({ latest: 1 }));
    expect((await failure(pull(x, MID, 9, false))).exitCode).toBe(EXIT.notFound);
    expect((await failure(pull(x, "No such", undefined, false))).exitCode).toBe(EXIT.notFound);
    expect((await failure(checkRemote(x, "22222222-2222-4333-8444-555555555555", false))).exitCode).toBe(EXIT.notFound);
  });

  it("403 → 5, 429 → 7, 5xx and an unreachable server → 8", async () => {
    for (const [status, exit] of [
      [403, EXIT.forbidden],
      [429, EXIT.rateLimited],
      [500, EXIT.server],
      [503, EXIT.server],
    ] as const) {
      const x = io(() => [status, { error: { code: "x", message: `answer ${status}` } }]);
      const e = await failure(missions(x, false));
      expect({ status, exit: e.exitCode }).toEqual({ status, exit });
    }
    const down = io(() => [200, {}], {
      fetch: (async () => {
        throw Object.assign(new TypeError("fetch failed"), { cause: { code: "ECONNREFUSED" } });
      }) as typeof fetch,
    });
    const e = await failure(missions(down, false));
    expect(e.exitCode).toBe(EXIT.server);
    expect(e.message).toMatch(/Cannot reach http:\/\/srv: ECONNREFUSED/);
  });

  it("no server or token configured → exit 4", async () => {
    const x = io(server({ latest: 1 }));
    x.env = { HETEROLANE_CONFIG: join(x.cwd, "none.json") };
    expect((await failure(missions(x, false))).exitCode).toBe(EXIT.auth);
  });

  it("login keeps the server and token in a file of mode 600; a file others can read is refused", async () => {
    const x = io(server({ latest: 1 }), { readStdin: async () => `${TOKEN}\n` });
    const env = { HETEROLANE_CONFIG: x.env.HETEROLANE_CONFIG };
    const out = await login({ ...x, env }, "http://srv/");
    expect(JSON.parse(out.stdout)).toEqual({ server: "http://srv", config: env.HETEROLANE_CONFIG, missions: 1 });
    expect(statSync(env.HETEROLANE_CONFIG!).mode & 0o777).toBe(0o600);
    expect(JSON.parse(readFileSync(env.HETEROLANE_CONFIG!, "utf8"))).toEqual({ url: "http://srv", token: TOKEN });
    expect(JSON.parse((await missions({ ...x, env }, false)).stdout)).toEqual(missionList);
    chmodSync(env.HETEROLANE_CONFIG!, 0o644);
    const e = await failure(missions({ ...x, env }, false));
    expect(e.exitCode).toBe(EXIT.auth);
    expect(e.message).toMatch(/chmod 600/);
    expect(e.message).not.toContain(TOKEN);
  });

  it("--table prints a short table; report escapes what it prints", async () => {
    const x = io(server({ latest: 1 }));
    expect((await missions(x, true)).stdout.split("\n")[0]).toBe(
      "id                                    name    status  channels  errors  warnings  updated",
    );
    expect((await checkRemote(x, MID, true)).stdout).toContain("info      x     A      –        m");
    const html = (await report(x, MID)).stdout;
    expect(html).toContain("<h1>Aurora &lt;b&gt;</h1>");
    expect(html).toContain("Laser safety");
  });
});

describe("table", () => {
  it("pads every column but the last, with a rule under the header", () => {
    expect(
      table(
        ["a", "bb"],
        [
          ["xyz", 1],
          [null, "long"],
        ],
      ),
    ).toBe("a    bb\n---  ----\nxyz  1\n–    long\n");
  });
});
