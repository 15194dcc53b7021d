import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { parsePlan, parsePlanText, type ParsePlanResult } from "./plan";
import { validPlanInput } from "../../tests/fixtures/valid-plan";
import { mutate, mutationArb, validPlanArb } from "../../tests/fixtures/plan-arbitrary";

// Property tests of the validator: it never throws, always answers with a
// well-formed result, agrees with itself on JSON text, and is idempotent on
// what it accepts.

const PATH_RE = /^(?:[A-Za-z_$][\w$]*|\["(?:[^"\\]|\\.)*"\])(?:\.[A-Za-z_$][\w$]*|\[\d+\]|\["(?:[^"\\]|\\.)*"\])*$/;

function wellFormed(r: ParsePlanResult) {
  if (r.ok) {
    expect(r.plan.format).toBe("heterolane.plan/2"); // every version is read as the current one (docs/plan-format.md §12.6)
    return;
  }
  expect(r.issues.length).toBeGreaterThan(0);
  const seen = new Set<string>();
  for (const i of r.issues) {
    expect(typeof i.message).toBe("string");
    expect(i.message.length).toBeGreaterThan(0);
    if (i.path !== "") expect(i.path).toMatch(PATH_RE);
    const key = `${i.path}|${i.message}`;
    expect(seen.has(key)).toBe(false);
    seen.add(key);
  }
}

/** JSON cannot carry NaN or ±Infinity; JSON.stringify writes them as null. */
function hasNonJsonNumber(v: unknown): boolean {
  if (typeof v === "number") return !Number.isFinite(v);
  if (Array.isArray(v)) return v.some(hasNonJsonNumber);
  if (v && typeof v === "object") return Object.values(v).some(hasNonJsonNumber);
  return false;
}

describe("parsePlan on arbitrary input", () => {
  it("never throws on any JavaScript value", () => {
    fc.assert(
      fc.property(fc.anything({ withNullPrototype: true, withBoxedValues: true, withSparseArray: true }), (v) => {
        wellFormed(parsePlan(v));
      }),
      { numRuns: 500 },
    );
  });
  it("never throws on any JSON value, and parsePlanText agrees with parsePlan", () => {
    fc.assert(
      fc.property(fc.jsonValue(), (v) => {
        const direct = parsePlan(v);
        wellFormed(direct);
        expect(parsePlanText(JSON.stringify(v))).toEqual(direct);
      }),
      { numRuns: 300 },
    );
  });
  it("never throws on arbitrary text", () => {
    fc.assert(
      fc.property(
        fc.oneof(
          fc.string(),
          fc.json().map((j) => j.slice(0, Math.max(0, j.length - 1))),
        ),
        (text) => {
          const r = parsePlanText(text);
          wellFormed(r);
        },
      ),
      { numRuns: 500 },
    );
  });
});

describe("parsePlan on mutations of valid plans", () => {
  const base = fc.oneof(fc.constant(validPlanInput()), validPlanArb);

  it("never throws and always answers with a well-formed result", () => {
    fc.assert(
      fc.property(base, fc.array(mutationArb, { minLength: 1, maxLength: 4 }), (doc, ms) => {
        const mutated = mutate(doc, ms);
        const r = parsePlan(mutated);
        wellFormed(r);
        if (!hasNonJsonNumber(mutated)) expect(parsePlanText(JSON.stringify(mutated))).toEqual(r);
      }),
      { numRuns: 600 },
    );
  });
  it("is idempotent on what it accepts: the parsed plan parses to itself", () => {
    fc.assert(
      fc.property(base, fc.array(mutationArb, { minLength: 0, maxLength: 2 }), (doc, ms) => {
        const r = parsePlan(mutate(doc, ms));
        if (!r.ok) return;
        expect(parsePlan(r.plan)).toEqual(r);
        expect(parsePlanText(JSON.stringify(r.plan))).toEqual(r);
      }),
      { numRuns: 300 },
    );
  });
  it("generated valid plans are accepted (the generator stays inside the plan format)", () => {
    fc.assert(
      fc.property(validPlanArb, (doc) => {
        const r = parsePlan(doc);
        expect(r.ok ? [] : r.issues).toEqual([]);
      }),
      { numRuns: 300 },
    );
  });
  it("a deleted required key is always reported at its own path", () => {
    const required = ["settings", "lasers", "resonators", "detectors", "chains", "channels", "name", "format"];
    fc.assert(
      fc.property(validPlanArb, fc.constantFrom(...required), (doc, key) => {
        const copy = structuredClone(doc) as Record<string, unknown>;
        delete copy[key];
        const r = parsePlan(copy);
        expect(r.ok).toBe(false);
        if (!r.ok) expect(r.issues).toContainEqual({ path: key, message: "is required" });
      }),
      { numRuns: 100 },
    );
  });
  it("a duplicated id is always reported", () => {
    fc.assert(
      fc.property(
        validPlanArb,
        fc.constantFrom("lasers", "resonators", "detectors", "chains", "channels"),
        (doc, list) => {
          const copy = structuredClone(doc) as unknown as Record<string, { id: string }[]>;
          const entries = copy[list]!;
          fc.pre(entries.length > 0);
          entries.push(structuredClone(entries[0]!));
          const r = parsePlan(copy);
          expect(r.ok).toBe(false);
          if (!r.ok)
            expect(r.issues).toContainEqual({
              path: `${list}[${entries.length - 1}].id`,
              message: `duplicates the id "${entries[0]!.id}" of ${list}[0]`,
            });
        },
      ),
      { numRuns: 100 },
    );
  });
});
