/**
 * API benchmark (`npm run bench:api`, docs/decisions/028-api-speed.md):
 * the HTTP API under load, as a team feels it. Against a running
 * production build (HETEROLANE_BENCH_URL; src/ops/bench-api.sh starts a
 * throwaway one when it is not set) holding the demo seed (`npm run
 * db:seed`), it signs in the four demo people twice each over the auth
 * API (eight sessions, spread over the connections) and runs, after a
 * warm-up:
 *
 * 1. `POST /api/v1/check` of the demo plan from 50 connections for 30 s:
 *    p95 ≤ 150 ms, and at least 3 × the throughput measured before this
 *    work (BEFORE_CHECK_RPS below);
 * 2. `GET /api/v1/missions/:id` of the demo mission from 50 connections
 *    for 30 s: p95 ≤ 100 ms;
 * 3. the same GET at a steady rate (INTERFERENCE_RATE requests/s from 10
 *    connections, well inside what the server can serve), once alone and
 *    once while a plan at the format's limits (64 chains, 256 channels;
 *    limits-plan.ts) is checked back to back by one more client: its p95
 *    may rise by at most 20 %.
 *
 * Every latency is the time autocannon measured for each answer; the
 * percentiles are computed here from all of them. Each figure is printed
 * with its target and PASS or MISS, the load average beside it (the
 * machine may be shared). Any answer that is not 200 counts as an error
 * and fails its line. Durations: HETEROLANE_BENCH_SECONDS (default 30) for
 * runs 1 and 2, half of it for each half of run 3.
 *
 * All data here is invented demo data.
 */
import { loadavg } from "node:os";
import autocannon from "autocannon";
import { DEMO_PASSWORD, DEMO_PEOPLE } from "@/server/seed/demo-people";
import { DEMO_MISSION_NAME, demoPlan } from "@db/seed/mission-demo-plan";
import { limitsPlan } from "./limits-plan";

/**
 * Throughput of `POST /api/v1/check` (demo plan, 50 connections, 30 s) on
 * the code before this work (commit 157dd27), measured with this script on
 * this machine at a load average of about 5.5, its best run of the day
 * (docs/calculations.md, "Speed of the API").
 */
const BEFORE_CHECK_RPS = 132.6;
const CHECK_P95_MS = 150;
const GET_P95_MS = 100;
const INTERFERENCE_RISE = 0.2;
/** Requests per second of the steady GET load in run 3. */
const INTERFERENCE_RATE = 40;

const base = (process.env.HETEROLANE_BENCH_URL ?? "http://localhost:3000").replace(/\/$/, "");
const seconds = Math.max(4, Number(process.env.HETEROLANE_BENCH_SECONDS ?? 30));

interface Run {
  label: string;
  latencies: number[];
  errors: number;
  statuses: Map<number, number>;
  seconds: number;
  load: string;
}

const load = () =>
  loadavg()
    .map((x) => x.toFixed(2))
    .join(" ");

function quantile(sorted: number[], q: number): number {
  if (sorted.length === 0) return Number.NaN;
  const i = Math.min(sorted.length - 1, Math.max(0, Math.ceil(q * sorted.length) - 1));
  return sorted[i]!;
}

/** Signs one demo person in through the auth API and returns the cookie header of the session. */
async function signIn(email: string): Promise<string> {
  const res = await fetch(`${base}/api/auth/sign-in/email`, {
    method: "POST",
    headers: { "content-type": "application/json", origin: base },
    body: JSON.stringify({ email, password: DEMO_PASSWORD }),
    redirect: "manual",
  });
  if (!res.ok) throw new Error(`sign-in of ${email} answered ${res.status}: ${await res.text()}`);
  const cookies = res.headers.getSetCookie().map((line) => line.split(";")[0]!);
  if (cookies.length === 0) throw new Error(`sign-in of ${email} set no cookie`);
  return cookies.join("; ");
}

async function getJson(path: string, cookie: string): Promise<unknown> {
  const res = await fetch(`${base}${path}`, { headers: { cookie } });
  if (!res.ok) throw new Error(`GET ${path} answered ${res.status}: ${await res.text()}`);
  return res.json();
}

interface LoadSpec {
  label: string;
  path: string;
  method: "GET" | "POST";
  body?: string;
  connections: number;
  duration: number;
  overallRate?: number;
}

/** One autocannon run; every connection carries one of the sessions (round robin). */
async function run(spec: LoadSpec, cookies: string[]): Promise<Run> {
  const latencies: number[] = [];
  const statuses = new Map<number, number>();
  let errors = 0;
  let next = 0;
  const headers: Record<string, string> = { origin: base };
  if (spec.body !== undefined) headers["content-type"] = "application/json";
  const loadBefore = load();
  const result = await new Promise<autocannon.Result>((resolve, reject) => {
    const instance = autocannon(
      {
        url: `${base}${spec.path}`,
        method: spec.method,
        body: spec.body,
        headers,
        connections: spec.connections,
        duration: spec.duration,
        ...(spec.overallRate ? { overallRate: spec.overallRate } : {}),
        setupClient: (client) => {
          client.setHeaders({ ...headers, cookie: cookies[next++ % cookies.length]! });
        },
      },
      (err, res) => (err ? reject(err) : resolve(res)),
    );
    instance.on("response", (_client, statusCode, _bytes, responseTime) => {
      latencies.push(responseTime);
      statuses.set(statusCode, (statuses.get(statusCode) ?? 0) + 1);
      if (statusCode !== 200) errors++;
    });
  });
  errors += result.errors + result.timeouts;
  latencies.sort((a, b) => a - b);
  return { label: spec.label, latencies, errors, statuses, seconds: spec.duration, load: `${loadBefore} → ${load()}` };
}

const verdict = (ok: boolean) => (ok ? "PASS" : "MISS");
const ms = (x: number) => `${x.toFixed(1)} ms`;

function describe(r: Run): string {
  const l = r.latencies;
  const rps = l.length / r.seconds;
  const codes = [...r.statuses].map(([c, n]) => `${c}×${n}`).join(" ");
  return (
    `${r.label}: ${rps.toFixed(1)} requests/s, p50 ${ms(quantile(l, 0.5))}, p95 ${ms(quantile(l, 0.95))}, ` +
    `p99 ${ms(quantile(l, 0.99))}, max ${ms(l[l.length - 1] ?? Number.NaN)}; answers ${codes || "none"}, errors ${r.errors}; ` +
    `load average ${r.load}`
  );
}

/** Posts `body` to /api/v1/check back to back until `stop` is set; returns the time of each check. */
async function checkLoop(body: string, cookie: string, stop: { done: boolean }): Promise<number[]> {
  const times: number[] = [];
  while (!stop.done) {
    const t = performance.now();
    const res = await fetch(`${base}/api/v1/check`, {
      method: "POST",
      headers: { "content-type": "application/json", origin: base, cookie },
      body,
    });
    await res.arrayBuffer();
    if (res.status !== 200) throw new Error(`the 256-channel check answered ${res.status}`);
    times.push(performance.now() - t);
  }
  return times;
}

async function main() {
  console.log(`bench:api against ${base}, ${seconds} s runs; load average at start ${load()}`);
  const cookies: string[] = [];
  for (let round = 0; round < 2; round++) for (const p of DEMO_PEOPLE) cookies.push(await signIn(p.email));
  const { missions } = (await getJson("/api/v1/missions", cookies[0]!)) as { missions: { id: string; name: string }[] };
  const demo = missions.find((m) => m.name === DEMO_MISSION_NAME);
  if (!demo) throw new Error(`the demo mission "${DEMO_MISSION_NAME}" is not there: run npm run db:seed first`);
  const demoBody = JSON.stringify(demoPlan());
  const bigBody = JSON.stringify(limitsPlan());
  const missionPath = `/api/v1/missions/${demo.id}`;

  const check = (duration: number, label: string) =>
    run({ label, path: "/api/v1/check", method: "POST", body: demoBody, connections: 50, duration }, cookies);
  const read = (duration: number, label: string) =>
    run({ label, path: missionPath, method: "GET", connections: 50, duration }, cookies);
  const steady = (duration: number, label: string) =>
    run(
      { label, path: missionPath, method: "GET", connections: 10, duration, overallRate: INTERFERENCE_RATE },
      cookies,
    );

  await check(3, "warm-up check");
  await read(3, "warm-up read");
  const bigStop = { done: false };
  const warmBig = checkLoop(bigBody, cookies[1]!, bigStop);
  await new Promise((r) => setTimeout(r, 1500));
  bigStop.done = true;
  await warmBig;

  const checked = await check(seconds, "POST /api/v1/check, demo plan, 50 connections");
  const reads = await read(seconds, "GET /api/v1/missions/:id, demo mission, 50 connections");
  const half = Math.max(2, Math.round(seconds / 2));
  const alone = await steady(half, `GET mission at ${INTERFERENCE_RATE}/s alone`);
  const stop = { done: false };
  const big = checkLoop(bigBody, cookies[1]!, stop);
  const beside = await steady(half, `GET mission at ${INTERFERENCE_RATE}/s beside 256-channel checks`);
  stop.done = true;
  const bigTimes = (await big).sort((a, b) => a - b);

  console.log("");
  for (const r of [checked, reads, alone, beside]) console.log(describe(r));
  console.log(
    `256-channel checks beside run 3: ${bigTimes.length} done, median ${ms(quantile(bigTimes, 0.5))}, max ${ms(bigTimes[bigTimes.length - 1] ?? Number.NaN)}`,
  );
  console.log("");

  const checkRps = checked.latencies.length / checked.seconds;
  const checkP95 = quantile(checked.latencies, 0.95);
  const readP95 = quantile(reads.latencies, 0.95);
  const aloneP95 = quantile(alone.latencies, 0.95);
  const besideP95 = quantile(beside.latencies, 0.95);
  const rise = besideP95 / aloneP95 - 1;
  const lines: [string, boolean][] = [
    [`POST /check p95 ${ms(checkP95)} (target ≤ ${CHECK_P95_MS} ms)`, checkP95 <= CHECK_P95_MS && checked.errors === 0],
    BEFORE_CHECK_RPS > 0
      ? [
          `POST /check ${checkRps.toFixed(1)} requests/s = ${(checkRps / BEFORE_CHECK_RPS).toFixed(2)} × before (${BEFORE_CHECK_RPS} requests/s; target ≥ 3 ×)`,
          checkRps >= 3 * BEFORE_CHECK_RPS && checked.errors === 0,
        ]
      : [`POST /check ${checkRps.toFixed(1)} requests/s (no figure from before recorded yet)`, false],
    [`GET mission p95 ${ms(readP95)} (target ≤ ${GET_P95_MS} ms)`, readP95 <= GET_P95_MS && reads.errors === 0],
    [
      `GET mission p95 beside 256-channel checks ${ms(besideP95)} vs alone ${ms(aloneP95)}: ${rise >= 0 ? "+" : ""}${(rise * 100).toFixed(1)} % (target ≤ +${INTERFERENCE_RISE * 100} %)`,
      rise <= INTERFERENCE_RISE && alone.errors === 0 && beside.errors === 0 && bigTimes.length > 0,
    ],
  ];
  for (const [text, ok] of lines) console.log(`${verdict(ok)}  ${text}`);
  console.log(`load average at the end ${load()}`);
}

main().catch((e: unknown) => {
  console.error(`bench:api failed: ${(e as Error).message}`);
  process.exit(1);
});
