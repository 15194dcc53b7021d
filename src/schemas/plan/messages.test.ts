import { describe, expect, it } from "vitest";
import { issues } from "./edit-plan.test-util";

// Every issue is reported, worded plainly, once each and in document reading order.

describe("all errors are reported, in document order", () => {
  it("field errors, unknown keys and cross-field errors together", () => {
    const found = issues((d) => {
      d.format = "plan";
      d.settings.spurMaxOrder = 12;
      d.lasers[0].reach.push({ minGHz: 5, maxGHz: 1 });
      d.lasers[0].lock.modulationIndex = 3;
      d.resonators[1].loadedQ = -1;
      d.detectors[1].colour = "blue";
      d.chains[0].laser = "LP9";
      d.chains[1].tapFraction = 1.5;
      d.channels[0].bandwidthMHz = 0;
      d.channels[1].dsbOffsetGHz = 0.001;
      d.channels[2].chain = "nope";
      delete d.channels[2].antennaK;
    });
    expect(found).toEqual([
      { path: "format", message: 'must be "heterolane.plan/1" or "heterolane.plan/2"' },
      { path: "settings.spurMaxOrder", message: "must be at most 9" },
      { path: "lasers[0].reach[1].minGHz", message: "must be below maxGHz (1)" },
      { path: "lasers[0].lock.modulationIndex", message: "must be below 2.4" },
      { path: "resonators[1].loadedQ", message: "must be greater than 0" },
      { path: "detectors[1].colour", message: "unknown key" },
      { path: "chains[0].laser", message: 'refers to laser "LP9", which does not exist' },
      { path: "chains[1].tapFraction", message: "must be below 1" },
      { path: "channels[0].bandwidthMHz", message: "must be greater than 0" },
      { path: "channels[1].dsbOffsetGHz", message: "must be greater than half the bandwidth (0.005 GHz)" },
      { path: "channels[2].chain", message: 'refers to chain "nope", which does not exist' },
      { path: "channels[2].antennaK", message: "is required" },
    ]);
  });
  it("cross-field rules still run when the entry they sit in has other faults", () => {
    const found = issues((d) => {
      d.chains[1].mode = "first";
      d.chains[1].laser = "LP1";
      d.detectors[0].minGHz = 7;
      d.detectors[0].maxInputMW = "lots";
    });
    expect(found).toEqual([
      { path: "detectors[0].minGHz", message: "must be below maxGHz (6)" },
      { path: "detectors[0].maxInputMW", message: "must be a finite number, not a string" },
      { path: "chains[1].laser", message: 'laser "LP1" already serves chain "A"; a laser serves one chain' },
      { path: "chains[1].mode", message: "must be a finite number, not a string" },
    ]);
  });
  it("reports no issue twice", () => {
    const found = issues((d) => {
      d.chains[0].rfInput.minGHz = 300;
      d.extra = 1;
    });
    const keys = found.map((i) => `${i.path}|${i.message}`);
    expect(new Set(keys).size).toBe(keys.length);
    expect(keys).toEqual(["chains[0].rfInput.minGHz|must be below maxGHz (195)", "extra|unknown key"]);
  });
  it("wrong container types", () => {
    expect(
      issues((d) => {
        d.lasers = {};
        d.channels[0] = "wv1";
        d.chains[0].rfInput = [175, 195];
      }),
    ).toEqual([
      { path: "lasers", message: "must be an array, not an object" },
      { path: "chains[0].rfInput", message: "must be an object, not an array" },
      { path: "channels[0]", message: "must be an object, not a string" },
    ]);
  });
});
