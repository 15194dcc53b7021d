import { describe, expect, it } from "vitest";
import { parsePlanText } from "../plan";
import { validPlanInput } from "../../../tests/fixtures/valid-plan";
import { issues, expectValid, expectOnly, setAt, jsonPath } from "./edit-plan.test-util";

// The number rules of every field (signs, ranges, whole numbers, finite values).

describe("numbers", () => {
  const strictlyPositive = [
    "lasers.0.carrierTHz",
    "lasers.0.carrierPowerMW",
    "lasers.0.loPowerMW",
    "lasers.0.lock.modulationMHz",
    "resonators.0.fsrGHz",
    "resonators.0.loadedQ",
    "detectors.0.maxInputMW",
    "detectors.1.sampleRateGHz",
    "chains.0.rfInput.minGHz",
    "channels.0.centerGHz",
    "channels.0.bandwidthMHz",
    "channels.0.integrationMs",
    "channels.1.dsbOffsetGHz",
  ];
  it.each(strictlyPositive)("%s must be greater than 0", (p) => {
    expectOnly((d) => setAt(d, p, 0), jsonPath(p), "must be greater than 0");
    expectOnly((d) => setAt(d, p, -1), jsonPath(p), "must be greater than 0");
    expectValid((d) => setAt(d, p, 0.006));
  });
  it("detector and rfInput maxima must be greater than 0 (reported with the min rule too)", () => {
    expect(issues((d) => (d.detectors[0].maxGHz = 0))).toEqual([
      { path: "detectors[0].minGHz", message: "must be below maxGHz (0)" },
      { path: "detectors[0].maxGHz", message: "must be greater than 0" },
    ]);
    expect(issues((d) => (d.chains[0].rfInput.maxGHz = -5))).toEqual([
      { path: "chains[0].rfInput.minGHz", message: "must be below maxGHz (-5)" },
      { path: "chains[0].rfInput.maxGHz", message: "must be greater than 0" },
    ]);
  });
  const nonNegative = [
    "settings.guardMHz",
    "lasers.0.stepMHz",
    "lasers.0.driftMHz",
    "detectors.0.minGHz",
    "chains.0.pathLossDB",
    "chains.0.carrierRejectionDB",
    "channels.0.antennaK",
    "channels.0.receiverK",
    "channels.0.gainStability",
    "channels.0.requiredNedtK",
  ];
  it.each(nonNegative)("%s must be at least 0", (p) => {
    expectValid((d) => setAt(d, p, 0));
    expectOnly((d) => setAt(d, p, -1e-9), jsonPath(p), "must be at least 0");
  });
  it.each(["chains.0.loOffsetGHz", "lasers.0.reach.0.minGHz"])("%s may be negative", (p) => {
    expectValid((d) => setAt(d, p, -150));
  });
  it("reach bounds may both be negative", () => {
    expectValid((d) => (d.lasers[0].reach = [{ minGHz: -200, maxGHz: -150 }]));
  });
  it.each(["settings.imageRejectionDB", "settings.replicaLimitDB"])("%s may be any finite number", (p) => {
    for (const v of [-1000, 0, 1e300, -1e-300]) expectValid((d) => setAt(d, p, v));
    expectOnly((d) => setAt(d, p, Infinity), jsonPath(p), "must be a finite number");
  });
  it("NaN and ±Infinity are refused wherever a number is expected", () => {
    expectOnly((d) => (d.channels[0].centerGHz = NaN), "channels[0].centerGHz", "must be a finite number");
    expectOnly((d) => (d.chains[0].loOffsetGHz = -Infinity), "chains[0].loOffsetGHz", "must be a finite number");
    expectOnly(
      (d) => (d.detectors[0].sampleRateGHz = Infinity),
      "detectors[0].sampleRateGHz",
      "must be a finite number",
    );
  });
  it("an overflowing literal (1e999 → Infinity) in JSON text is refused", () => {
    const text = JSON.stringify(validPlanInput()).replace('"loOffsetGHz":184.81', '"loOffsetGHz":1e999');
    expect(text).toContain("1e999");
    const r = parsePlanText(text);
    expect(r.ok ? [] : r.issues).toEqual([{ path: "chains[0].loOffsetGHz", message: "must be a finite number" }]);
  });
  it("numbers written as strings are refused, not coerced", () => {
    expectOnly(
      (d) => (d.channels[0].bandwidthMHz = "10"),
      "channels[0].bandwidthMHz",
      "must be a finite number, not a string",
    );
    expectOnly(
      (d) => (d.channels[0].dsbOffsetGHz = "NaN"),
      "channels[0].dsbOffsetGHz",
      "must be a finite number, not a string",
    );
    expectOnly((d) => (d.settings.guardMHz = null), "settings.guardMHz", "must be a finite number, not null");
  });
  it("0 ≤ tapFraction < 1", () => {
    expectValid((d) => (d.chains[0].tapFraction = 0));
    expectValid((d) => (d.chains[0].tapFraction = 0.999));
    expectOnly((d) => (d.chains[0].tapFraction = 1), "chains[0].tapFraction", "must be below 1");
    expectOnly((d) => (d.chains[0].tapFraction = -0.1), "chains[0].tapFraction", "must be at least 0");
  });
  it("0 < modulationIndex < 2.4", () => {
    expectValid((d) => (d.lasers[0].lock.modulationIndex = 2.39));
    expectValid((d) => (d.lasers[0].lock.modulationIndex = 1e-6));
    expectOnly(
      (d) => (d.lasers[0].lock.modulationIndex = 0),
      "lasers[0].lock.modulationIndex",
      "must be greater than 0",
    );
    expectOnly((d) => (d.lasers[0].lock.modulationIndex = 2.4), "lasers[0].lock.modulationIndex", "must be below 2.4");
  });
  it.each(["chains.0.mode", "lasers.0.lock.orders"])("%s is an integer ≥ 1", (p) => {
    expectValid((d) => setAt(d, p, 1));
    expectValid((d) => setAt(d, p, 3.0));
    expectOnly((d) => setAt(d, p, 0), jsonPath(p), "must be at least 1");
    expectOnly((d) => setAt(d, p, -2), jsonPath(p), "must be at least 1");
    expectOnly((d) => setAt(d, p, 1.5), jsonPath(p), "must be an integer");
  });
  it("spurMaxOrder is an integer 2..9, integral values like 5.0 accepted", () => {
    for (const v of [2, 5.0, 9]) expectValid((d) => (d.settings.spurMaxOrder = v));
    expect(parsePlanText(JSON.stringify(validPlanInput()).replace('"spurMaxOrder":5', '"spurMaxOrder":5.0')).ok).toBe(
      true,
    );
    expectOnly((d) => (d.settings.spurMaxOrder = 1), "settings.spurMaxOrder", "must be at least 2");
    expectOnly((d) => (d.settings.spurMaxOrder = 10), "settings.spurMaxOrder", "must be at most 9");
    expectOnly((d) => (d.settings.spurMaxOrder = 4.5), "settings.spurMaxOrder", "must be an integer");
  });
});
