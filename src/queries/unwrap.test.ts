import { describe, expect, it } from "vitest";
import { unwrapItem, unwrapList } from "./unwrap";

describe("unwrapList", () => {
  it("accepts a bare array, a named array and an items array", () => {
    expect(unwrapList([{ a: 1 }], "channels")).toEqual([{ a: 1 }]);
    expect(unwrapList({ channels: [{ a: 2 }] }, "channels")).toEqual([{ a: 2 }]);
    expect(unwrapList({ items: [{ a: 3 }] }, "channels")).toEqual([{ a: 3 }]);
  });
  it("gives an empty list for anything else", () => {
    expect(unwrapList(null, "channels")).toEqual([]);
    expect(unwrapList({ lasers: [1] }, "channels")).toEqual([]);
  });
});

describe("unwrapItem", () => {
  it("takes the named entity out of a mutation answer", () => {
    expect(unwrapItem({ channel: { id: "x" }, revision: { number: 3 } }, "channel")).toEqual({ id: "x" });
  });
  it("returns a bare entity unchanged", () => {
    expect(unwrapItem({ id: "x", key: "wv1" }, "channel")).toEqual({ id: "x", key: "wv1" });
  });
});
