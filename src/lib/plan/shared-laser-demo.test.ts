import { describe, expect, it } from "vitest";
import { sharedLaserDemoPlan, SHARED_LASER_MISSION_NAME } from "@db/seed/shared-laser-demo-plan";
import { checkPlan } from "./check-plan";
import { parsed, sharedLaserInput } from "./schedule.test-util";

// The second demo mission's plan is the shared-laser example under its mission name (demo data).
describe("the shared-laser demo mission's plan", () => {
  it("is docs/examples/shared-laser.plan.json with the mission's name, marked as demo data", () => {
    expect(sharedLaserDemoPlan()).toEqual({ ...sharedLaserInput(), name: SHARED_LASER_MISSION_NAME });
    expect(SHARED_LASER_MISSION_NAME).toMatch(/^Demo: .*\(invented\)$/);
  });
  it("has three chains near 180, 240 and 320 GHz on one laser pair, each placed on its map", () => {
    const r = checkPlan(parsed(sharedLaserDemoPlan()));
    expect(r.chains.map((c) => c.id)).toEqual(["A180", "B240", "C320"]);
    for (const c of r.chains) expect(c.placeGHz).not.toBeNull();
    expect(r.schedules).toHaveLength(1);
    expect(r.schedules![0]!.bestSplit!.commonMargin).toBeGreaterThan(0);
  });
});
