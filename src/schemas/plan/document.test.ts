import { describe, expect, it } from "vitest";
import { parsePlan, planSchema, PLAN_LIMITS } from "../plan";
import { validPlanInput } from "../../../tests/fixtures/valid-plan";
import { type Doc, check, issues, expectValid, expectOnly, deleteAt, jsonPath } from "./edit-plan.test-util";

// The document's shape: format and name, strict objects, required keys, the sideband choice, list limits, defaults, and planSchema used on its own.

describe("the valid base plan", () => {
  it("parses, applies defaults and turns omitted nullable fields into null", () => {
    const r = parsePlan(validPlanInput());
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.plan.chains[1]!.carrierRejectionDB).toBe(0);
    expect(r.plan.chains[1]!.sharedIf).toBe(false);
    expect(r.plan.channels[1]!.requiredNedtK).toBeNull();
    expect(r.plan.channels[2]!.dsbOffsetGHz).toBeNull();
    expect(r.plan.channels[0]!.requiredNedtK).toBe(20);
  });
  it("keeps explicit values of optional fields", () => {
    const r = check((d) => {
      d.chains[0].carrierRejectionDB = 12;
      d.chains[0].sharedIf = true;
    });
    expect(r.ok && r.plan.chains[0]!.carrierRejectionDB).toBe(12);
    expect(r.ok && r.plan.chains[0]!.sharedIf).toBe(true);
  });
});

describe("format and name", () => {
  it("format must be exactly heterolane.plan/1 or heterolane.plan/2", () => {
    expectValid((d) => (d.format = "heterolane.plan/2"));
    const both = 'must be "heterolane.plan/1" or "heterolane.plan/2"';
    expectOnly((d) => (d.format = "heterolane.plan/3"), "format", both);
    expectOnly((d) => (d.format = "Heterolane.plan/1"), "format", both);
    expectOnly((d) => delete d.format, "format", "is required");
  });
  it("name must be a non-empty string", () => {
    expectValid((d) => (d.name = "x"));
    expectOnly((d) => (d.name = ""), "name", "must not be empty");
    expectOnly((d) => (d.name = 5), "name", "must be a string, not a number");
    expectOnly((d) => delete d.name, "name", "is required");
  });
  it("the document must be an object", () => {
    for (const v of [null, 1, "x", [], true, undefined]) {
      const r = parsePlan(v);
      expect(r.ok).toBe(false);
      if (!r.ok) expect(r.issues.map((i) => i.path)).toEqual([""]);
    }
  });
});

describe("strict objects: unknown keys are refused at every level", () => {
  const places = [
    "",
    "settings",
    "lasers.0",
    "lasers.0.reach.0",
    "lasers.0.lock",
    "resonators.0",
    "detectors.0",
    "chains.0",
    "chains.0.rfInput",
    "channels.0",
  ];
  it.each(places)("unknown key in %s", (place) => {
    const path = place === "" ? "extra" : `${jsonPath(place)}.extra`;
    expectOnly(
      (d) => {
        const target = place === "" ? d : place.split(".").reduce((o: Doc, k) => o[k], d);
        target.extra = 1;
      },
      path,
      "unknown key",
    );
  });
  it("reports each unknown key separately and quotes odd key names", () => {
    const found = issues((d) => {
      d.settings.a = 1;
      d.settings["b c"] = 2;
    });
    expect(found).toEqual([
      { path: "settings.a", message: "unknown key" },
      { path: 'settings["b c"]', message: "unknown key" },
    ]);
  });
});

describe("every key except the optional ones is required", () => {
  const required = [
    "settings",
    "lasers",
    "resonators",
    "detectors",
    "chains",
    "channels",
    "settings.guardMHz",
    "settings.imageRejectionDB",
    "settings.spurMaxOrder",
    "settings.replicaLimitDB",
    "lasers.0.id",
    "lasers.0.carrierTHz",
    "lasers.0.carrierPowerMW",
    "lasers.0.loPowerMW",
    "lasers.0.reach",
    "lasers.0.stepMHz",
    "lasers.0.driftMHz",
    "lasers.0.lock",
    "lasers.0.lock.modulationMHz",
    "lasers.0.lock.modulationIndex",
    "lasers.0.lock.orders",
    "lasers.0.reach.0.minGHz",
    "lasers.0.reach.0.maxGHz",
    "resonators.0.id",
    "resonators.0.fsrGHz",
    "resonators.0.loadedQ",
    "detectors.0.id",
    "detectors.0.minGHz",
    "detectors.0.maxGHz",
    "detectors.0.maxInputMW",
    "chains.0.id",
    "chains.0.laser",
    "chains.0.resonator",
    "chains.0.detector",
    "chains.0.mode",
    "chains.0.sideband",
    "chains.0.loOffsetGHz",
    "chains.0.rfInput",
    "chains.0.rfInput.minGHz",
    "chains.0.rfInput.maxGHz",
    "chains.0.tapFraction",
    "chains.0.pathLossDB",
    "channels.0.id",
    "channels.0.name",
    "channels.0.chain",
    "channels.0.centerGHz",
    "channels.0.bandwidthMHz",
    "channels.0.integrationMs",
    "channels.0.antennaK",
    "channels.0.receiverK",
    "channels.0.gainStability",
  ];
  it.each(required)("%s", (p) => {
    const found = issues((d) => deleteAt(d, p));
    // Removing an id or a list also leaves references unresolved; those are
    // not reported against an incomplete list, so exactly one issue remains.
    expect(found).toContainEqual({ path: jsonPath(p), message: "is required" });
    expect(found).toHaveLength(1);
  });
  it.each(["dsbOffsetGHz", "requiredNedtK"])("channels.%s may be omitted (becomes null)", (k) => {
    const r = check((d) => delete d.channels[0][k]);
    expect(r.ok && (r.plan.channels[0] as Record<string, unknown>)[k]).toBeNull();
  });
  it("detectors.sampleRateGHz may be omitted (becomes null)", () => {
    const r = check((d) => delete d.detectors[1].sampleRateGHz);
    expect(r.ok && r.plan.detectors[1]!.sampleRateGHz).toBeNull();
  });
});

describe("sideband", () => {
  it("is upper or lower", () => {
    expectValid((d) => (d.chains[0].sideband = "lower"));
    expectOnly((d) => (d.chains[0].sideband = "USB"), "chains[0].sideband", 'must be "upper" or "lower"');
    expectOnly((d) => (d.chains[0].sideband = 1), "chains[0].sideband", 'must be "upper" or "lower"');
  });
  it("sharedIf is a boolean", () => {
    expectOnly((d) => (d.chains[0].sharedIf = "yes"), "chains[0].sharedIf", "must be true or false, not a string");
  });
});

describe("list limits", () => {
  function channelCopies(n: number) {
    return (d: Doc) => {
      const base = d.channels[0];
      d.channels = Array.from({ length: n }, (_, i) => ({ ...base, id: `c${i}` }));
    };
  }
  it(`at most ${PLAN_LIMITS.channels} channels`, () => {
    expectValid(channelCopies(256));
    expectOnly(channelCopies(257), "channels", "must have at most 256 items");
  });
  it("at most 64 reach intervals per laser", () => {
    const reach = (n: number) => (d: Doc) =>
      (d.lasers[0].reach = Array.from({ length: n }, (_, i) => ({ minGHz: 100 + i, maxGHz: 100.5 + i })));
    expectValid(reach(64));
    expectOnly(reach(65), "lasers[0].reach", "must have at most 64 items");
  });
  it.each(["lasers", "resonators", "detectors"])("at most 64 %s", (list) => {
    const fill = (n: number) => (d: Doc) => {
      const keep = d[list].slice(0, 2);
      const extra = Array.from({ length: n - 2 }, (_, i) => ({ ...keep[0], id: `x${i}` }));
      d[list] = [...keep, ...extra];
    };
    expectValid(fill(64));
    expectOnly(fill(65), list, "must have at most 64 items");
  });
  it("at most 64 chains", () => {
    const fill = (n: number) => (d: Doc) => {
      d.lasers = Array.from({ length: n }, (_, i) => ({ ...d.lasers[0], id: `L${i}` }));
      d.chains = Array.from({ length: n }, (_, i) => ({ ...d.chains[0], id: i === 0 ? "A" : `K${i}`, laser: `L${i}` }));
      d.channels = d.channels.filter((c: Doc) => c.chain === "A");
    };
    // 64 lasers is also the laser limit, so 65 chains gives two issues.
    expectValid(fill(64));
    expect(issues(fill(65))).toEqual([
      { path: "lasers", message: "must have at most 64 items" },
      { path: "chains", message: "must have at most 64 items" },
    ]);
  });
  it("empty lists are accepted (a plan being drafted)", () => {
    expectValid((d) => {
      d.channels = [];
      d.chains = [];
    });
  });
});

describe("planSchema used directly (forms, other callers)", () => {
  it("accepts the valid plan and applies the same defaults", () => {
    const direct = planSchema.safeParse(validPlanInput());
    const viaParse = parsePlan(validPlanInput());
    expect(direct.success).toBe(true);
    expect(viaParse.ok && direct.data).toEqual(viaParse.ok ? viaParse.plan : null);
  });
  it("enforces the cross-field rules too", () => {
    const doc = validPlanInput() as Doc;
    doc.chains[1].laser = "LP1";
    doc.channels[0].chain = "Q";
    const r = planSchema.safeParse(doc);
    expect(r.success).toBe(false);
    expect(r.error?.issues.map((i) => i.path.join("."))).toEqual(["chains.1.laser", "channels.0.chain"]);
  });
});
