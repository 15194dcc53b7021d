import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { compareCells, filterByText, filterByValue, nextSort, sortRows } from "./table";

interface R {
  key: string;
  n: number | null;
}
const get = (r: R, k: "key" | "n") => r[k];

describe("sortRows", () => {
  const rows: R[] = [
    { key: "wv10", n: 3 },
    { key: "wv2", n: null },
    { key: "o1", n: 1 },
    { key: "wv1", n: 2 },
  ];
  it("sorts names naturally", () => {
    expect(sortRows(rows, { key: "key", dir: "asc" }, get).map((r) => r.key)).toEqual(["o1", "wv1", "wv2", "wv10"]);
  });
  it("keeps missing values last in both directions", () => {
    expect(sortRows(rows, { key: "n", dir: "asc" }, get).map((r) => r.n)).toEqual([1, 2, 3, null]);
    expect(sortRows(rows, { key: "n", dir: "desc" }, get).map((r) => r.n)).toEqual([3, 2, 1, null]);
  });
  it("is a permutation, ordered, and agrees with a plain numeric sort", () => {
    const arb = fc.array(
      fc.record({ key: fc.string({ maxLength: 4 }), n: fc.option(fc.integer({ min: -50, max: 50 }), { nil: null }) }),
      { maxLength: 30 },
    );
    fc.assert(
      fc.property(arb, fc.constantFrom("asc" as const, "desc" as const), (rs, dir) => {
        const out = sortRows(rs, { key: "n", dir }, get);
        expect(out).toHaveLength(rs.length);
        const nums = out.map((r) => r.n).filter((x): x is number => x !== null);
        // Simpler reference: the numbers sorted by Array.prototype.sort.
        const ref = rs
          .map((r) => r.n)
          .filter((x): x is number => x !== null)
          .sort((a, b) => (dir === "asc" ? a - b : b - a));
        expect(nums).toEqual(ref);
        const firstNull = out.findIndex((r) => r.n === null);
        if (firstNull >= 0) expect(out.slice(firstNull).every((r) => r.n === null)).toBe(true);
      }),
    );
  });
  it("is stable for equal keys", () => {
    const eq: R[] = [
      { key: "a", n: 1 },
      { key: "b", n: 1 },
      { key: "c", n: 1 },
    ];
    expect(sortRows(eq, { key: "n", dir: "desc" }, get).map((r) => r.key)).toEqual(["a", "b", "c"]);
  });
});

describe("compareCells", () => {
  it("is antisymmetric on numbers and strings", () => {
    fc.assert(
      fc.property(fc.oneof(fc.integer(), fc.string()), fc.oneof(fc.integer(), fc.string()), (a, b) => {
        if (typeof a !== typeof b) return;
        expect(Math.sign(compareCells(a, b))).toBe(-Math.sign(compareCells(b, a)) || 0);
      }),
    );
  });
});

describe("nextSort", () => {
  it("starts a new column ascending and toggles the same column", () => {
    expect(nextSort({ key: "a", dir: "desc" }, "b")).toEqual({ key: "b", dir: "asc" });
    expect(nextSort({ key: "a", dir: "asc" }, "a")).toEqual({ key: "a", dir: "desc" });
    expect(nextSort({ key: "a", dir: "desc" }, "a")).toEqual({ key: "a", dir: "asc" });
  });
});

describe("filters", () => {
  const rows = [
    { name: "183.31 line centre", chain: "A" },
    { name: "118.75 wing", chain: "B" },
    { name: "Window 243", chain: "A" },
  ];
  it("keeps rows containing every word, case-insensitively", () => {
    expect(filterByText(rows, "WINDOW", (r) => [r.name]).map((r) => r.name)).toEqual(["Window 243"]);
    expect(filterByText(rows, "line 183", (r) => [r.name]).map((r) => r.name)).toEqual(["183.31 line centre"]);
    expect(filterByText(rows, "  ", (r) => [r.name])).toHaveLength(3);
  });
  it("a filtered list is always a subsequence of the input", () => {
    fc.assert(
      fc.property(fc.array(fc.string({ maxLength: 6 }), { maxLength: 20 }), fc.string({ maxLength: 3 }), (names, q) => {
        const out = filterByText(names, q, (n) => [n]);
        let i = 0;
        for (const n of names) if (out[i] === n) i++;
        expect(i).toBe(out.length);
      }),
    );
  });
  it("filters by an exact value, empty keeps all", () => {
    expect(filterByValue(rows, "A", (r) => r.chain)).toHaveLength(2);
    expect(filterByValue(rows, "", (r) => r.chain)).toHaveLength(3);
  });
});
