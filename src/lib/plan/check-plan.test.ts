import { resultDocumentSchema } from "@/schemas/result";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { arbitraryPlan, example2 } from "../../../tests/fixtures/plans/builders";
import { checkPlan } from "./check-plan";
import { checkChainAtOffset } from "./check-chain-at-offset";
import { SPUR_FAMILIES, type ResultDocument } from "./types";

function assertDocumentShape(doc: ResultDocument, planChannelIds: string[], planChainIds: string[]): void {
  expect(doc.format).toBe("heterolane.result/2");
  // and, strictly, the result document's schema (src/schemas/result.ts)
  expect(resultDocumentSchema.safeParse(JSON.parse(JSON.stringify(doc))).success).toBe(true);
  expect(Object.keys(doc)).toEqual(["format", "chains", "channels", "spurs", "findings"]);
  expect(doc.chains.map((c) => c.id)).toEqual(planChainIds);
  expect(doc.channels.map((c) => c.id)).toEqual(planChannelIds);
  for (const c of doc.chains)
    expect(Object.keys(c)).toEqual([
      "id",
      "linewidthMHz",
      "pdInputMW",
      "feasibleGHz",
      "excludedGHz",
      "placeGHz",
      "placeReason",
      // version 2 (docs/plan-format.md §12.7)
      "temperatureWindowK",
      "temperatureMarginK",
    ]);
  for (const c of doc.channels) {
    expect(Object.keys(c)).toEqual([
      "id",
      "ifSlotGHz",
      "occupiedGHz",
      "imageGHz",
      "imageRejectionDB",
      "radiometricBandwidthMHz",
      "nedtK",
      "lockReplicaDB",
      // version 2 (docs/plan-format.md §12.7)
      "envelope",
    ]);
    if (c.ifSlotGHz === null) {
      expect(c.occupiedGHz).toBeNull();
      expect(c.nedtK).toBeNull();
      expect(c.imageGHz).toBeNull();
    }
  }
  // spurs by chain (input order), then family in table order, then band
  for (let i = 1; i < doc.spurs.length; i++) {
    const a = doc.spurs[i - 1]!;
    const b = doc.spurs[i]!;
    const ca = planChainIds.indexOf(a.chain);
    const cb = planChainIds.indexOf(b.chain);
    expect(ca).toBeLessThanOrEqual(cb);
    if (ca === cb) {
      const fa = SPUR_FAMILIES.indexOf(a.family);
      const fb = SPUR_FAMILIES.indexOf(b.family);
      expect(fa).toBeLessThanOrEqual(fb);
      if (fa === fb)
        expect(a.bandGHz[0] < b.bandGHz[0] || (a.bandGHz[0] === b.bandGHz[0] && a.bandGHz[1] <= b.bandGHz[1])).toBe(
          true,
        );
    }
  }
  // findings grouped by chain in input order
  const chainOrder = doc.findings.map((f) => planChainIds.indexOf(f.chain));
  expect([...chainOrder].sort((x, y) => x - y)).toEqual(chainOrder);
  // full JSON round trip: no NaN, no Infinity, no undefined
  expect(JSON.parse(JSON.stringify(doc))).toEqual(doc);
}

describe("checkPlan", () => {
  it("example 2: document shape, and the findings equal the per-offset check at the written LO", () => {
    const plan = example2();
    const doc = checkPlan(plan);
    assertDocumentShape(
      doc,
      plan.channels.map((c) => c.id),
      plan.chains.map((c) => c.id),
    );
    expect(doc.findings).toEqual(checkChainAtOffset(plan, "O2", -121));
    expect(doc.spurs.every((s) => s.chain === "O2")).toBe(true);
    // a spur's hits are channel ids in input order
    for (const s of doc.spurs) {
      const idx = s.hits.map((h) => plan.channels.findIndex((c) => c.id === h));
      expect([...idx].sort((a, b) => a - b)).toEqual(idx);
    }
  });

  it("never throws on any valid plan and always gives a well-formed document (property)", () => {
    fc.assert(
      fc.property(arbitraryPlan(), (plan) => {
        const doc = checkPlan(plan);
        assertDocumentShape(
          doc,
          plan.channels.map((c) => c.id),
          plan.chains.map((c) => c.id),
        );
      }),
      { numRuns: 150 },
    );
  }, 60_000);
});
