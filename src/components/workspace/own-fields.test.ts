import { describe, expect, it } from "vitest";
import { ownFields } from "./entity-form";

describe("ownFields", () => {
  it("keeps the form's fields, nested names and conform's intent; drops a helper's inputs", () => {
    const fd = new FormData();
    fd.append("driftMHz", "12.5");
    fd.append("lock.orders", "2");
    fd.append("reach[0].minGHz", "150");
    fd.append("__intent__", "x");
    fd.append("«r3»-combine", "on");
    fd.append("_r_5_-l2", "10");
    fd.append("driftMHzExtra", "1");
    const out = ownFields(fd, ["driftMHz", "lock.orders", "reach"]);
    expect([...out.keys()]).toEqual(["driftMHz", "lock.orders", "reach[0].minGHz", "__intent__"]);
    expect(out.get("driftMHz")).toBe("12.5");
  });
});
