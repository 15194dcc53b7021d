import { describe, expect, it } from "vitest";
import fc from "fast-check";
import {
  channelSchema,
  chainSchema,
  detectorSchema,
  laserSchema,
  resonatorSchema,
  settingsFields,
} from "@/schemas/workspace";
import {
  chainDefaults,
  chainGroups,
  channelDefaults,
  channelGroups,
  detectorDefaults,
  detectorGroups,
  laserDefaults,
  laserGroups,
  nextKey,
  resonatorDefaults,
  resonatorGroups,
  rowToFormValue,
  settingsGroups,
} from "./entity-specs";
import { fieldNames } from "./entity-form";

const uuid = "3f0c1a52-8f3e-4c5e-9d7a-2b1e4f6a7c80";
const refs = { lasers: [{ value: uuid, label: "LP1" }], resonators: [], detectors: [], chains: [] };

describe("nextKey", () => {
  it("takes the first free preferred key, then the lowest free number", () => {
    expect(nextKey([], "ch")).toBe("ch1");
    expect(nextKey(["ch1", "ch3"], "ch")).toBe("ch2");
    expect(nextKey(["A"], "", ["A", "B"])).toBe("B");
    expect(nextKey(["A", "B"], "C", ["A", "B"])).toBe("C1");
  });
  it("never returns a used key", () => {
    fc.assert(
      fc.property(
        fc.array(fc.string({ maxLength: 4 }), { maxLength: 20 }),
        fc.string({ maxLength: 3 }),
        (used, prefix) => {
          expect(used).not.toContain(nextKey(used, prefix));
        },
      ),
    );
  });
});

describe("form defaults", () => {
  // The defaults are the example values of docs/plan-format.md §8.1 "The plan"; each must pass its own schema.
  it("are valid entities for their schemas", () => {
    expect(laserSchema.safeParse(laserDefaults).success).toBe(true);
    expect(resonatorSchema.safeParse(resonatorDefaults).success).toBe(true);
    expect(detectorSchema.safeParse(detectorDefaults).success).toBe(true);
    expect(
      chainSchema.safeParse({ ...chainDefaults, laserId: uuid, resonatorId: uuid, detectorId: uuid }).success,
    ).toBe(true);
    expect(
      channelSchema.safeParse({ ...channelDefaults, key: "ch1", name: "line centre", chainId: uuid }).success,
    ).toBe(true);
  });
});

describe("form fields", () => {
  const groups = {
    lasers: [laserGroups(), laserSchema],
    resonators: [resonatorGroups(), resonatorSchema],
    detectors: [detectorGroups(), detectorSchema],
    chains: [chainGroups(refs), chainSchema],
    channels: [channelGroups({ chains: [] }), channelSchema],
    settings: [settingsGroups(), settingsFields],
  } as const;
  it("name a unit or kind in every label", () => {
    for (const [g] of Object.values(groups))
      for (const f of g.flatMap((x) => x.fields)) expect(f.unit.trim()).not.toBe("");
  });
  it("cover every field of the schema, and only those", () => {
    for (const [kind, [g, schema]] of Object.entries(groups)) {
      const shape = Object.keys(
        (
          schema as unknown as {
            shape?: Record<string, unknown>;
            _def: { schema?: { shape: Record<string, unknown> } };
          }
        ).shape ?? {},
      );
      const tops = new Set(fieldNames(g).map((n) => n.split(".")[0]));
      expect(shape.length, kind).toBeGreaterThan(0);
      expect([...tops].sort(), kind).toEqual([...shape].sort());
    }
  });
  it("put the laser-safety caution beside every optical power", () => {
    const all = [...laserGroups(), ...detectorGroups()].flatMap((g) => g.fields);
    for (const name of ["carrierPowerMW", "loPowerMW", "maxInputMW"])
      expect(all.find((f) => f.name === name)?.caution).toBe("laser");
  });
});

describe("rowToFormValue", () => {
  it("drops the bookkeeping fields the strict schemas refuse", () => {
    expect(
      rowToFormValue({ id: "x", version: 3, createdAt: "t", updatedAt: "t", key: "R1", fsrGHz: 183.31, loadedQ: 1e7 }),
    ).toEqual({
      key: "R1",
      fsrGHz: 183.31,
      loadedQ: 1e7,
    });
  });
});
