import { describe, expect, it } from "vitest";
import { type PlanInput } from "@/schemas/plan";
import { example1, example2, fixtureExpected } from "../../../tests/fixtures/plans/builders";
import { feasibilityMap } from "./feasibility-map";
import { buildMapModel, MAP_CODES } from "./internals/map-model";
import type { Plan } from "@/schemas/plan";
import { L_DEPENDENT_ERROR_CODES } from "./types";

describe("feasibility map: the worked examples", () => {
  it("reproduces example 1 (computed independently from docs/plan-format.md)", () => {
    // Hand check (the rules of docs/plan-format.md §4.1 with the example's numbers): channel
    // wv1 is the band X = [183.305, 183.315] GHz, drift D = 0.02, guard
    // g = 0.05, detector [0.05, 6], lock tones m·fm = 0.06·m, m = 1..4.
    // Above the band the slot is [L − 183.315, L − 183.305], so
    // O = [L − 183.335, L − 183.285]; O.hi ≤ 6 gives L ≤ 189.285, and the
    // highest lock-self tone 0.24 needs O.lo ≥ 0.24 + 0.05, i.e.
    // L ≥ 183.625. Below the band, by symmetry, O = [183.285 − L, 183.335 − L]:
    // O.hi ≤ 6 gives L ≥ 177.335 and O.lo ≥ 0.29 gives L ≤ 182.995.
    const expected = fixtureExpected("ex1-single-channel");
    const tol = expected.tolerances.feasibleEdgeGHz;
    const map = feasibilityMap(example1(), "A");
    const want = expected.chains[0]!.feasibleGHz;
    expect(map.feasibleGHz).toHaveLength(want.length);
    map.feasibleGHz.forEach((iv, i) => {
      expect(Math.abs(iv[0] - want[i]![0])).toBeLessThan(tol);
      expect(Math.abs(iv[1] - want[i]![1])).toBeLessThan(tol);
    });
    // the exact edges themselves (the 1e-9 allowance decides ties, it does not move edges)
    expect(map.feasibleGHz[0]![0]).toBeCloseTo(177.335, 9);
    expect(map.feasibleGHz[0]![1]).toBeCloseTo(182.995, 9);
    expect(map.feasibleGHz[1]![0]).toBeCloseTo(183.625, 9);
    expect(map.feasibleGHz[1]![1]).toBeCloseTo(189.285, 9);
    // reach [150, 200] minus the drift: lo-uncovered on [150, 150.02] and [199.98, 200]
    expect(map.excludedGHz[0]).toEqual({ bandGHz: [150, 150.02], codes: ["lo-uncovered", "if-outside-detector"] });
    expect(map.excludedGHz[map.excludedGHz.length - 1]!.codes).toEqual(["lo-uncovered", "if-outside-detector"]);
    expect(map.excludedGHz.find((e) => e.codes.includes("lo-in-band"))!.bandGHz).toEqual([183.305, 183.315]);
  });

  it("reproduces example 2 (lower sideband, sampled IF, two reach intervals)", () => {
    const expected = fixtureExpected("ex2-lower-sideband-sampled");
    const tol = expected.tolerances.feasibleEdgeGHz;
    const map = feasibilityMap(example2(), "O2");
    const want = expected.chains[0]!.feasibleGHz;
    expect(map.feasibleGHz).toHaveLength(want.length);
    map.feasibleGHz.forEach((iv, i) => {
      expect(Math.abs(iv[0] - want[i]![0])).toBeLessThan(tol);
      expect(Math.abs(iv[1] - want[i]![1])).toBeLessThan(tol);
    });
    // nothing listed outside reach (the gap (−110, −109.5) between the reach intervals)
    for (const e of map.excludedGHz) expect(e.bandGHz[1] <= -110 || e.bandGHz[0] >= -109.5).toBe(true);
  });

  it("tiles the reach union: feasible and excluded intervals meet edge to edge", () => {
    for (const [plan, chain] of [
      [example1(), "A"],
      [example2(), "O2"],
    ] as const) {
      const map = feasibilityMap(plan, chain);
      const all = [...map.feasibleGHz.map((b) => ({ b })), ...map.excludedGHz.map((e) => ({ b: e.bandGHz }))].sort(
        (p, q) => p.b[0] - q.b[0],
      );
      const reach = buildMapModel(plan, chain).reach;
      let total = 0;
      for (const { b } of all) total += b[1] - b[0];
      const span = reach.reduce((s, r) => s + r[1] - r[0], 0);
      expect(total).toBeCloseTo(span, 9);
    }
  });
});

describe("feasibility map: hand-worked small cases", () => {
  /** One upper-sideband SSB channel, no lock tones in the detector band, no image rule, no sampling. */
  function simple(mutate?: (p: PlanInput) => void): Plan {
    return example1((p) => {
      p.settings.imageRejectionDB = -100; // the image rule never fires
      p.lasers[0]!.lock.modulationMHz = 9000; // lock tones 9, 18 … GHz: outside the 6 GHz detector
      mutate?.(p);
    });
  }

  it("one SSB channel: the IF runs through the detector on both sides of the band", () => {
    // X = [183.305, 183.315], D = 0.02, detector [0.05, 6]. Above: O = [L − 183.335, L − 183.285];
    // O.lo ≥ 0.05 ⇔ L ≥ 183.385, O.hi ≤ 6 ⇔ L ≤ 189.285. Below: O = [183.285 − L, 183.335 − L];
    // O.hi ≤ 6 ⇔ L ≥ 177.335, O.lo ≥ 0.05 ⇔ L ≤ 183.235. The carrier beat |L| ≈ 180 GHz is
    // outside the detector; the lock-lo tones |L ± 9| likewise.
    const map = feasibilityMap(simple(), "A");
    expect(map.feasibleGHz.length).toBe(2);
    expect(map.feasibleGHz[0]![0]).toBeCloseTo(177.335, 9);
    expect(map.feasibleGHz[0]![1]).toBeCloseTo(183.235, 9);
    expect(map.feasibleGHz[1]![0]).toBeCloseTo(183.385, 9);
    expect(map.feasibleGHz[1]![1]).toBeCloseTo(189.285, 9);
  });

  it("a second channel excludes the offsets where the occupied bands come within guard", () => {
    // Add ch2 at 184.31 GHz (X₂ = [184.305, 184.315]). For L above both bands the slots move
    // together 1 GHz apart (gap 1 − 0.01 − 0.04 = 0.95 ≥ 0.05: no overlap). Between the bands
    // (183.315 < L < 184.305): O₁ = [L − 183.335, L − 183.285], O₂ = [184.285 − L, 184.335 − L];
    // gap = max(lo) − min(hi). O₁.lo − O₂.hi = 2L − 367.67 < 0.05 and O₂.lo − O₁.hi = 367.57 − 2L < 0.05
    // ⇔ 183.76 < L < 183.86: slot-overlap there. Feasible between the bands: [183.385, 183.76]
    // and [183.86, 184.235] (ch2 needs O₂.lo = 184.285 − L ≥ 0.05).
    const map = feasibilityMap(
      simple((p) => {
        p.channels.push({ ...p.channels[0]!, id: "ch2", centerGHz: 184.31 });
      }),
      "A",
    );
    const between = map.feasibleGHz.filter((iv) => iv[0] > 183.3 && iv[1] < 184.4);
    expect(between.length).toBe(2);
    expect(between[0]![0]).toBeCloseTo(183.385, 9);
    expect(between[0]![1]).toBeCloseTo(183.76, 9);
    expect(between[1]![0]).toBeCloseTo(183.86, 9);
    expect(between[1]![1]).toBeCloseTo(184.235, 9);
    const overlap = map.excludedGHz.find((e) => e.codes.includes("slot-overlap"))!;
    expect(overlap.bandGHz[0]).toBeCloseTo(183.76, 9);
    expect(overlap.bandGHz[1]).toBeCloseTo(183.86, 9);
    expect(overlap.codes).toEqual(["slot-overlap"]);
  });

  it("with sharedIf the overlap is a warning and does not shape the map", () => {
    const map = feasibilityMap(
      simple((p) => {
        p.channels.push({ ...p.channels[0]!, id: "ch2", centerGHz: 184.31 });
        p.chains[0]!.sharedIf = true;
      }),
      "A",
    );
    expect(map.excludedGHz.some((e) => e.codes.includes("slot-overlap"))).toBe(false);
    expect(map.feasibleGHz.some((iv) => iv[0] < 183.8 && iv[1] > 183.8)).toBe(true);
  });

  it("a sampled IF excludes the offsets where O straddles fs/2 (nyquist-straddle)", () => {
    // fs = 4 GHz, h = 2. Above the band O = [L − 183.335, L − 183.285] straddles 2 when
    // L − 183.335 < 2 < L − 183.285 ⇔ 185.285 < L < 185.335, and 4 when 187.285 < L < 187.335.
    const map = feasibilityMap(
      simple((p) => void (p.detectors[0]!.sampleRateGHz = 4)),
      "A",
    );
    const straddles = map.excludedGHz.filter((e) => e.codes.join() === "nyquist-straddle").map((e) => e.bandGHz);
    const above = straddles.filter((b) => b[0] > 183.4);
    expect(above.length).toBe(2);
    expect(above[0]![0]).toBeCloseTo(185.285, 9);
    expect(above[0]![1]).toBeCloseTo(185.335, 9);
    expect(above[1]![0]).toBeCloseTo(187.285, 9);
    expect(above[1]![1]).toBeCloseTo(187.335, 9);
  });

  it("lo-uncovered where the drift window leaves the reach, and nothing listed outside reach", () => {
    // reach [183.4, 183.5] ∪ [183.5, 184] merge (touching) into [183.4, 184]; D = 0.02:
    // lo-uncovered on [183.4, 183.42] and [183.98, 184] only.
    const map = feasibilityMap(
      simple((p) => {
        p.lasers[0]!.reach = [
          { minGHz: 183.5, maxGHz: 184 },
          { minGHz: 183.4, maxGHz: 183.5 },
        ];
      }),
      "A",
    );
    expect(map.feasibleGHz.length).toBe(1);
    expect(map.feasibleGHz[0]![0]).toBeCloseTo(183.42, 9);
    expect(map.feasibleGHz[0]![1]).toBeCloseTo(183.98, 9);
    expect(map.excludedGHz.map((e) => e.codes)).toEqual([["lo-uncovered"], ["lo-uncovered"]]);
  });

  it("a DSB channel: the slot widens as the LO leaves the centre", () => {
    // DSB c = 183.31, d = 3, B = 0.01: X₁ = [180.305, 180.315], X₂ = [186.305, 186.315].
    // Between the bands the slot is [min(L − 180.315, 186.305 − L), max(L − 180.305, 186.315 − L)]:
    // for L ≥ 183.31, O = [186.285 − L, L − 180.285]. O.hi ≤ 6 ⇔ L ≤ 186.285 and O.lo ≥ 0.05 ⇔ L ≤ 186.235;
    // symmetric below: L ≥ 180.385. So the feasible interval is [180.385, 186.235].
    const map = feasibilityMap(
      simple((p) => void (p.channels[0]!.dsbOffsetGHz = 3)),
      "A",
    );
    const mid = map.feasibleGHz.find((iv) => iv[0] < 183.31 && iv[1] > 183.31)!;
    expect(mid[0]).toBeCloseTo(180.385, 9);
    expect(mid[1]).toBeCloseTo(186.235, 9);
  });

  it("a chain with no channels is limited by its reach and drift only; no reach gives an empty map", () => {
    // reach [150, 200], D = 0.02: feasible [150.02, 199.98]
    const bare = feasibilityMap(
      example1((p) => void (p.channels = [])),
      "A",
    );
    expect(bare.feasibleGHz).toEqual([[150.02, 199.98]]);
    expect(bare.excludedGHz.map((e) => e.codes)).toEqual([["lo-uncovered"], ["lo-uncovered"]]);
    const none = feasibilityMap(
      example1((p) => void (p.lasers[0]!.reach = [])),
      "A",
    );
    expect(none).toEqual({ feasibleGHz: [], excludedGHz: [] });
  });

  it("the codes are the map-shaping codes of docs/plan-format.md §6.1, in rules-table order", () => {
    expect([...MAP_CODES]).toEqual([...L_DEPENDENT_ERROR_CODES]);
  });
});
