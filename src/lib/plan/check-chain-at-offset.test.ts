import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { arbitraryPlan, example1, example2 } from "../../../tests/fixtures/plans/builders";
import { checkChainAtOffset } from "./check-chain-at-offset";
import { L_DEPENDENT_ERROR_CODES, type Finding, type FindingCode, RULE_ORDER } from "./types";

const codes = (fs: Finding[]) => fs.map((f) => f.code);
const find = (fs: Finding[], code: FindingCode, channel: string | null = null) =>
  fs.filter((f) => f.code === code && (channel === null || f.channel === channel));

/**
 * Example 1 with its LO drift set to 0: the operating envelope is then the
 * nominal point, where the rules that now take their worst value over the
 * envelope (mode-detuned, image-response, nedt-unmet: docs/plan-format.md
 * §12.5) work on the nominal figures, as they did before version 2.
 */
const nominal1 = (mutate?: Parameters<typeof example1>[0]) =>
  example1((p) => {
    p.lasers[0]!.driftMHz = 0;
    mutate?.(p);
  });

describe("checkChainAtOffset: one rule at a time on example 1 (δ = 19.34 MHz, guard 50 MHz, drift 20 MHz)", () => {
  it("the plan without its drift has only the carrier and protected-band notes", () => {
    const f = checkChainAtOffset(nominal1(), "A", 184.81);
    expect(codes(f)).toEqual(["carrier-dominates-lo", "in-protected-band"]);
    expect(f[0]!.data).toEqual({ carrierMW: expect.closeTo(4.96175, 4), loMW: 2 });
    expect(f[0]!.channel).toBeNull();
    expect(f[1]!.severity).toBe("info");
  });

  it("the plan as written: its ±20 MHz LO drift detunes the 10 MHz channel (issue 11's known answer: mode-detuned and nedt-unmet)", () => {
    const f = checkChainAtOffset(example1(), "A", 184.81);
    expect(codes(f)).toEqual(["carrier-dominates-lo", "mode-detuned", "nedt-unmet", "in-protected-band"]);
    // worst NEΔT 81.123 K at u = ±20 MHz (issue 11, computed independently from its model)
    expect(find(f, "nedt-unmet")[0]!.data.nedtK).toBeCloseTo(81.123, 3);
    // the received centre 20 MHz from the mode: response 1/(1 + (2·20/19.34)²) = 0.18948 (−7.22 dB)
    expect(find(f, "mode-detuned")[0]!.data.detuningMHz).toBeCloseTo(20, 9);
    expect(find(f, "mode-detuned")[0]!.data.responseDB).toBeCloseTo(10 * Math.log10(1 / (1 + (40 / 19.34) ** 2)), 9);
    expect(find(f, "mode-detuned")[0]!.message).toContain("at an LO shift of −20 MHz");
  });

  it("lo-uncovered: the drift window must sit inside one reach interval (edge exact, 1e-9 allowance)", () => {
    const plan = example1();
    expect(codes(checkChainAtOffset(plan, "A", 199.98))).not.toContain("lo-uncovered");
    const f = find(checkChainAtOffset(plan, "A", 199.99), "lo-uncovered");
    expect(f).toHaveLength(1);
    expect(f[0]!.data.shortGHz).toBeCloseTo(0.01, 9);
    expect(f[0]!.message).toContain("10 MHz beyond");
  });

  it("lo-in-band: the LO strictly inside the optical band; no slot so no slot rules", () => {
    const f = checkChainAtOffset(example1(), "A", 183.31);
    expect(codes(f)).toContain("lo-in-band");
    expect(codes(f)).not.toContain("if-outside-detector");
    expect(codes(f)).not.toContain("image-response");
  });

  it("lo-off-step: 184.815 GHz is not a multiple of 10 MHz; 184.82 is", () => {
    expect(find(checkChainAtOffset(example1(), "A", 184.815), "lo-off-step")).toHaveLength(1);
    expect(find(checkChainAtOffset(example1(), "A", 184.82), "lo-off-step")).toHaveLength(0);
  });

  it("if-outside-detector: occupied band up to exactly 6 GHz passes, beyond fails", () => {
    expect(codes(checkChainAtOffset(example1(), "A", 189.285))).not.toContain("if-outside-detector");
    const f = find(checkChainAtOffset(example1(), "A", 189.3), "if-outside-detector");
    expect(f).toHaveLength(1);
    expect(f[0]!.data.outsideMHz).toBeCloseTo(15, 6);
  });

  it("spur-in-slot: the lock-self tone 4·fm = 0.24 GHz within 50 MHz of the occupied band, with the shortfall in the message", () => {
    const f = find(checkChainAtOffset(example1(), "A", 183.6), "spur-in-slot", "wv1");
    expect(f).toHaveLength(1);
    expect(f[0]!.severity).toBe("error");
    expect(f[0]!.data).toMatchObject({ family: "lock-self", source: "4·fm", order: 4 });
    expect(f[0]!.data.gapMHz).toBeCloseTo(25, 6);
    expect(f[0]!.message).toBe(
      "Occupied IF band 0.265–0.315 GHz of wv1 comes within 25 MHz of the lock-self spur 4·fm at 0.24 GHz; the guard is 50 MHz (25 MHz short).",
    );
    // the feasible edge of example 1 at 183.625 GHz: just passing
    expect(find(checkChainAtOffset(example1(), "A", 183.625), "spur-in-slot")).toHaveLength(0);
  });

  it("image-response: 49.48 dB against a 50 dB requirement", () => {
    const f = find(
      checkChainAtOffset(
        nominal1((p) => (p.settings.imageRejectionDB = 50)),
        "A",
        184.81,
      ),
      "image-response",
    );
    expect(f).toHaveLength(1);
    expect(f[0]!.data.imageRejectionDB).toBeCloseTo(49.4817, 3);
    expect(f[0]!.message).toContain("0.52 dB short");
  });

  it("band-outside-rf-input, mode-detuned, band-wider-than-mode", () => {
    const plan = nominal1((p) => {
      p.channels[0]!.centerGHz = 183.34; // 30 MHz from the mode centre
      p.channels[0]!.bandwidthMHz = 30; // wider than δ
      p.chains[0]!.rfInput.maxGHz = 183.35;
    });
    const f = checkChainAtOffset(plan, "A", 184.81);
    expect(codes(f)).toEqual(expect.arrayContaining(["band-outside-rf-input", "mode-detuned", "band-wider-than-mode"]));
    expect(find(f, "mode-detuned")[0]!.data.detuningMHz).toBeCloseTo(30, 6);
  });

  it("pd-overload and nedt-unmet", () => {
    const plan = nominal1((p) => {
      p.detectors[0]!.maxInputMW = 3;
      p.channels[0]!.requiredNedtK = 17;
    });
    const f = checkChainAtOffset(plan, "A", 184.81);
    expect(find(f, "pd-overload")[0]!.data.pdInputMW).toBeCloseTo(3.48088, 4);
    expect(find(f, "nedt-unmet")[0]!.data.nedtK).toBeCloseTo(17.9227, 3);
  });

  it("dsb-lo-off-centre: a DSB channel with the LO 10 MHz off centre (allowed max(step/2, 0.5 MHz) = 5 MHz)", () => {
    const plan = example1((p) => {
      p.channels[0]!.dsbOffsetGHz = 3;
      p.channels[0]!.bandwidthMHz = 1000;
    });
    expect(find(checkChainAtOffset(plan, "A", 183.31), "dsb-lo-off-centre")).toHaveLength(0);
    const f = find(checkChainAtOffset(plan, "A", 183.32), "dsb-lo-off-centre");
    expect(f).toHaveLength(1);
    expect(f[0]!.data.offsetMHz).toBeCloseTo(10, 6);
  });

  it("slot-overlap: an error, or a warning on a shared IF; one finding per pair naming the first channel", () => {
    const twin = (shared: boolean) =>
      example1((p) => {
        p.chains[0]!.sharedIf = shared;
        p.channels.push({ ...p.channels[0]!, id: "wv2", centerGHz: 183.35 });
      });
    const f = find(checkChainAtOffset(twin(false), "A", 184.81), "slot-overlap");
    expect(f).toHaveLength(1);
    expect(f[0]).toMatchObject({ severity: "error", channel: "wv1", data: { other: "wv2" } });
    expect(find(checkChainAtOffset(twin(true), "A", 184.81), "slot-overlap")[0]!.severity).toBe("warning");
  });
});

describe("checkChainAtOffset: sampled IF and lock rules on example 2 (fs = 8 GHz)", () => {
  it("the plan as written: chain warnings first, then per channel in rules-table order", () => {
    const f = checkChainAtOffset(example2(), "O2", -121);
    expect(f.slice(0, 2).map((x) => x.code)).toEqual(["noise-folding", "lock-inside-mode"]);
    const chans = f.filter((x) => x.channel !== null).map((x) => x.channel);
    const order = ["o2-core", "o2-wing1", "o2-wing2", "o2-far"];
    expect([...chans].sort((a, b) => order.indexOf(a!) - order.indexOf(b!))).toEqual(chans);
    for (const id of order) {
      const ranks = f.filter((x) => x.channel === id).map((x) => RULE_ORDER.indexOf(x.code));
      expect([...ranks].sort((a, b) => a - b)).toEqual(ranks);
    }
    expect(find(f, "lock-replica")).toHaveLength(4);
  });

  it("nyquist-straddle: an occupied band across fs/2 = 4 GHz", () => {
    // o2-core at 118.75 ± 0.2 with the LO 4 GHz away: slot [3.8, 4.2]
    const f = find(checkChainAtOffset(example2(), "O2", -122.75), "nyquist-straddle", "o2-core");
    expect(f).toHaveLength(1);
    expect(f[0]!.data.nyquistEdgeGHz).toBe(4);
  });

  it("alias-overlap: two bands in different zones folding onto each other", () => {
    const plan = example2((p) => {
      p.detectors[0]!.maxGHz = 12;
      p.channels = [
        { ...p.channels[0]!, id: "low", centerGHz: 118.75, bandwidthMHz: 100 },
        { ...p.channels[0]!, id: "high", centerGHz: 112.75, bandwidthMHz: 100 },
      ];
    });
    // L = −120.75: low at IF 2.0 GHz (zone 1); high at IF 7.95–8.05 GHz straddles 2·fs/2 = 8 GHz, so it is left out
    const f = find(checkChainAtOffset(plan, "O2", -120.75), "alias-overlap");
    expect(f).toHaveLength(0);
    expect(find(checkChainAtOffset(plan, "O2", -120.75), "nyquist-straddle", "high")).toHaveLength(1);
    const plan2 = example2((p) => {
      p.detectors[0]!.maxGHz = 12;
      p.channels = [
        { ...p.channels[0]!, id: "low", centerGHz: 118.75, bandwidthMHz: 100 },
        { ...p.channels[0]!, id: "high", centerGHz: 114.75, bandwidthMHz: 100 },
      ];
    });
    // L = −120.75: low → 2.0 GHz (zone 1), high → 6.0 GHz (zone 2, mirrored to 2.0 GHz)
    const g = find(checkChainAtOffset(plan2, "O2", -120.75), "alias-overlap");
    expect(g).toHaveLength(1);
    expect(g[0]).toMatchObject({ channel: "low", data: { other: "high", zone: 1, otherZone: 2 } });
  });
});

describe("checkChainAtOffset on any valid plan", () => {
  it("never throws, gives JSON-safe findings in the order of docs/plan-format.md §4.3, and the map-only mode finds exactly the L-dependent errors (property)", () => {
    fc.assert(
      fc.property(arbitraryPlan(), fc.double({ min: -500, max: 500, noNaN: true }), (plan, L) => {
        for (const chain of plan.chains) {
          for (const at of [chain.loOffsetGHz, L]) {
            const all = checkChainAtOffset(plan, chain.id, at);
            expect(JSON.parse(JSON.stringify(all))).toEqual(all);
            for (const f of all) expect(f.message.length).toBeGreaterThan(10);
            const chainLevel = all.findIndex((f) => f.channel !== null);
            if (chainLevel >= 0) expect(all.slice(chainLevel).every((f) => f.channel !== null)).toBe(true);
            const key = (f: Finding) => `${f.code}|${f.channel}|${JSON.stringify(f.data)}`;
            const expected = all
              .filter((f) => f.severity === "error" && L_DEPENDENT_ERROR_CODES.includes(f.code))
              .map(key);
            const mapOnly = checkChainAtOffset(plan, chain.id, at, { mapOnly: true });
            expect(mapOnly.map(key)).toEqual(expected);
          }
        }
      }),
      { numRuns: 150 },
    );
  }, 60_000);
});
