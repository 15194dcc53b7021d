import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { readFileSync } from "node:fs";
import { compareRevisions, type RevisionComparison } from "./compare-revisions";
import { isEmptyComparison } from "./is-empty-comparison";
import type { FindingLike } from "./types";

// The clean worked example plan of the project's fixtures (invented demo data).
const ex1 = JSON.parse(
  readFileSync(new URL("../../../tests/fixtures/plans/ex1-single-channel.plan.json", import.meta.url), "utf8"),
);
const clone = <T>(v: T): T => JSON.parse(JSON.stringify(v));

const f = (
  code: string,
  chain: string,
  channel: string | null,
  severity: FindingLike["severity"] = "error",
  message = "m",
): FindingLike => ({
  code,
  severity,
  chain,
  channel,
  message,
});

describe("compareRevisions: worked cases", () => {
  it("a changed channel field, an added channel, a removed resonator and a changed setting", () => {
    const a = clone(ex1);
    const b = clone(ex1);
    b.channels[0].bandwidthMHz = a.channels[0].bandwidthMHz * 2;
    b.channels.push({ ...clone(a.channels[0]), id: "zz-new" });
    a.resonators.push({ id: "R-old", fsrGHz: 100, loadedQ: 1e6 });
    b.settings.guardMHz = a.settings.guardMHz + 10;
    const c = compareRevisions({ plan: a, findings: [] }, { plan: b, findings: [] });
    expect(c.entities).toEqual([
      {
        section: "settings",
        id: "",
        kind: "changed",
        fields: [{ path: "guardMHz", before: a.settings.guardMHz, after: a.settings.guardMHz + 10 }],
      },
      {
        section: "resonators",
        id: "R-old",
        kind: "removed",
        fields: [
          { path: "fsrGHz", before: 100 },
          { path: "id", before: "R-old" },
          { path: "loadedQ", before: 1e6 },
        ],
      },
      {
        section: "channels",
        id: a.channels[0].id,
        kind: "changed",
        fields: [{ path: "bandwidthMHz", before: a.channels[0].bandwidthMHz, after: a.channels[0].bandwidthMHz * 2 }],
      },
      expect.objectContaining({ section: "channels", id: "zz-new", kind: "added" }),
    ]);
    const added = c.entities[3]!;
    expect(added.fields.every((x) => !("before" in x) && "after" in x)).toBe(true);
  });

  it("nested fields are named by their document path", () => {
    const a = clone(ex1);
    const b = clone(ex1);
    b.lasers[0].reach[0].maxGHz += 1;
    b.lasers[0].lock.orders += 1;
    const c = compareRevisions({ plan: a, findings: [] }, { plan: b, findings: [] });
    expect(c.entities).toHaveLength(1);
    expect(c.entities[0]!.fields.map((x) => x.path)).toEqual(["lock.orders", "reach[0].maxGHz"]);
  });

  it("a null becoming a number is a change, not an addition", () => {
    const a = clone(ex1);
    const b = clone(ex1);
    a.channels[0].requiredNedtK = null;
    b.channels[0].requiredNedtK = 0.5;
    const c = compareRevisions({ plan: a, findings: [] }, { plan: b, findings: [] });
    expect(c.entities[0]!.fields).toEqual([{ path: "requiredNedtK", before: null, after: 0.5 }]);
  });

  it("findings: new, resolved and unchanged (paired by rule, chain and channel)", () => {
    const a = [
      f("image-in-mode", "A", "wv1", "error", "old numbers"),
      f("spur-in-slot", "A", "wv1"),
      f("spur-in-slot", "A", "wv1"),
    ];
    const b = [
      f("image-in-mode", "A", "wv1", "error", "new numbers"),
      f("spur-in-slot", "A", "wv1"),
      f("lo-in-band", "B", null),
    ];
    const c = compareRevisions({ plan: ex1, findings: a }, { plan: ex1, findings: b });
    expect(c.entities).toEqual([]);
    expect(c.findings.new).toEqual([b[2]]);
    expect(c.findings.resolved).toEqual([a[2]]);
    expect(c.findings.unchanged).toEqual([
      { before: a[0], after: b[0] },
      { before: a[1], after: b[1] },
    ]);
  });
});

// --- property tests on generated plans ---
const ids = fc.constantFrom("A", "B", "C", "wv1", "o2");
const leaf = fc.oneof(
  fc.double({ min: -1e6, max: 1e6, noNaN: true }),
  fc.constant(null),
  fc.boolean(),
  fc.string({ maxLength: 6 }),
);
const entity = fc.record({
  id: ids,
  x: leaf,
  y: fc.option(fc.record({ minGHz: fc.double({ min: 0, max: 400, noNaN: true }), maxGHz: leaf })),
  list: fc.array(fc.record({ v: leaf }), { maxLength: 3 }),
});
const plan = fc.record({
  format: fc.constant("heterolane.plan/1"),
  name: fc.string({ maxLength: 8 }),
  settings: fc.record({ guardMHz: leaf, spurMaxOrder: fc.integer({ min: 2, max: 9 }) }),
  lasers: fc.array(entity, { maxLength: 3 }),
  chains: fc.array(entity, { maxLength: 3 }),
  channels: fc.array(entity, { maxLength: 4 }),
});
const finding = fc.record({
  code: fc.constantFrom("image-in-mode", "spur-in-slot", "lo-in-band"),
  severity: fc.constantFrom<FindingLike["severity"]>("error", "warning", "info"),
  chain: fc.constantFrom("A", "B"),
  channel: fc.constantFrom<string | null>(null, "wv1", "o2"),
  message: fc.string({ maxLength: 5 }),
});
const revision = fc.record({ plan, findings: fc.array(finding, { maxLength: 6 }) });

/** compare(b, a) written in terms of compare(a, b): the mirror image. */
function mirror(c: RevisionComparison<FindingLike>): RevisionComparison<FindingLike> {
  const flip = { added: "removed", removed: "added", changed: "changed" } as const;
  return {
    entities: c.entities.map((e) => ({
      ...e,
      kind: flip[e.kind],
      fields: e.fields.map(({ path, before, after }) => ({
        path,
        ...(after !== undefined ? { before: after } : {}),
        ...(before !== undefined ? { after: before } : {}),
      })),
    })),
    findings: {
      new: c.findings.resolved,
      resolved: c.findings.new,
      unchanged: c.findings.unchanged.map(({ before, after }) => ({ before: after, after: before })),
    },
  };
}

describe("compareRevisions: properties", () => {
  it("compare(a, a) is empty, and every finding of a is unchanged", () => {
    fc.assert(
      fc.property(revision, (a) => {
        const c = compareRevisions(a, a);
        expect(isEmptyComparison(c)).toBe(true);
        expect(c.findings.unchanged).toHaveLength(a.findings.length);
      }),
    );
  });

  it("compare(a, clone(a)) is empty (values, not identity)", () => {
    fc.assert(
      fc.property(revision, (a) => {
        expect(isEmptyComparison(compareRevisions(a, clone(a)))).toBe(true);
      }),
    );
  });

  it("compare(b, a) mirrors compare(a, b)", () => {
    fc.assert(
      fc.property(revision, revision, (a, b) => {
        expect(compareRevisions(b, a)).toEqual(mirror(compareRevisions(a, b)));
      }),
    );
  });

  it("findings are conserved: |a| = resolved + unchanged, |b| = new + unchanged", () => {
    fc.assert(
      fc.property(revision, revision, (a, b) => {
        const c = compareRevisions(a, b);
        expect(c.findings.resolved.length + c.findings.unchanged.length).toBe(a.findings.length);
        expect(c.findings.new.length + c.findings.unchanged.length).toBe(b.findings.length);
      }),
    );
  });

  it("agrees with a simpler check: no entity change exactly when the documents serialise alike after sorting lists by id", () => {
    const canon = (p: Record<string, unknown>): string => {
      const sortKeys = (v: unknown): unknown =>
        Array.isArray(v)
          ? v.map(sortKeys)
          : v !== null && typeof v === "object"
            ? Object.fromEntries(
                Object.entries(v as object)
                  .sort(([x], [y]) => (x < y ? -1 : 1))
                  .map(([k, x]) => [k, sortKeys(x)]),
              )
            : v;
      const out: Record<string, unknown> = {};
      for (const [k, v] of Object.entries(p)) {
        if (Array.isArray(v)) {
          // first entity of each id (the comparison's rule for duplicated ids)
          const seen = new Map<string, unknown>();
          for (const e of v as { id: string }[]) if (!seen.has(e.id)) seen.set(e.id, e);
          out[k] = [...seen.entries()].sort(([x], [y]) => (x < y ? -1 : 1)).map(([, e]) => sortKeys(e));
        } else out[k] = sortKeys(v);
      }
      return JSON.stringify(out);
    };
    fc.assert(
      fc.property(plan, plan, fc.boolean(), (a, b0, same) => {
        const b = same ? clone(a) : b0;
        const c = compareRevisions({ plan: a, findings: [] }, { plan: b, findings: [] });
        expect(c.entities.length === 0).toBe(canon(a) === canon(b));
      }),
    );
  });
});
