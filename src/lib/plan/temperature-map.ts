import type { Plan } from "@/schemas/plan";
import { chainContext } from "./internals/chain-context";
import { centreWorst, modeWorst } from "./internals/channel-envelope";
import { envelopeBox } from "./internals/envelope-box";
import { buildMapModel, codesOfMask } from "./internals/map-model";
import { mapPieces } from "./internals/map-sweep";
import { TOL } from "./internals/tolerance";
import type { FindingCode } from "./types";

/** Feasible intervals shorter than this (GHz, 1 kHz) are not listed (as in the feasibility map). */
const MIN_FEASIBLE_GHZ = 1e-6;

export interface TemperatureMapOptions {
  /** Number of temperature rows, evenly spaced, ends included (at least 2; default 21). */
  rows?: number;
  /** Half-width of the temperature range (K): by default twice the chain's excursion, and at least 1 K. */
  spanK?: number;
}

export interface TemperatureMapRow {
  /** The row's resonator temperature offset t (K). */
  temperatureOffsetK: number;
  /** The feasibility map with the resonator at t and the LO shifted anywhere within ±D: feasible intervals (GHz). */
  feasibleGHz: [number, number][];
  /** The rest of the reach, with the map codes that fire (rules-table order). */
  excludedGHz: { bandGHz: [number, number]; codes: FindingCode[] }[];
  /**
   * Error codes that depend on the temperature but not on the LO offset and
   * fire at t for some channel (`mode-detuned`, `centre-drift`): where they
   * fire, no LO offset passes.
   */
  temperatureCodes: FindingCode[];
}

export interface TemperatureMap {
  chainId: string;
  /** The chain's temperature excursion ±Te (K). */
  excursionK: number;
  /** The laser pair's merged reach (GHz): the map's x range. */
  reachGHz: [number, number][];
  rows: TemperatureMapRow[];
}

/**
 * The feasibility map of a chain over LO offset (x) and resonator
 * temperature offset (y), for the chain-level chart (docs/plan-format.md
 * §12.6): each row is the exact feasibility map (§6) with the resonator at
 * one temperature offset t (every comb mode at `n·(fsr + t·φ)`) and the LO
 * anywhere within ±D of each offset, so the engineer sees how far the
 * temperature may wander before the plan's LO, or any LO, fails. Throws
 * when the chain does not exist.
 */
export function temperatureMap(plan: Plan, chainId: string, options: TemperatureMapOptions = {}): TemperatureMap {
  const ctx = chainContext(plan, chainId);
  const n = Math.max(2, Math.round(options.rows ?? 21));
  const span = options.spanK !== undefined && options.spanK > 0 ? options.spanK : Math.max(2 * ctx.Te, 1);
  const rows: TemperatureMapRow[] = [];
  for (let i = 0; i < n; i++) {
    const t = -span + (2 * span * i) / (n - 1) + 0;
    const pieces = mapPieces(buildMapModel(plan, chainId, t));
    const feasibleGHz: [number, number][] = [];
    const excludedGHz: TemperatureMapRow["excludedGHz"] = [];
    for (const p of pieces) {
      if (p.mask === 0) {
        if (p.hi - p.lo > MIN_FEASIBLE_GHZ) feasibleGHz.push([p.lo, p.hi]);
      } else excludedGHz.push({ bandGHz: [p.lo, p.hi], codes: codesOfMask(p.mask) });
    }
    const box = envelopeBox(ctx.D, t, t, ctx.phi, ctx.nStar);
    const codes = new Set<FindingCode>();
    for (const ch of ctx.channels) {
      if (modeWorst(ctx, ch, box).detunedCentres.length > 0) codes.add("mode-detuned");
      const tol = ch.centreToleranceGHz;
      if (tol !== null && centreWorst(ctx, ch, box).error > tol + TOL) codes.add("centre-drift");
    }
    const temperatureCodes = (["mode-detuned", "centre-drift"] as const).filter((c) => codes.has(c));
    rows.push({ temperatureOffsetK: t, feasibleGHz, excludedGHz, temperatureCodes });
  }
  return { chainId, excursionK: ctx.Te, reachGHz: ctx.reach.map((r) => [r[0], r[1]]), rows };
}
