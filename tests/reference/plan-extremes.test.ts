import { afterAll, describe, expect, it } from "vitest";
import { spawn, type ChildProcess } from "node:child_process";
import { createInterface } from "node:readline";
import { join } from "node:path";
import { MAX_GRID_POINTS, MAX_LOCK_ORDER_ENUMERATED } from "@/lib/plan";
import { parsePlan, planBoundIssues } from "@/schemas/plan";
import { validPlanInput } from "../fixtures/valid-plan";

// The validator accepts any finite number within the plan format's signs and
// ranges, so absurd magnitudes reach the engine (through the CLI and the
// HTTP endpoint, where an engine that never returns blocks the server).
// Each accepted document here must be checked without throwing and within
// the engine's work-step bound (below). The engine runs in a child process,
// so a hang fails the case instead of the test run; no time is asserted
// (speed is measured by `npm run bench`).
const ROOT = join(__dirname, "../..");
/** A check that has not answered by then is taken to hang (the case fails; the worker is restarted). */
const HANG_MS = 6000;

type Doc = Record<string, any>; // eslint-disable-line @typescript-eslint/no-explicit-any

/**
 * The work-step bound (ADR 018: the engine bounds its own work; steps as
 * counted by `checkPlan(plan, { work })`, see `WorkCounter`). A check
 * evaluates each chain once at its LO and builds the chain's feasibility
 * map over each of its laser's reach intervals; each of these enumerates at
 * most 2·M lock-lo orders and 2·M lock-self tones (M =
 * `MAX_LOCK_ORDER_ENUMERATED`), so lock orders add at most
 * Σ_chains (1 + reach intervals)·4·M steps. The other counted enumerations
 * — zone edges (at most `MAX_ZONE_CROSSINGS` + 1 per edge of a piece), mode
 * windows (at most `MAX_WINDOWS`) and image-rule evaluations (a grid of at
 * most `MAX_GRID_POINTS` per piece, and its bisections) — are allowed
 * together the size of the largest single one, `MAX_GRID_POINTS`. This is
 * a budget, not a worst case over all plans (the limits cap each
 * enumeration, not how many pieces are enumerated): the documents here
 * take at most about 3·10⁴ steps, and an enumeration that escaped its
 * limit at these magnitudes would take many orders of magnitude more.
 */
function workStepBound(doc: Doc): number {
  let lockOrders = 0;
  for (const chain of doc.chains) {
    const laser = doc.lasers.find((l: Doc) => l.id === chain.laser);
    lockOrders += (1 + laser.reach.length) * 4 * MAX_LOCK_ORDER_ENUMERATED;
  }
  return lockOrders + MAX_GRID_POINTS;
}

const cases: [string, (d: Doc) => void][] = [
  ["reach spanning ±1e12 GHz", (d) => (d.lasers[0].reach = [{ minGHz: -1e12, maxGHz: 1e12 }])],
  ["reach of 1e300 GHz", (d) => (d.lasers[1].reach[0].minGHz = -1e300)],
  ["stepMHz of 1e-300", (d) => (d.lasers[0].stepMHz = 1e-300)],
  ["stepMHz of 1e300", (d) => (d.lasers[0].stepMHz = 1e300)],
  ["lock.orders of 1e12", (d) => (d.lasers[1].lock.orders = 1e12)],
  ["driftMHz of 1e13 with a sampled IF", (d) => (d.lasers[1].driftMHz = 1e13)],
  ["fsrGHz of 1e-298", (d) => (d.resonators[0].fsrGHz = 1e-298)],
  ["sampleRateGHz of 1e-299", (d) => (d.detectors[1].sampleRateGHz = 1e-299)],
  ["centerGHz of 1e302", (d) => (d.channels[0].centerGHz = 1e302)],
  [
    "DSB channel at 1e190 GHz with a sampled IF",
    (d) => {
      d.channels[2].dsbOffsetGHz = 1;
      d.channels[2].centerGHz = 1e190;
    },
  ],
  ["lower-sideband channel at 1e302 GHz with a sampled IF", (d) => (d.channels[2].centerGHz = 1e302)],
  ["guardMHz of 1e300", (d) => (d.settings.guardMHz = 1e300)],
  ["loadedQ of 1e300", (d) => (d.resonators[1].loadedQ = 1e300)],
  ["carrierTHz of 1e-300", (d) => (d.lasers[1].carrierTHz = 1e-300)],
  [
    "LO offsets near 1e10 GHz, where doubles are wider apart than the image edge bracket",
    (d) => {
      const X = 1e10;
      d.lasers[0].reach = [{ minGHz: X - 50, maxGHz: X + 50 }];
      d.lasers[0].stepMHz = 0;
      d.resonators[0].fsrGHz = X;
      d.chains[0].rfInput = { minGHz: X - 20, maxGHz: X + 20 };
      d.chains[0].loOffsetGHz = X + 1.5;
      d.channels[0].centerGHz = X;
      d.channels[1].centerGHz = X;
    },
  ],
];

let child: ChildProcess | null = null;
let lines: AsyncIterator<string> | null = null;

async function worker(): Promise<[ChildProcess, AsyncIterator<string>]> {
  if (!child || !lines) {
    child = spawn(
      process.execPath,
      ["--import", "tsx", "--max-old-space-size=1024", "tests/reference/support/check-plan-worker.ts"],
      {
        cwd: ROOT,
        stdio: ["pipe", "pipe", "ignore"],
      },
    );
    lines = createInterface({ input: child.stdout! })[Symbol.asyncIterator]();
    const first = await lines.next();
    if (first.value !== "ready") throw new Error("the check worker did not start");
  }
  return [child, lines];
}

async function checkInChild(doc: unknown): Promise<{ steps?: number; threw?: string; invalid?: unknown; hung?: true }> {
  const [proc, out] = await worker();
  proc.stdin!.write(`${JSON.stringify(doc)}\n`);
  let timer: NodeJS.Timeout | undefined;
  const answer = await Promise.race([
    out.next(),
    new Promise<null>((resolve) => (timer = setTimeout(() => resolve(null), HANG_MS))),
  ]);
  clearTimeout(timer);
  if (answer === null || answer.done) {
    proc.kill("SIGKILL");
    child = null;
    lines = null;
    return { hung: true };
  }
  return JSON.parse(answer.value);
}

describe("checkPlan on accepted documents with absurd magnitudes", { timeout: 60_000 }, () => {
  afterAll(() => {
    child?.kill("SIGKILL");
  });
  it.each(cases)("%s: accepted, checked within the work-step bound, no throw", async (_label, edit) => {
    const doc = validPlanInput() as Doc;
    edit(doc);
    const r = await checkInChild(doc);
    expect(r.invalid).toBeUndefined();
    expect(r.threw).toBeUndefined();
    expect(r.hung).toBeUndefined();
    expect(r.steps).toBeGreaterThan(0);
    expect(r.steps).toBeLessThan(workStepBound(doc));
  });
});

/**
 * The same documents are refused by the workspace (ADR 030): every save and
 * import checks the hard ranges of docs/plan-format.md §15, and each of the
 * cases above holds at least one value outside them, named by its path. The
 * format and the engine still accept them (above), for the check endpoint
 * and the command line.
 */
const namedPaths: Record<string, string[]> = {
  "reach spanning ±1e12 GHz": ["lasers[0].reach[0].minGHz", "lasers[0].reach[0].maxGHz"],
  "reach of 1e300 GHz": ["lasers[1].reach[0].minGHz"],
  "stepMHz of 1e-300": [],
  "stepMHz of 1e300": ["lasers[0].stepMHz"],
  "lock.orders of 1e12": [],
  "driftMHz of 1e13 with a sampled IF": ["lasers[1].driftMHz"],
  "fsrGHz of 1e-298": [],
  "sampleRateGHz of 1e-299": [],
  "centerGHz of 1e302": ["channels[0].centerGHz"],
  "DSB channel at 1e190 GHz with a sampled IF": ["channels[2].centerGHz"],
  "lower-sideband channel at 1e302 GHz with a sampled IF": ["channels[2].centerGHz"],
  "guardMHz of 1e300": ["settings.guardMHz"],
  "loadedQ of 1e300": ["resonators[1].loadedQ"],
  "carrierTHz of 1e-300": ["lasers[1].carrierTHz"],
  "LO offsets near 1e10 GHz, where doubles are wider apart than the image edge bracket": [
    "lasers[0].reach[0].minGHz",
    "lasers[0].reach[0].maxGHz",
    "resonators[0].fsrGHz",
    "chains[0].loOffsetGHz",
    "chains[0].rfInput.minGHz",
    "chains[0].rfInput.maxGHz",
    "channels[0].centerGHz",
    "channels[1].centerGHz",
  ],
};

describe("the workspace's hard ranges on the same documents", () => {
  it.each(cases)("%s: the values outside the hard ranges are named by path", (label, edit) => {
    const doc = validPlanInput() as Doc;
    edit(doc);
    const r = parsePlan(doc);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(planBoundIssues(r.plan).map((i) => i.path)).toEqual(namedPaths[label]);
  });
});
