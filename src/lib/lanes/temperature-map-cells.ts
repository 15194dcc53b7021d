import type { TemperatureMap } from "@/lib/plan";

/** What a cell of the chain's temperature chart means. */
export type TemperatureCellState =
  /** Every error rule holds at these LO offsets at this temperature (for every LO shift within ±D). */
  | "feasible"
  /** An LO-dependent map rule excludes these offsets at this temperature. */
  | "excluded"
  /** A temperature rule (`mode-detuned`, `centre-drift`) fails at this temperature, whatever the LO. */
  | "temperature";

export interface TemperatureCell {
  /** LO offsets covered (GHz). */
  readonly loGHz: readonly [number, number];
  /** Temperature offsets covered (K): the row's value ± half the row spacing, within the map's span. */
  readonly temperatureK: readonly [number, number];
  readonly state: TemperatureCellState;
  readonly codes: readonly string[];
}

export interface TemperatureCells {
  readonly cells: readonly TemperatureCell[];
  /** The chart's x range: the hull of the laser pair's reach (GHz). */
  readonly loDomain: readonly [number, number];
  /** The chart's y range (K). */
  readonly temperatureDomain: readonly [number, number];
  /** The rows' temperature offsets at which the LO `atGHz` passes (the sampled view of the window). */
  readonly passingRowsK: readonly number[];
}

/**
 * The cells of the chain-level chart of the feasibility map over LO offset
 * (x) and resonator temperature offset (y) (docs/decisions/029): each row of
 * `temperatureMap` becomes a strip of height equal to the row spacing,
 * cut into its feasible and excluded intervals; at a temperature where a
 * rule that does not depend on the LO fails, the whole strip is marked
 * `temperature` (no LO passes there). `atGHz` (the chain's LO) is looked up
 * in every row to list the rows where it passes.
 */
export function temperatureMapCells(map: TemperatureMap, atGHz: number): TemperatureCells {
  const ts = map.rows.map((r) => r.temperatureOffsetK);
  const temperatureDomain: [number, number] = ts.length ? [ts[0]!, ts.at(-1)!] : [-1, 1];
  const reachLo = Math.min(...map.reachGHz.map((r) => r[0]));
  const reachHi = Math.max(...map.reachGHz.map((r) => r[1]));
  const loDomain: [number, number] = Number.isFinite(reachLo) && reachHi > reachLo ? [reachLo, reachHi] : [0, 1];
  const cells: TemperatureCell[] = [];
  const passingRowsK: number[] = [];
  map.rows.forEach((row, i) => {
    const t = row.temperatureOffsetK;
    const below = i > 0 ? (t + ts[i - 1]!) / 2 : temperatureDomain[0];
    const above = i < ts.length - 1 ? (t + ts[i + 1]!) / 2 : temperatureDomain[1];
    const band: [number, number] = [below, above];
    const blockedByTemperature = row.temperatureCodes.length > 0;
    for (const f of row.feasibleGHz)
      cells.push({
        loGHz: f,
        temperatureK: band,
        state: blockedByTemperature ? "temperature" : "feasible",
        codes: row.temperatureCodes,
      });
    for (const e of row.excludedGHz)
      cells.push({
        loGHz: e.bandGHz,
        temperatureK: band,
        state: blockedByTemperature ? "temperature" : "excluded",
        codes: blockedByTemperature ? [...row.temperatureCodes, ...e.codes] : e.codes,
      });
    if (!blockedByTemperature && row.feasibleGHz.some(([a, b]) => atGHz >= a && atGHz <= b)) passingRowsK.push(t);
  });
  return { cells, loDomain, temperatureDomain, passingRowsK };
}
