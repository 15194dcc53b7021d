import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { temperatureMap, temperatureWindow, type TemperatureMap } from "@/lib/plan";
import { example1 } from "../../../tests/fixtures/plans/builders";
import { temperatureMapCells } from "./temperature-map-cells";

describe("temperatureMapCells", () => {
  it("turns each row into a strip one row spacing high, cut at the map's intervals", () => {
    const map: TemperatureMap = {
      chainId: "A",
      excursionK: 1,
      reachGHz: [[0, 10]],
      rows: [
        {
          temperatureOffsetK: -2,
          feasibleGHz: [],
          excludedGHz: [{ bandGHz: [0, 10], codes: ["nedt-unmet"] }],
          temperatureCodes: [],
        },
        {
          temperatureOffsetK: 0,
          feasibleGHz: [[2, 4]],
          excludedGHz: [
            { bandGHz: [0, 2], codes: ["spur-in-slot"] },
            { bandGHz: [4, 10], codes: ["image-response"] },
          ],
          temperatureCodes: [],
        },
        {
          temperatureOffsetK: 2,
          feasibleGHz: [[2, 5]],
          excludedGHz: [
            { bandGHz: [0, 2], codes: ["spur-in-slot"] },
            { bandGHz: [5, 10], codes: [] },
          ],
          temperatureCodes: ["mode-detuned"],
        },
      ],
    };
    const out = temperatureMapCells(map, 3);
    expect(out.loDomain).toEqual([0, 10]);
    expect(out.temperatureDomain).toEqual([-2, 2]);
    expect(out.passingRowsK).toEqual([0]);
    expect(out.cells).toEqual([
      { loGHz: [0, 10], temperatureK: [-2, -1], state: "excluded", codes: ["nedt-unmet"] },
      { loGHz: [2, 4], temperatureK: [-1, 1], state: "feasible", codes: [] },
      { loGHz: [0, 2], temperatureK: [-1, 1], state: "excluded", codes: ["spur-in-slot"] },
      { loGHz: [4, 10], temperatureK: [-1, 1], state: "excluded", codes: ["image-response"] },
      { loGHz: [2, 5], temperatureK: [1, 2], state: "temperature", codes: ["mode-detuned"] },
      { loGHz: [0, 2], temperatureK: [1, 2], state: "temperature", codes: ["mode-detuned", "spur-in-slot"] },
      { loGHz: [5, 10], temperatureK: [1, 2], state: "temperature", codes: ["mode-detuned"] },
    ]);
  });

  it("example 1 with its 20 MHz drift: no temperature passes (its temperature window is empty, issue 11)", () => {
    const plan = example1();
    const out = temperatureMapCells(temperatureMap(plan, "A", { rows: 5 }), plan.chains[0]!.loOffsetGHz);
    expect(temperatureWindow(plan, "A").intervalsK).toEqual([]);
    expect(out.passingRowsK).toEqual([]);
    expect(out.cells.every((c) => c.state !== "feasible")).toBe(true);
  });

  // `nedt-unmet` is not a rule of the feasibility map (docs/plan-format.md §6), so it is left out here
  // (requiredNedtK null) for the two to be comparable; the chart shows the exact window beside the map.
  it("without an NEΔT requirement, the rows where the chain's LO passes are the rows inside its temperature window", () => {
    fc.assert(
      fc.property(
        fc.double({ min: -8, max: 8, noNaN: true }),
        fc.double({ min: 0, max: 2, noNaN: true }),
        (phi, te) => {
          const plan = example1((p) => {
            p.format = "heterolane.plan/2";
            p.lasers[0]!.driftMHz = 0;
            p.resonators[0]!.fsrShiftMHzPerK = phi;
            p.chains[0]!.temperatureExcursionK = te;
            p.channels[0]!.requiredNedtK = null;
          });
          const chain = plan.chains[0]!;
          const map = temperatureMap(plan, "A", { rows: 9, spanK: 4 });
          const out = temperatureMapCells(map, chain.loOffsetGHz);
          const window = temperatureWindow(plan, "A").intervalsK;
          for (const row of map.rows) {
            const t = row.temperatureOffsetK;
            const inside = window.some(([a, b]) => t >= a + 2e-3 && t <= b - 2e-3);
            const outside = window.every(([a, b]) => t < a - 2e-3 || t > b + 2e-3);
            if (inside) expect(out.passingRowsK).toContain(t);
            if (outside) expect(out.passingRowsK).not.toContain(t);
          }
        },
      ),
      { numRuns: 25 },
    );
  });
});
