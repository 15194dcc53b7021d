/**
 * Issue 17: the database stops under load. Its own PostgreSQL cluster and
 * app process (src/ops/test-all.sh starts them and sets
 * HETEROLANE_FAULT_URL, HETEROLANE_FAULT_DATABASE_URL,
 * HETEROLANE_FAULT_PG_DIR and HETEROLANE_FAULT_PG_PORT; skipped without),
 * so no other test sees the outage. Workers import plan documents (each a
 * transaction replacing the draft and storing a revision) and edit a
 * channel; mid-load the cluster is stopped at once (as a crash), and later
 * started again. Asserted: while it is down every answer is 503 with
 * Retry-After (never 500), on every kind of route; after it is back the
 * same requests succeed; and no revision is partial — every stored
 * revision holds a whole plan, its findings and its activity row, the
 * numbers have no gaps, and the draft is the newest revision's plan.
 * Bounded in time (phases of a few seconds, at most 90 s to recover) and
 * in requests (at most 1 500).
 */
import { execFileSync } from "node:child_process";
import { join } from "node:path";
import { Pool } from "pg";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { TEST_PASSWORD, TestClient, uniqueEmail } from "../setup/auth-helpers";
import { validPlanInput } from "../fixtures/valid-plan";

const URL_ = process.env.HETEROLANE_FAULT_URL ?? "";
const DB = process.env.HETEROLANE_FAULT_DATABASE_URL ?? "";
const PG_DIR = process.env.HETEROLANE_FAULT_PG_DIR ?? "";
const PG_PORT = process.env.HETEROLANE_FAULT_PG_PORT ?? "";
const ready = !!(URL_ && DB && PG_DIR && PG_PORT);
const MAX_REQUESTS = 1500;
const ROOT = join(__dirname, "../..");

const cluster = (action: "stop" | "start") =>
  execFileSync("bash", [join(ROOT, "src/ops/fault-db.sh"), action, PG_DIR, PG_PORT], {
    stdio: "pipe",
    timeout: 90_000,
  });

let pool: Pool;
let person: TestClient;
let missionId = "";
let requests = 0;

/** A request to the fault app as `person` (JSON in and out). */
async function send(method: string, path: string, json?: unknown) {
  requests++;
  const h = new Headers({ origin: URL_, cookie: person.cookieHeader() });
  if (json !== undefined) h.set("content-type", "application/json");
  try {
    const res = await fetch(`${URL_}${path}`, {
      method,
      headers: h,
      body: json === undefined ? undefined : JSON.stringify(json),
    });
    const text = await res.text();
    return { status: res.status, retryAfter: res.headers.get("retry-after"), text };
  } catch (e) {
    return { status: 0, retryAfter: null, text: String(e) };
  }
}

/** Two plans that differ in their channels (2 and 3), so a half-written import would show. */
function planOf(variant: 0 | 1) {
  const p = validPlanInput();
  p.name = `Fault test plan ${variant}`;
  if (variant === 1) p.channels = p.channels.slice(0, 2);
  return p;
}

beforeAll(async () => {
  if (!ready) return;
  pool = new Pool({ connectionString: DB, max: 2 });
  pool.on("error", () => undefined);
  person = new TestClient();
  person.origin = URL_;
  person.email = uniqueEmail("fault");
  const signUp = await person.postJson(`${URL_}/api/auth/sign-up/email`, {
    name: "Fault Tester",
    email: person.email,
    password: TEST_PASSWORD,
  });
  expect(signUp.status).toBe(200);
  // This cluster has no mail catcher of its own: confirm the address directly.
  await pool.query(`update "user" set email_verified = true where email = $1`, [person.email]);
  expect(
    (await person.postJson(`${URL_}/api/auth/sign-in/email`, { email: person.email, password: TEST_PASSWORD })).status,
  ).toBe(200);
  const team = await person.postJson(`${URL_}/api/auth/organization/create`, {
    name: "Fault team",
    slug: `fault-${Date.now()}`,
  });
  expect(team.status).toBe(200);
  await person.postJson(`${URL_}/api/auth/organization/set-active`, { organizationId: team.body.id });
  const mission = await send("POST", "/api/v1/missions", { name: "Fault mission" });
  expect(mission.status).toBe(201);
  missionId = JSON.parse(mission.text).id;
  expect((await send("POST", `/api/v1/missions/${missionId}/plan`, planOf(0))).status).toBe(201);
}, 120_000);

afterAll(async () => {
  if (!ready) return;
  try {
    cluster("start");
  } catch {
    // already running
  }
  await pool.end();
});

describe.skipIf(!ready)("the database stops under load", () => {
  it("503 with Retry-After while it is down, recovery afterwards, and no partial revision", async () => {
    const M = `/api/v1/missions/${missionId}`;
    const byPhase: Record<string, Map<number, number>> = { before: new Map(), down: new Map(), after: new Map() };
    const outageAnswers: { status: number; retryAfter: string | null; text: string }[] = [];
    let phase: "before" | "down" | "after" | "stop" = "before";
    const count = (s: number) => {
      if (phase === "stop") return;
      const m = byPhase[phase]!;
      m.set(s, (m.get(s) ?? 0) + 1);
    };

    /** A worker: imports the two plans in turn and renames a channel, until told to stop or out of requests. */
    const worker = async (n: number) => {
      for (let i = 0; phase !== "stop" && requests < MAX_REQUESTS; i++) {
        const startedIn = phase;
        const r =
          (i + n) % 3 === 2
            ? await send("GET", `${M}/channels`)
            : await send("POST", `${M}/plan`, planOf(((i + n) % 2) as 0 | 1));
        // An answer to a request sent just before the stop may still be a success or a 503: count it where it began.
        if (startedIn === phase) count(r.status);
        if (startedIn === "down" && phase === "down") outageAnswers.push(r);
        await new Promise((res) => setTimeout(res, 20));
      }
    };
    const workers = [0, 1, 2, 3].map(worker);
    const sleep = (ms: number) => new Promise((res) => setTimeout(res, ms));

    await sleep(3000);
    cluster("stop");
    phase = "down";
    // Every kind of route while it is down: reads, writes, the engine check, the auth API, the probe.
    await sleep(500);
    const probes = [
      await send("GET", "/api/v1/missions"),
      await send("GET", M),
      await send("PATCH", M, { name: "x", version: 1 }),
      await send("GET", `${M}/findings`),
      await send("POST", "/api/v1/check", planOf(0)),
      await send("GET", "/api/team"),
      await send("GET", "/api/auth/get-session"),
      await send("POST", "/api/auth/sign-in/email", { email: person.email, password: TEST_PASSWORD }),
      await send("GET", "/api/health"),
    ];
    await sleep(3000);
    phase = "after";
    cluster("start");
    // Recovery: the probe answers 200 again within 90 s.
    const deadline = Date.now() + 90_000;
    let health = 0;
    while (Date.now() < deadline && (health = (await send("GET", "/api/health")).status) !== 200) await sleep(250);
    expect(health).toBe(200);
    await sleep(3000);
    phase = "stop";
    await Promise.all(workers);

    const summary = Object.entries(byPhase)
      .map(([p, m]) => `${p}: ${[...m].map(([s, n]) => `${s}×${n}`).join(" ")}`)
      .join("; ");
    console.log(`[fault] ${requests} requests; ${summary}`);

    // Before: the load worked.
    expect(byPhase.before!.get(201) ?? 0).toBeGreaterThan(0);
    // Down: only 503 with Retry-After, on every route probed, and from the load.
    for (const p of probes)
      expect([p.status, p.retryAfter, p.text.slice(0, 80)]).toEqual([503, "5", expect.any(String)]);
    expect(outageAnswers.length).toBeGreaterThan(0);
    for (const a of outageAnswers) expect([a.status, a.retryAfter]).toEqual([503, "5"]);
    expect([...byPhase.down!.keys()].filter((s) => s >= 500 && s !== 503)).toEqual([]);
    // After: it works again.
    expect(byPhase.after!.get(201) ?? 0).toBeGreaterThan(0);
    expect(await send("GET", M).then((r) => r.status)).toBe(200);
    expect(requests).toBeLessThanOrEqual(MAX_REQUESTS + 20);

    // No partial revision.
    const { rows } = await pool.query(
      `select r.number, jsonb_array_length(r.plan->'channels') as channels, jsonb_array_length(r.result->'findings') as result_findings,
              (select count(*)::int from findings f where f.revision_id = r.id) as finding_rows,
              (select count(*)::int from activity a where a.mission_id = r.mission_id and a.revision_after = r.number) as activity_rows
         from plan_revisions r where r.mission_id = $1 order by r.number`,
      [missionId],
    );
    expect(rows.map((r) => r.number)).toEqual(rows.map((_, i) => i + 1));
    for (const r of rows) {
      if (r.number > 1) expect([r.number, [2, 3]]).toEqual([r.number, expect.arrayContaining([r.channels])]);
      expect([r.number, r.finding_rows]).toEqual([r.number, r.result_findings]);
      expect([r.number, r.activity_rows]).toEqual([r.number, 1]);
    }
    const latest = rows[rows.length - 1]!;
    const draft = (await pool.query(`select count(*)::int as n from channels where mission_id = $1`, [missionId]))
      .rows[0].n;
    expect(draft).toBe(latest.channels);
  }, 240_000);
});
