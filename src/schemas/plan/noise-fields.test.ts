import { describe, expect, it } from "vitest";
import { VERSION_2_NOISE_FIELDS } from "./versions";
import { check, type Doc, expectOnly, expectValid, issues } from "./edit-plan.test-util";

// The noise-budget fields of version 2 (docs/plan-format.md §14): defaults,
// rules with named paths, the rules between them, and their refusal in a
// version 1 document.

const V2_MESSAGE = 'is a field of heterolane.plan/2: change "format" to "heterolane.plan/2" to use it';
const v2 =
  (edit: (d: Doc) => void = () => {}) =>
  (d: Doc) => {
    d.format = "heterolane.plan/2";
    edit(d);
  };

describe("defaults", () => {
  it("a document without them reads with nulls and neutral values", () => {
    const r = check(() => {});
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    for (const l of r.plan.lasers) expect(l).toMatchObject(VERSION_2_NOISE_FIELDS.lasers);
    for (const x of r.plan.resonators) expect(x).toMatchObject(VERSION_2_NOISE_FIELDS.resonators);
    for (const x of r.plan.detectors) expect(x).toMatchObject(VERSION_2_NOISE_FIELDS.detectors);
    for (const x of r.plan.chains) expect(x).toMatchObject({ frontEndLossDB: 0, frontEndTemperatureK: 290 });
    for (const x of r.plan.channels) expect(x.receiverKSource).toBe("entered");
  });
});

describe("field rules, each at its named path", () => {
  const bad: [string, (d: Doc) => void, string][] = [
    ["resonators[0].conversionEfficiency", (d) => (d.resonators[0].conversionEfficiency = 0), "must be greater than 0"],
    ["resonators[0].conversionEfficiency", (d) => (d.resonators[0].conversionEfficiency = 1.2), "must be at most 1"],
    ["resonators[0].mmWaveCouplingRatio", (d) => (d.resonators[0].mmWaveCouplingRatio = 0), "must be greater than 0"],
    ["resonators[0].g0Hz", (d) => (d.resonators[0].g0Hz = -1), "must be greater than 0"],
    ["detectors[0].quantumEfficiency", (d) => (d.detectors[0].quantumEfficiency = 1.01), "must be at most 1"],
    ["detectors[0].quantumEfficiency", (d) => (d.detectors[0].quantumEfficiency = 0), "must be greater than 0"],
    ["detectors[0].responsivityAPerW", (d) => (d.detectors[0].responsivityAPerW = 0), "must be greater than 0"],
    [
      "detectors[0].noiseCurrentPAPerRtHz",
      (d) => (d.detectors[0].noiseCurrentPAPerRtHz = Infinity),
      "must be a finite number",
    ],
    ["detectors[0].cmrrDB", (d) => (d.detectors[0].cmrrDB = -3), "must be at least 0"],
    ["lasers[0].carrierRinDBcPerHz", (d) => (d.lasers[0].carrierRinDBcPerHz = NaN), "must be a finite number"],
    [
      "lasers[0].loFloorDBcPerHz",
      (d) => (d.lasers[0].loFloorDBcPerHz = "-150"),
      "must be a finite number, not a string",
    ],
    [
      "lasers[0].carrierPreFilterDB",
      (d) => (d.lasers[0].carrierPreFilterDB = null),
      "must be a finite number, not null",
    ],
    ["chains[0].frontEndLossDB", (d) => (d.chains[0].frontEndLossDB = -0.5), "must be at least 0"],
    ["chains[0].frontEndTemperatureK", (d) => (d.chains[0].frontEndTemperatureK = -1), "must be at least 0"],
    [
      "channels[0].receiverKSource",
      (d) => (d.channels[0].receiverKSource = "measured"),
      'must be "entered" or "computed"',
    ],
  ];
  it.each(bad)("%s: %s", (path, edit, message) => expectOnly(v2(edit), path, message));

  it("valid values are accepted", () => {
    expectValid(
      v2((d) => {
        d.resonators[0].intrinsicQ = d.resonators[0].loadedQ * 2;
        d.resonators[0].conversionEfficiency = 1;
        d.detectors[0].quantumEfficiency = 1;
        d.detectors[0].noiseCurrentPAPerRtHz = 0;
        d.lasers[0].carrierRinDBcPerHz = -160;
        d.channels[0].receiverKSource = "computed";
      }),
    );
  });
});

describe("rules between the noise fields", () => {
  it("intrinsicQ must exceed the loaded Q", () => {
    for (const f of [1, 0.5]) {
      expectOnly(
        v2((d) => (d.resonators[0].intrinsicQ = d.resonators[0].loadedQ * f)),
        "resonators[0].intrinsicQ",
        /^must exceed loadedQ \(/,
      );
    }
  });
  it("a computed receiver temperature needs a conversion efficiency, entered or computable", () => {
    expectOnly(
      v2((d) => (d.channels[0].receiverKSource = "computed")),
      "channels[0].receiverKSource",
      /^is "computed", but resonator ".*" of chain ".*" has no conversionEfficiency/,
    );
    expectValid(
      v2((d) => {
        const res = d.resonators.find(
          (r: Doc) => r.id === d.chains.find((c: Doc) => c.id === d.channels[0].chain).resonator,
        );
        res.intrinsicQ = res.loadedQ * 3;
        res.g0Hz = 50;
        res.mmWaveQ = 300;
        res.mmWaveCouplingRatio = 0.5;
        d.channels[0].receiverKSource = "computed";
      }),
    );
  });
  it("every issue is reported together with the others", () => {
    expect(
      issues(
        v2((d) => {
          d.resonators[0].conversionEfficiency = 2;
          d.resonators[0].intrinsicQ = 1;
          d.detectors[0].quantumEfficiency = -1;
        }),
      ).map((i) => i.path),
    ).toEqual(["resonators[0].intrinsicQ", "resonators[0].conversionEfficiency", "detectors[0].quantumEfficiency"]);
  });
});

describe("a version 1 document with a noise field is refused at that field", () => {
  const cases: [string, (d: Doc) => void][] = [
    ["lasers[0].loRinDBcPerHz", (d) => (d.lasers[0].loRinDBcPerHz = -150)],
    ["resonators[0].conversionEfficiency", (d) => (d.resonators[0].conversionEfficiency = 0.1)],
    ["detectors[0].cmrrDB", (d) => (d.detectors[0].cmrrDB = 25)],
    ["chains[0].frontEndLossDB", (d) => (d.chains[0].frontEndLossDB = 1)],
    ["channels[0].receiverKSource", (d) => (d.channels[0].receiverKSource = "entered")],
  ];
  it.each(cases)("%s", (path, edit) => {
    expectOnly(edit, path, V2_MESSAGE);
    expectValid(v2(edit));
  });
});
