import { describe, expect, it } from "vitest";
import { formatPath, jsonErrorOffset, parsePlan, parsePlanText, planSchema, PLAN_LIMITS, type PlanIssue } from "./plan";
import { validPlanInput } from "../../tests/fixtures/valid-plan";

// The document is edited through loosely typed records so tests can write
// values of the wrong type on purpose.
type Doc = Record<string, any>; // eslint-disable-line @typescript-eslint/no-explicit-any

function check(edit: (doc: Doc) => void) {
  const doc = validPlanInput() as Doc;
  edit(doc);
  return parsePlan(doc);
}
function issues(edit: (doc: Doc) => void): PlanIssue[] {
  const r = check(edit);
  return r.ok ? [] : r.issues;
}
function expectValid(edit: (doc: Doc) => void) {
  const r = check(edit);
  expect(r.ok ? [] : r.issues).toEqual([]);
  expect(r.ok).toBe(true);
}
function expectOnly(edit: (doc: Doc) => void, path: string, message: string | RegExp) {
  const found = issues(edit);
  expect(found).toHaveLength(1);
  expect(found[0]!.path).toBe(path);
  if (typeof message === "string") expect(found[0]!.message).toBe(message);
  else expect(found[0]!.message).toMatch(message);
}

/** Sets a value at a dotted path with numeric indices: "lasers.0.lock.orders". */
function setAt(doc: Doc, path: string, value: unknown) {
  const keys = path.split(".");
  let o: Doc = doc;
  for (const k of keys.slice(0, -1)) o = o[k];
  o[keys[keys.length - 1]!] = value;
}
function deleteAt(doc: Doc, path: string) {
  const keys = path.split(".");
  let o: Doc = doc;
  for (const k of keys.slice(0, -1)) o = o[k];
  delete o[keys[keys.length - 1]!];
}
/** "lasers.0.lock.orders" → "lasers[0].lock.orders" */
const jsonPath = (dotted: string) => dotted.replace(/\.(\d+)/g, "[$1]");

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
  it("format must be exactly heterolane.plan/1", () => {
    expectOnly((d) => (d.format = "heterolane.plan/2"), "format", 'must be "heterolane.plan/1"');
    expectOnly((d) => (d.format = "Heterolane.plan/1"), "format", 'must be "heterolane.plan/1"');
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
      { path: "format", message: 'must be "heterolane.plan/1"' },
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

describe("paths", () => {
  it("formats keys and indices like JavaScript accessors", () => {
    expect(formatPath([])).toBe("");
    expect(formatPath(["channels", 2, "bandwidthMHz"])).toBe("channels[2].bandwidthMHz");
    expect(formatPath(["lasers", 0, "reach", 1, "maxGHz"])).toBe("lasers[0].reach[1].maxGHz");
    expect(formatPath(["chains", 0, "laser"])).toBe("chains[0].laser");
    expect(formatPath(["settings", "a b"])).toBe('settings["a b"]');
    expect(formatPath(["1x"])).toBe('["1x"]');
    expect(formatPath(["a", 'q"'])).toBe('a["q\\""]');
  });
});

describe("parsePlanText", () => {
  it("accepts valid JSON text, with or without a byte-order mark", () => {
    const text = JSON.stringify(validPlanInput(), null, 2);
    expect(parsePlanText(text).ok).toBe(true);
    expect(parsePlanText(`\ufeff${text}`).ok).toBe(true);
  });
  it("reports a syntax error as one issue with the empty path and the position", () => {
    expect(parsePlanText('{\n  "format": "heterolane.plan/1",\n  "name": ,\n}')).toEqual({
      ok: false,
      issues: [{ path: "", message: 'not valid JSON: unexpected "," at line 3, column 11' }],
    });
    expect(parsePlanText("")).toEqual({
      ok: false,
      issues: [{ path: "", message: "not valid JSON: unexpected end of input at line 1, column 1" }],
    });
    expect(parsePlanText('{"a": [1, 2')).toEqual({
      ok: false,
      issues: [{ path: "", message: "not valid JSON: unexpected end of input at line 1, column 12" }],
    });
  });
  it("locates the error where JSON.parse stops (agrees with the RFC 8259 grammar on small cases)", () => {
    const cases: [string, number][] = [
      ["[1,2,]", 5],
      ['{"a":1,}', 7],
      ['{"a":1} x', 8],
      ['"\\x"', 2],
      ["01", 1],
      ['{"a" 1}', 5],
      ["[1 2]", 3],
      ["-", 1],
      ["1.", 2],
      ["NaN", 0],
      ['{"a":Infinity}', 5],
      ["tru", 3],
      ['"a\nb"', 2],
    ];
    for (const [text, at] of cases) {
      expect(() => JSON.parse(text)).toThrow();
      expect(jsonErrorOffset(text), text).toBe(at);
    }
    // On valid text the scanner reaches the end.
    for (const text of ['{"a":[1,-2.5e3,true,false,null,"\\u00e9"]}', "[[[[]]]]", " 0 "]) {
      expect(() => JSON.parse(text)).not.toThrow();
      expect(jsonErrorOffset(text)).toBe(text.length);
    }
  });
  it("does not overflow the stack on deeply nested text", () => {
    const deep = "[".repeat(200_000);
    const r = parsePlanText(deep);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.issues[0]!.message).toMatch(/unexpected end of input/);
  });
});
