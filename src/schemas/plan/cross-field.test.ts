import { describe, expect, it } from "vitest";
import { validPlanInput } from "../../../tests/fixtures/valid-plan";
import { issues, expectValid, expectOnly } from "./edit-plan.test-util";

// The rules that relate several fields: every min below its max, the DSB offset, unique ids and references that resolve.

describe("every min is below its max", () => {
  it("reach intervals", () => {
    expectOnly(
      (d) => (d.lasers[1].reach[1] = { minGHz: -100, maxGHz: -100 }),
      "lasers[1].reach[1].minGHz",
      "must be below maxGHz (-100)",
    );
    expectOnly(
      (d) => (d.lasers[0].reach[0] = { minGHz: 200, maxGHz: 150 }),
      "lasers[0].reach[0].minGHz",
      "must be below maxGHz (150)",
    );
    // Overlapping or touching intervals are allowed (the engine merges them).
    expectValid((d) => d.lasers[0].reach.push({ minGHz: 200, maxGHz: 210 }, { minGHz: 160, maxGHz: 170 }));
  });
  it("rfInput", () => {
    expectOnly(
      (d) => (d.chains[0].rfInput = { minGHz: 195, maxGHz: 175 }),
      "chains[0].rfInput.minGHz",
      "must be below maxGHz (175)",
    );
    expectOnly(
      (d) => (d.chains[0].rfInput = { minGHz: 175, maxGHz: 175 }),
      "chains[0].rfInput.minGHz",
      "must be below maxGHz (175)",
    );
  });
  it("detector band", () => {
    expectOnly((d) => (d.detectors[0].minGHz = 6), "detectors[0].minGHz", "must be below maxGHz (6)");
    expectValid((d) => (d.detectors[0].minGHz = 0)); // a DC-coupled detector
  });
});

describe("dsbOffsetGHz > bandwidthMHz/2000", () => {
  it("is refused at exactly half the bandwidth and accepted just above", () => {
    expectOnly(
      (d) => (d.channels[1].dsbOffsetGHz = 0.005),
      "channels[1].dsbOffsetGHz",
      "must be greater than half the bandwidth (0.005 GHz)",
    );
    expectValid((d) => (d.channels[1].dsbOffsetGHz = 0.0051));
  });
  it("uses the channel's own bandwidth", () => {
    expectOnly(
      (d) => {
        d.channels[1].bandwidthMHz = 3000;
        d.channels[1].dsbOffsetGHz = 1;
      },
      "channels[1].dsbOffsetGHz",
      "must be greater than half the bandwidth (1.5 GHz)",
    );
  });
});

describe("ids", () => {
  it.each(["lasers", "resonators", "detectors", "chains", "channels"])("%s ids must be non-empty", (list) => {
    const found = issues((d) => (d[list][0].id = ""));
    expect(found).toContainEqual({ path: `${list}[0].id`, message: "must not be empty" });
    // References to the list are not judged while one of its ids is broken.
    expect(found).toHaveLength(1);
  });
  it.each(["lasers", "resonators", "detectors", "chains", "channels"])("%s ids must be unique", (list) => {
    const found = issues((d) => (d[list][1].id = d[list][0].id));
    expect(found).toContainEqual({
      path: `${list}[1].id`,
      message: `duplicates the id "${validPlanInput()[list as "lasers"][0]!.id}" of ${list}[0]`,
    });
  });
  it("the same id in different lists is fine", () => {
    expectValid((d) => {
      d.lasers[0].id = "A";
      d.chains[0].laser = "A";
      d.resonators[0].id = "A";
      d.chains[0].resonator = "A";
      d.channels[0].id = "A";
    });
  });
});

describe("references resolve", () => {
  it.each([
    ["laser", "LP9"],
    ["resonator", "R9"],
    ["detector", "D9"],
  ])("chains[].%s", (field, ref) => {
    expectOnly(
      (d) => (d.chains[1][field] = ref),
      `chains[1].${field}`,
      `refers to ${field} "${ref}", which does not exist`,
    );
  });
  it("channels[].chain", () => {
    expectOnly((d) => (d.channels[2].chain = "Z"), "channels[2].chain", 'refers to chain "Z", which does not exist');
  });
  it("a laser serves one chain", () => {
    expectOnly(
      (d) => (d.chains[1].laser = "LP1"),
      "chains[1].laser",
      'laser "LP1" already serves chain "A"; a laser serves one chain',
    );
  });
  it("resonators and detectors may be shared between chains", () => {
    expectValid((d) => {
      d.chains[1].resonator = "R1";
      d.chains[1].detector = "D1";
    });
  });
});
