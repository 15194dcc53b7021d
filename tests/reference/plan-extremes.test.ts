import { afterAll, describe, expect, it } from "vitest";
import { spawn, type ChildProcess } from "node:child_process";
import { createInterface } from "node:readline";
import { join } from "node:path";
import { validPlanInput } from "../fixtures/valid-plan";

// The validator accepts any finite number within the contract's signs and
// ranges, so absurd magnitudes reach the engine (through the CLI and the
// HTTP endpoint, where an engine that never returns blocks the server).
// Each accepted document here must be checked within a few seconds without
// throwing. The engine runs in a child process, so a hang fails the case
// instead of the test run.
const ROOT = join(__dirname, "../..");
const BUDGET_MS = 6000;

type Doc = Record<string, any>; // eslint-disable-line @typescript-eslint/no-explicit-any
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

async function checkInChild(doc: unknown): Promise<{ ms?: number; threw?: string; invalid?: unknown; hung?: true }> {
  const [proc, out] = await worker();
  proc.stdin!.write(`${JSON.stringify(doc)}\n`);
  let timer: NodeJS.Timeout | undefined;
  const answer = await Promise.race([
    out.next(),
    new Promise<null>((resolve) => (timer = setTimeout(() => resolve(null), BUDGET_MS))),
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
  it.each(cases)("%s: accepted, checked in time, no throw", async (_label, edit) => {
    const doc = validPlanInput() as Doc;
    edit(doc);
    const r = await checkInChild(doc);
    expect(r.invalid).toBeUndefined();
    expect(r.threw).toBeUndefined();
    expect(r.hung).toBeUndefined();
    expect(r.ms).toBeLessThan(BUDGET_MS);
  });
});
