import { readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { checkPlan } from "@/lib/plan";
import { parsePlan } from "@/schemas/plan";

// With no LO drift and no temperature excursion the operating envelope is one
// point: every result must equal what the engine gave before the envelope
// existed (docs/plan-format.md §12.8 "Zero envelope"). The corpus
// tests/fixtures/zero-envelope/v1-results.json holds 80 generated plans with
// driftMHz 0 and the result documents of the engine at commit 90231fe
// (heterolane.result/1), written by make-snapshot.ts in that folder before
// any of the envelope code existed.

interface Case {
  plan: unknown;
  result: { format: string; chains: Record<string, unknown>[]; channels: Record<string, unknown>[] };
}
const corpus = JSON.parse(readFileSync(join(__dirname, "../fixtures/zero-envelope/v1-results.json"), "utf8")) as {
  generatedAt: string;
  cases: Case[];
};

/** Today's result without what version 2 adds (the format line, the envelope and the temperature window). */
function withoutVersion2(doc: unknown) {
  const r = JSON.parse(JSON.stringify(doc)) as Case["result"];
  const { format: _format, ...rest } = r;
  void _format;
  return {
    ...rest,
    chains: r.chains.map(({ temperatureWindowK: _w, temperatureMarginK: _m, ...c }) => c),
    channels: r.channels.map(({ envelope: _e, ...c }) => c),
  };
}

describe("zero envelope: today's results equal those from before the envelope existed", () => {
  it("the corpus is the one described (80 plans, all without drift)", () => {
    expect(corpus.generatedAt).toBe("90231fe");
    expect(corpus.cases).toHaveLength(80);
    for (const c of corpus.cases) {
      const plan = c.plan as { lasers: { driftMHz: number }[] };
      for (const l of plan.lasers) expect(l.driftMHz).toBe(0);
      expect(c.result.format).toBe("heterolane.result/1");
    }
  });
  it.each(corpus.cases.map((c, i) => [i, c] as const))("plan %i", (_i, c) => {
    const parsed = parsePlan(c.plan);
    expect(parsed.ok).toBe(true);
    if (!parsed.ok) return;
    const today = checkPlan(parsed.plan);
    expect(today.format).toBe("heterolane.result/2");
    const { format: _f, ...before } = c.result;
    void _f;
    expect(withoutVersion2(today)).toEqual(before);
  });
});
