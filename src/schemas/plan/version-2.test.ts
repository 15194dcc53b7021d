import { describe, expect, it } from "vitest";
import { parsePlan, parsePlanText, planSchema, VERSION_2_FIELDS } from "../plan";
import { validPlanInput } from "../../../tests/fixtures/valid-plan";
import { type Doc, check, expectOnly, expectValid, issues } from "./edit-plan.test-util";

// Version 2 of the plan document (docs/plan-format.md §12): its four fields,
// their defaults and rules, the reading of version 1 documents, and the
// refusal of a version 2 field in a version 1 document.

const V2_MESSAGE = 'is a field of heterolane.plan/2: change "format" to "heterolane.plan/2" to use it';

/** The valid base plan as a version 2 document, edited. */
function v2(edit: (d: Doc) => void = () => {}) {
  return (d: Doc) => {
    d.format = "heterolane.plan/2";
    edit(d);
  };
}

describe("reading a version 1 document", () => {
  it("fills every version 2 field with its default and reads it as version 2", () => {
    const r = parsePlan(validPlanInput());
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.plan.format).toBe("heterolane.plan/2");
    for (const res of r.plan.resonators) expect(res.fsrShiftMHzPerK).toBe(0);
    for (const c of r.plan.chains) expect(c.temperatureExcursionK).toBe(0);
    for (const ch of r.plan.channels) {
      expect(ch.ifFilter).toBe("slot");
      expect(ch.centreToleranceMHz).toBeNull();
    }
  });
  it("gives the same plan as the same document written as version 2 without the new fields", () => {
    const one = parsePlan(validPlanInput());
    const doc = validPlanInput() as Doc;
    doc.format = "heterolane.plan/2";
    expect(parsePlan(doc)).toEqual(one);
  });
  it("puts the version 2 fields after the version 1 fields of each entry, in table order", () => {
    const r = check(
      v2((d) => {
        d.channels[0].centreToleranceMHz = 5; // written before ifFilter
        d.channels[0].ifFilter = "occupied";
      }),
    );
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(Object.keys(r.plan.channels[0]!).slice(-2)).toEqual(["ifFilter", "centreToleranceMHz"]);
    expect(Object.keys(r.plan.resonators[0]!).at(-1)).toBe("fsrShiftMHzPerK");
    expect(Object.keys(r.plan.chains[1]!).at(-1)).toBe("temperatureExcursionK");
  });
  it("the parsed plan parses to itself, also through JSON text", () => {
    for (const edit of [() => {}, v2((d) => (d.chains[0].temperatureExcursionK = 2))]) {
      const r = check(edit);
      expect(r.ok).toBe(true);
      if (!r.ok) continue;
      expect(parsePlan(r.plan)).toEqual(r);
      expect(parsePlanText(JSON.stringify(r.plan))).toEqual(r);
    }
  });
});

describe("a version 1 document with a version 2 field is refused at that field", () => {
  const cases: [string, (d: Doc) => void][] = [
    ["resonators[0].fsrShiftMHzPerK", (d) => (d.resonators[0].fsrShiftMHzPerK = -6.28)],
    ["chains[1].temperatureExcursionK", (d) => (d.chains[1].temperatureExcursionK = 1)],
    ["channels[2].ifFilter", (d) => (d.channels[2].ifFilter = "occupied")],
    ["channels[0].centreToleranceMHz", (d) => (d.channels[0].centreToleranceMHz = 5)],
  ];
  it.each(cases)("%s", (path, edit) => {
    expectOnly(edit, path, V2_MESSAGE);
    expectValid(v2(edit));
  });
  it("also at its default value, and also when the value itself is invalid", () => {
    expectOnly((d) => (d.channels[0].ifFilter = "slot"), "channels[0].ifFilter", V2_MESSAGE);
    expect(issues((d) => (d.chains[0].temperatureExcursionK = -1))).toEqual([
      { path: "chains[0].temperatureExcursionK", message: "must be at least 0" },
      { path: "chains[0].temperatureExcursionK", message: V2_MESSAGE },
    ]);
  });
  it("every version 2 field is reported, in document order, beside the other issues", () => {
    expect(
      issues((d) => {
        d.channels[1].ifFilter = "occupied";
        d.resonators[1].fsrShiftMHzPerK = 1;
        d.channels[0].bandwidthMHz = 0;
      }),
    ).toEqual([
      { path: "resonators[1].fsrShiftMHzPerK", message: V2_MESSAGE },
      { path: "channels[0].bandwidthMHz", message: "must be greater than 0" },
      { path: "channels[1].ifFilter", message: V2_MESSAGE },
    ]);
  });
  it("planSchema used directly refuses it too", () => {
    const doc = validPlanInput() as Doc;
    doc.chains[0].temperatureExcursionK = 1;
    const r = planSchema.safeParse(doc);
    expect(r.success).toBe(false);
    expect(r.error?.issues.map((i) => [i.path.join("."), i.message])).toEqual([
      ["chains.0.temperatureExcursionK", V2_MESSAGE],
    ]);
  });
  it("the table of version 2 fields names exactly the fields of the format (the four of the envelope and the schedule)", () => {
    const listed = Object.entries(VERSION_2_FIELDS).flatMap(([place, f]) => Object.keys(f).map((k) => `${place}.${k}`));
    expect(listed).toEqual([
      "lasers.schedule",
      "resonators.fsrShiftMHzPerK",
      "chains.temperatureExcursionK",
      "channels.ifFilter",
      "channels.centreToleranceMHz",
    ]);
  });
});

describe("the rules of the version 2 fields", () => {
  it("fsrShiftMHzPerK: any finite number, signed", () => {
    for (const v of [-6.28, 0, 12.5, -1e6]) expectValid(v2((d) => (d.resonators[0].fsrShiftMHzPerK = v)));
    for (const v of [NaN, Infinity, -Infinity])
      expectOnly(
        v2((d) => (d.resonators[0].fsrShiftMHzPerK = v)),
        "resonators[0].fsrShiftMHzPerK",
        "must be a finite number",
      );
    expectOnly(
      v2((d) => (d.resonators[0].fsrShiftMHzPerK = "-6")),
      "resonators[0].fsrShiftMHzPerK",
      "must be a finite number, not a string",
    );
    expectOnly(
      v2((d) => (d.resonators[0].fsrShiftMHzPerK = null)),
      "resonators[0].fsrShiftMHzPerK",
      "must be a finite number, not null",
    );
  });
  it("temperatureExcursionK: from 0 to 50 K", () => {
    for (const v of [0, 0.001, 1, 50]) expectValid(v2((d) => (d.chains[0].temperatureExcursionK = v)));
    expectOnly(
      v2((d) => (d.chains[0].temperatureExcursionK = -0.001)),
      "chains[0].temperatureExcursionK",
      "must be at least 0",
    );
    expectOnly(
      v2((d) => (d.chains[0].temperatureExcursionK = 50.001)),
      "chains[0].temperatureExcursionK",
      "must be at most 50",
    );
    expectOnly(
      v2((d) => (d.chains[0].temperatureExcursionK = true)),
      "chains[0].temperatureExcursionK",
      "must be a finite number, not a boolean",
    );
  });
  it("ifFilter: the word slot or occupied", () => {
    for (const v of ["slot", "occupied"]) expectValid(v2((d) => (d.channels[1].ifFilter = v)));
    for (const v of ["Slot", "", "occupied band", null, 1])
      expectOnly(
        v2((d) => (d.channels[1].ifFilter = v)),
        "channels[1].ifFilter",
        'must be "slot" or "occupied"',
      );
  });
  it("centreToleranceMHz: above 0, or null", () => {
    for (const v of [0.001, 5, null]) expectValid(v2((d) => (d.channels[0].centreToleranceMHz = v)));
    for (const v of [0, -1])
      expectOnly(
        v2((d) => (d.channels[0].centreToleranceMHz = v)),
        "channels[0].centreToleranceMHz",
        "must be greater than 0",
      );
    expectOnly(
      v2((d) => (d.channels[0].centreToleranceMHz = "5")),
      "channels[0].centreToleranceMHz",
      "must be a finite number, not a string",
    );
  });
  it("keeps the values given, and a negative zero reads as 0", () => {
    const r = check(
      v2((d) => {
        d.resonators[0].fsrShiftMHzPerK = -0;
        d.chains[0].temperatureExcursionK = 2.5;
        d.channels[0].ifFilter = "occupied";
        d.channels[0].centreToleranceMHz = 4;
      }),
    );
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(Object.is(r.plan.resonators[0]!.fsrShiftMHzPerK, 0)).toBe(true);
    expect(r.plan.chains[0]!.temperatureExcursionK).toBe(2.5);
    expect(r.plan.channels[0]!.ifFilter).toBe("occupied");
    expect(r.plan.channels[0]!.centreToleranceMHz).toBe(4);
  });
  it("unknown keys are still refused in a version 2 document", () => {
    expectOnly(
      v2((d) => (d.channels[0].ifFilterKind = "slot")),
      "channels[0].ifFilterKind",
      "unknown key",
    );
  });
});
