import { SPUR_FAMILIES, type SpurFamily } from "@/lib/plan";
import type { Lane, LaneItem, LanePlanInput, LaneResultInput, Severity } from "../types";
import { ghz, ghzRange, mhz, num } from "./format";
import { item } from "./item";
import type { LaneIndex } from "./lane-index";
import { IF_LANE_ROWS, IF_ROWS } from "./rows";
import { uniqueCodes, worstSeverity } from "./severity";

type Chain = LanePlanInput["chains"][number];

/** Most Nyquist edges drawn per IF lane. */
const MAX_NYQUIST_EDGES = 64;

/** The IF lane of a chain. */
export function ifLane(chain: Chain): Lane {
  return {
    id: `if:${chain.id}`,
    kind: "if",
    chain: chain.id,
    title: `IF · chain ${chain.id}`,
    rows: IF_LANE_ROWS,
    axis: "if",
    mirror: 1,
  };
}

/** Severity of a spur family that hits a slot (docs/plan-format.md §5.1 "Families"). */
function spurSeverity(family: string, order: number, hits: number): Severity | null {
  if (hits === 0) return null;
  if (family === "harmonic" || family === "intermod") return order <= 3 ? "info" : null;
  return "error";
}

/**
 * The IF lane's items of a chain: the detector band and its Nyquist edges
 * k·fs/2, per channel with a slot its guard, occupied band and IF slot, and
 * every spur of the chain on the row of its family.
 */
export function ifItems(
  plan: LanePlanInput,
  result: LaneResultInput,
  chain: Chain,
  index: LaneIndex,
  items: LaneItem[],
): void {
  const guard = plan.settings.guardMHz / 1000;
  const laser = index.laserOf.get(chain.laser);
  const det = index.detectorOf.get(chain.detector);
  const iLane = `if:${chain.id}`;
  const D = (laser?.driftMHz ?? 0) / 1000;
  if (det) {
    items.push(
      item({
        id: `${iLane}:detector`,
        lane: iLane,
        kind: "detector-band",
        row: IF_ROWS.detector,
        lo: det.minGHz,
        hi: det.maxGHz,
        chain: chain.id,
        label: `detector ${det.id} usable band`,
        facts: () => [["band", ghzRange(det.minGHz, det.maxGHz)]],
      }),
    );
    const fsr = det.sampleRateGHz ?? null;
    if (fsr !== null && fsr > 0) {
      const half = fsr / 2;
      for (let k = 1; k * half <= det.maxGHz + half && k <= MAX_NYQUIST_EDGES; k++) {
        items.push(
          item({
            id: `${iLane}:nyquist:${k}`,
            lane: iLane,
            kind: "nyquist-edge",
            row: IF_ROWS.detector,
            lo: k * half,
            hi: k * half,
            chain: chain.id,
            order: k,
            label: `Nyquist edge ${k}·fs/2`,
            facts: () => [
              ["frequency", `${ghz(k * half)} GHz`],
              ["sample rate", `${ghz(fsr)} GHz`],
            ],
          }),
        );
      }
    }
  }
  for (const ch of plan.channels) {
    if (ch.chain !== chain.id) continue;
    const r = index.chanResult.get(ch.id);
    const slot = r?.ifSlotGHz ?? null;
    const occ = r?.occupiedGHz ?? null;
    if (!r || !slot || !occ) continue;
    const fs = index.findingsByChannel.get(ch.id) ?? [];
    const codes = uniqueCodes(fs);
    const sev = worstSeverity(fs);
    const [g0, g1] = [occ[0] - guard, occ[1] + guard];
    items.push(
      item({
        id: `${iLane}:guard:${ch.id}`,
        lane: iLane,
        kind: "guard",
        row: IF_ROWS.slot,
        lo: g0,
        hi: g1,
        chain: chain.id,
        channel: ch.id,
        label: `guard band of ${ch.name}`,
        facts: () => [
          ["occupied ± guard", ghzRange(g0, g1)],
          ["guard", mhz(guard)],
        ],
      }),
      item({
        id: `${iLane}:occupied:${ch.id}`,
        lane: iLane,
        kind: "occupied",
        row: IF_ROWS.slot,
        lo: occ[0],
        hi: occ[1],
        chain: chain.id,
        channel: ch.id,
        label: `occupied band of ${ch.name} (slot ± drift)`,
        facts: () => [
          ["occupied", ghzRange(occ[0], occ[1])],
          ["drift", `± ${mhz(D)}`],
        ],
      }),
      item({
        id: `${iLane}:slot:${ch.id}`,
        lane: iLane,
        kind: "if-slot",
        row: IF_ROWS.slot,
        lo: slot[0],
        hi: slot[1],
        chain: chain.id,
        channel: ch.id,
        label: `IF slot of ${ch.name}`,
        codes,
        severity: sev,
        facts: () => [
          ["IF slot", ghzRange(slot[0], slot[1])],
          ["occupied", ghzRange(occ[0], occ[1])],
          ["NEΔT", num(r.nedtK, 3, "K")],
          ["image rejection", r.imageRejectionDB === null ? "—" : num(r.imageRejectionDB, 2, "dB")],
          ["lock replica", num(r.lockReplicaDB, 2, "dB")],
        ],
      }),
    );
  }
  let k = 0;
  for (const sp of result.spurs) {
    if (sp.chain !== chain.id) continue;
    const fi = SPUR_FAMILIES.indexOf(sp.family as SpurFamily);
    const family = fi >= 0 ? (SPUR_FAMILIES[fi] as SpurFamily) : null;
    items.push(
      item({
        id: `${iLane}:spur:${k++}`,
        lane: iLane,
        kind: "spur",
        row: IF_ROWS.spur0 + (fi >= 0 ? fi : SPUR_FAMILIES.length - 1),
        lo: sp.bandGHz[0],
        hi: sp.bandGHz[1],
        chain: chain.id,
        family,
        order: sp.order,
        label: `${sp.family} spur ${sp.source}, order ${sp.order}`,
        codes: sp.hits.length ? ["spur-in-slot"] : [],
        severity: spurSeverity(sp.family, sp.order, sp.hits.length),
        facts: () => [
          ["band", ghzRange(sp.bandGHz[0], sp.bandGHz[1])],
          ["family", sp.family],
          ["order", String(sp.order)],
          ["source", sp.source],
          ["hits", sp.hits.length ? sp.hits.join(", ") : "none"],
        ],
      }),
    );
  }
}
