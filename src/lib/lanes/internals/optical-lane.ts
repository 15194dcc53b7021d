import type { Lane, LaneItem, LanePlanInput } from "../types";
import { ghz, ghzRange, mhz } from "./format";
import { item, sorted } from "./item";
import type { LaneIndex } from "./lane-index";
import { OPTICAL_ROWS } from "./rows";
import { uniqueCodes, worstSeverity } from "./severity";

type Chain = LanePlanInput["chains"][number];

/** The optical-offset lane of a chain (mirrored for a lower-sideband chain). */
export function opticalLane(chain: Chain): Lane {
  const s: 1 | -1 = chain.sideband === "upper" ? 1 : -1;
  return {
    id: `optical:${chain.id}`,
    kind: "optical",
    chain: chain.id,
    title: `Optical offset · chain ${chain.id}${s < 0 ? " (lower sideband, drawn mirrored)" : ""}`,
    rows: 4,
    axis: "ghz",
    mirror: s,
  };
}

/**
 * The optical-offset lane's own items of a chain (its wanted sidebands
 * come with the channels): the laser pair's reach, the feasibility map
 * (feasible and blocked intervals), the carrier, the lock sidebands ±m·fm
 * and the LO with its drift. Offsets are drawn at `s·x`.
 */
export function opticalItems(chain: Chain, index: LaneIndex, items: LaneItem[]): void {
  const s: 1 | -1 = chain.sideband === "upper" ? 1 : -1;
  const laser = index.laserOf.get(chain.laser);
  const cr = index.chainResult.get(chain.id);
  const oLane = `optical:${chain.id}`;
  const chainFindings = index.findingsByChain.get(chain.id) ?? [];
  const disp = (x0: number, x1: number) => sorted(s * x0, s * x1);
  const D = (laser?.driftMHz ?? 0) / 1000;

  laser?.reach.forEach((rg, k) => {
    const [lo, hi] = disp(rg.minGHz, rg.maxGHz);
    items.push(
      item({
        id: `${oLane}:reach:${k}`,
        lane: oLane,
        kind: "reach",
        row: OPTICAL_ROWS.reach,
        lo,
        hi,
        chain: chain.id,
        label: `reach of laser pair ${laser.id}`,
        facts: () => [["offsets", ghzRange(rg.minGHz, rg.maxGHz)]],
      }),
    );
  });
  cr?.feasibleGHz.forEach(([a, b], k) => {
    const [lo, hi] = disp(a, b);
    items.push(
      item({
        id: `${oLane}:feasible:${k}`,
        lane: oLane,
        kind: "feasible",
        row: OPTICAL_ROWS.map,
        lo,
        hi,
        chain: chain.id,
        label: `feasible LO offsets`,
        facts: () => [
          ["offsets", ghzRange(a, b)],
          ["width", mhz(b - a)],
        ],
      }),
    );
  });
  cr?.excludedGHz.forEach((ex, k) => {
    const [lo, hi] = disp(ex.bandGHz[0], ex.bandGHz[1]);
    items.push(
      item({
        id: `${oLane}:blocked:${k}`,
        lane: oLane,
        kind: "blocked",
        row: OPTICAL_ROWS.map,
        lo,
        hi,
        chain: chain.id,
        label: `blocked LO offsets (${ex.codes.join(", ")})`,
        codes: ex.codes,
        severity: "error",
        facts: () => [
          ["offsets", ghzRange(ex.bandGHz[0], ex.bandGHz[1])],
          ["width", mhz(ex.bandGHz[1] - ex.bandGHz[0])],
          ["blocked by", ex.codes.join(", ")],
        ],
      }),
    );
  });
  items.push(
    item({
      id: `${oLane}:carrier`,
      lane: oLane,
      kind: "carrier",
      row: OPTICAL_ROWS.signal,
      lo: 0,
      hi: 0,
      chain: chain.id,
      label: `carrier (laser 1) of chain ${chain.id}`,
      facts: () => [
        ["carrier", laser ? `${ghz(laser.carrierTHz, 6)} THz` : "—"],
        ["offset", "0 GHz"],
      ],
    }),
  );
  if (laser) {
    const fm = laser.lock.modulationMHz / 1000;
    for (let m = 1; m <= laser.lock.orders; m++) {
      for (const sign of [-1, 1] as const) {
        const x = sign * m * fm;
        items.push(
          item({
            id: `${oLane}:lock:${sign > 0 ? "+" : "-"}${m}`,
            lane: oLane,
            kind: "lock-sideband",
            row: OPTICAL_ROWS.signal,
            lo: s * x,
            hi: s * x,
            chain: chain.id,
            order: m,
            label: `lock sideband ${sign > 0 ? "+" : "−"}${m}·fm`,
            facts: () => [
              ["offset", `${ghz(x)} GHz`],
              ["fm", mhz(fm)],
              ["order", String(m)],
            ],
          }),
        );
      }
    }
  }
  const L = chain.loOffsetGHz;
  const blockedHere = cr?.excludedGHz.filter((e) => L >= e.bandGHz[0] && L <= e.bandGHz[1]) ?? [];
  const loFindings = chainFindings.filter((f) => f.code === "lo-uncovered" || f.code === "lo-off-step");
  const loCodes = uniqueCodes([...loFindings, ...blockedHere.flatMap((e) => e.codes.map((code) => ({ code })))]);
  const feasibleHere = cr?.feasibleGHz.some(([a, b]) => L >= a && L <= b) ?? false;
  items.push(
    item({
      id: `${oLane}:lo`,
      lane: oLane,
      kind: "lo",
      row: OPTICAL_ROWS.lo,
      lo: s * L,
      hi: s * L,
      chain: chain.id,
      label: `LO (laser 2) of chain ${chain.id}`,
      codes: loCodes,
      severity: blockedHere.length > 0 ? "error" : worstSeverity(loFindings),
      facts: () => [
        ["LO offset", `${ghz(L)} GHz`],
        ["drift", `± ${mhz(D)}`],
        [
          "feasibility map",
          feasibleHere
            ? "inside a feasible interval"
            : blockedHere.length
              ? `blocked by ${loCodes.join(", ")}`
              : "outside the feasible set",
        ],
        ["place", cr?.placeGHz == null ? `none (${cr?.placeReason ?? "no result"})` : `${ghz(cr.placeGHz)} GHz`],
      ],
    }),
  );
}
