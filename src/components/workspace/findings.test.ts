import { describe, expect, it } from "vitest";
import fc from "fast-check";
import type { Finding, FindingCode, Severity } from "@/lib/plan";
import { countBySeverity, findingsForChannel, groupFindings, worstFinding } from "./findings";

const f = (severity: Severity, chain: string, channel: string | null, code = "x", data?: object): Finding => ({
  // codes here are labels for grouping; the helpers under test treat them as plain strings
  code: code as FindingCode,
  severity,
  chain,
  channel,
  message: `${code} on ${channel ?? chain}`,
  data: (data ?? {}) as Finding["data"],
});

describe("worstFinding", () => {
  it("prefers errors, then warnings, then info, keeping engine order among equals", () => {
    const list = [
      f("info", "A", "a", "i1"),
      f("warning", "A", "a", "w1"),
      f("error", "A", "a", "e1"),
      f("error", "A", "a", "e2"),
    ];
    expect(worstFinding(list)?.code).toBe("e1");
    expect(worstFinding([])).toBeNull();
  });
});

describe("groupFindings", () => {
  it("puts chain findings apart and channels in order of first appearance", () => {
    const list = [
      f("warning", "A", null, "carrier-dominates-lo"),
      f("error", "A", "wv2", "slot-overlap"),
      f("info", "A", "wv1", "in-protected-band"),
      f("error", "B", "o1", "mode-detuned"),
      f("warning", "A", "wv2", "lock-replica"),
    ];
    const g = groupFindings(list);
    expect(g.map((x) => x.chain)).toEqual(["A", "B"]);
    expect(g[0]?.chainFindings.map((x) => x.code)).toEqual(["carrier-dominates-lo"]);
    expect(g[0]?.channels.map((c) => [c.channel, c.findings.length])).toEqual([
      ["wv2", 2],
      ["wv1", 1],
    ]);
  });
  it("loses and duplicates nothing", () => {
    const arb = fc.array(
      fc.record({
        severity: fc.constantFrom<Severity>("error", "warning", "info"),
        chain: fc.constantFrom("A", "B", "C"),
        channel: fc.option(fc.constantFrom("a", "b", "c", "d"), { nil: null }),
      }),
      { maxLength: 40 },
    );
    fc.assert(
      fc.property(arb, (rows) => {
        const list = rows.map((r, i) => f(r.severity, r.chain, r.channel, `c${i}`));
        const g = groupFindings(list);
        const flat = g.flatMap((x) => [...x.chainFindings, ...x.channels.flatMap((c) => c.findings)]);
        expect(flat.map((x) => x.code).sort()).toEqual(list.map((x) => x.code).sort());
        const counts = countBySeverity(list);
        expect(counts.error + counts.warning + counts.info).toBe(list.length);
      }),
    );
  });
});

describe("findingsForChannel", () => {
  it("includes pair findings that name the channel as the other one", () => {
    const list = [f("error", "A", "wv1", "slot-overlap", { other: "wv2" }), f("info", "A", "wv3")];
    expect(findingsForChannel(list, "wv2").map((x) => x.code)).toEqual(["slot-overlap"]);
    expect(findingsForChannel(list, "wv3")).toHaveLength(1);
  });
});
