import { describe, expect, it } from "vitest";
import { parsePlan } from "../plan";
import { validPlanInput } from "../../../tests/fixtures/valid-plan";
import { type Doc, check, expectOnly, expectValid, issues } from "./edit-plan.test-util";

// The observation schedule of a laser pair (docs/plan-format.md §13.1–§13.2):
// its fields, its default, and the rules between it and the chains.

/** The base plan as a version 2 document whose laser LP1 serves chains A and B by a schedule. */
function shared(edit: (d: Doc) => void = () => {}) {
  return (d: Doc) => {
    d.format = "heterolane.plan/2";
    d.chains[1].laser = "LP1";
    d.lasers[0].schedule = {
      cycleMs: 100,
      retuneMs: 1,
      retuneMsPerGHz: 0.01,
      relockMs: 5,
      dwells: [
        { chain: "A", dwellMs: 40 },
        { chain: "B", dwellMs: 60 },
      ],
    };
    edit(d);
  };
}

describe("the schedule field", () => {
  it("defaults to null on every laser, in version 1 and version 2 documents", () => {
    const r = parsePlan(validPlanInput());
    expect(r.ok).toBe(true);
    if (r.ok) for (const l of r.plan.lasers) expect(l.schedule).toBeNull();
    expectValid((d) => {
      d.format = "heterolane.plan/2";
      d.lasers[0].schedule = null;
    });
  });
  it("is refused in a version 1 document, at the field", () => {
    const found = issues((d) => (d.lasers[0].schedule = null));
    expect(found.map((i) => i.path)).toEqual(["lasers[0].schedule"]);
    expect(found[0]!.message).toContain("heterolane.plan/2");
  });
  it("lets the chains of one schedule share their laser pair", () => {
    expectValid(shared());
    const r = check(shared());
    expect(r.ok && r.plan.lasers[0]!.schedule?.dwells.map((x) => x.chain)).toEqual(["A", "B"]);
  });
  it("still refuses two chains on one laser without a schedule", () => {
    const found = issues((d) => {
      d.format = "heterolane.plan/2";
      d.chains[1].laser = "LP1";
    });
    expect(found.map((i) => i.path)).toEqual(["chains[1].laser"]);
  });
  it.each([
    ["cycleMs", 0, "must be greater than 0"],
    ["cycleMs", -5, "must be greater than 0"],
    ["retuneMs", -1, "must be at least 0"],
    ["retuneMsPerGHz", -0.5, "must be at least 0"],
    ["relockMs", -1, "must be at least 0"],
  ])("checks %s = %s at its path", (field, value, message) => {
    expectOnly(
      shared((d) => (d.lasers[0].schedule[field] = value)),
      `lasers[0].schedule.${field}`,
      new RegExp(message),
    );
  });
  it("needs at least one dwell, and each dwell a positive length", () => {
    expect(issues(shared((d) => (d.lasers[0].schedule.dwells = [])))).toContainEqual({
      path: "lasers[0].schedule.dwells",
      message: "must have at least 1 item",
    });
    expect(issues(shared((d) => (d.lasers[0].schedule.dwells[1].dwellMs = 0))).map((i) => i.path)).toContain(
      "lasers[0].schedule.dwells[1].dwellMs",
    );
  });
  it("refuses an unknown key in a dwell", () => {
    expect(issues(shared((d) => (d.lasers[0].schedule.dwells[0].extra = 1))).map((i) => i.path)).toEqual([
      "lasers[0].schedule.dwells[0].extra",
    ]);
  });
});

describe("the rules between a schedule and the chains", () => {
  it("names an unknown chain at its dwell (and the chain the schedule then leaves out)", () => {
    expect(issues(shared((d) => (d.lasers[0].schedule.dwells[1].chain = "Z")))).toEqual([
      { path: "lasers[0].schedule.dwells[1].chain", message: 'refers to chain "Z", which does not exist' },
      {
        path: "chains[1].laser",
        message:
          'laser "LP1" serves the chains of its schedule ("A", "Z"); add chain "B" to the schedule or give it a laser of its own',
      },
    ]);
  });
  it("refuses a chain that dwells twice in one cycle", () => {
    const found = issues(shared((d) => d.lasers[0].schedule.dwells.push({ chain: "A", dwellMs: 10 })));
    expect(found.map((i) => i.path)).toEqual(["lasers[0].schedule.dwells[2].chain"]);
    expect(found[0]!.message).toMatch(/already has dwells\[0\]/);
  });
  it("refuses a chain in the schedules of two lasers", () => {
    const found = issues(
      shared((d) => {
        d.lasers[1].schedule = {
          cycleMs: 50,
          retuneMs: 0,
          retuneMsPerGHz: 0,
          relockMs: 0,
          dwells: [{ chain: "A", dwellMs: 50 }],
        };
      }),
    );
    expect(found.map((i) => i.path)).toEqual(["lasers[1].schedule.dwells[0].chain"]);
    expect(found[0]!.message).toMatch(/already in the schedule of its own laser "LP1"; a chain is in one schedule/);
  });
  it("refuses a chain of another laser pair in a schedule", () => {
    const found = issues(
      shared((d) => {
        d.chains[1].laser = "LP2";
      }),
    );
    expect(found.map((i) => i.path)).toEqual(["lasers[0].schedule.dwells[1].chain"]);
    expect(found[0]!.message).toMatch(/uses laser "LP2", not "LP1"/);
  });
  it("refuses a chain on a scheduled laser that the schedule leaves out", () => {
    const found = issues(shared((d) => d.lasers[0].schedule.dwells.pop()));
    expect(found.map((i) => i.path)).toEqual(["chains[1].laser"]);
    expect(found[0]!.message).toMatch(/add chain "B" to the schedule or give it a laser of its own/);
  });
  it("refuses a dwell no longer than the switch into it, naming the retune and relock", () => {
    // A → B: |−121 − 184.81| = 305.81 GHz of LO change, 1 + 0.01·305.81 = 4.0581 ms, and a relock (R1 → R2) of 5 ms
    expectValid(shared((d) => (d.lasers[0].schedule.dwells[1].dwellMs = 9.06)));
    expectOnly(
      shared((d) => (d.lasers[0].schedule.dwells[1].dwellMs = 9.0581)),
      "lasers[0].schedule.dwells[1].dwellMs",
      'must be longer than the switch into it from chain "A" (9.0581 ms: retune 4.0581 ms for 305.81 GHz of LO change, relock 5 ms)',
    );
    // the first dwell's switch is from the last one (the cycle repeats)
    expectOnly(
      shared((d) => (d.lasers[0].schedule.dwells[0].dwellMs = 2)),
      "lasers[0].schedule.dwells[0].dwellMs",
      /from chain "B"/,
    );
  });
  it("a single-chain schedule has no switch at all", () => {
    expectValid((d) => {
      d.format = "heterolane.plan/2";
      d.lasers[0].schedule = {
        cycleMs: 10,
        retuneMs: 50,
        retuneMsPerGHz: 1,
        relockMs: 50,
        dwells: [{ chain: "A", dwellMs: 0.5 }],
      };
    });
  });
});
