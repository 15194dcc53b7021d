import { buildLaneModel } from "./build-lane-model";
import { referenceItems, rfHull } from "./internals/reference-items";
import { rfLane } from "./internals/rf-lane";
import type { Lane, LaneItem, LaneModel, LanePlanInput, LaneReferenceInput, LaneResultInput } from "./types";

/** What one chain's part of the model was built from, compared by identity. */
interface ChainPart {
  readonly inputs: readonly unknown[];
  readonly model: LaneModel;
}

export interface LaneModelParts {
  readonly reference: { readonly inputs: readonly unknown[]; readonly items: readonly LaneItem[] } | null;
  readonly chains: ReadonlyMap<string, ChainPart>;
}

function sameInputs(a: readonly unknown[], b: readonly unknown[]): boolean {
  if (a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return false;
  return true;
}

/**
 * The lane model built chain by chain, reusing the part of every chain whose
 * inputs (its chain, laser, resonator, detector, channels and its entries of
 * the result) are the same objects as in `previous`. A live re-check moves
 * one chain, so only that chain's items are rebuilt. Gives the same items
 * as `buildLaneModel` (tested), grouped by chain.
 */
export function laneModelByChain(
  plan: LanePlanInput,
  result: LaneResultInput,
  reference: LaneReferenceInput,
  previous: LaneModelParts | null = null,
): { model: LaneModel; parts: LaneModelParts } {
  const chains = new Map<string, ChainPart>();
  const lanes: Lane[] = [];
  const chainItems: LaneItem[] = [];
  for (const chain of plan.chains) {
    const laser = plan.lasers.find((l) => l.id === chain.laser);
    const res = plan.resonators.find((r) => r.id === chain.resonator);
    const det = plan.detectors.find((d) => d.id === chain.detector);
    const channels = plan.channels.filter((c) => c.chain === chain.id);
    const ids = new Set(channels.map((c) => c.id));
    const sub: LaneResultInput = {
      chains: result.chains.filter((c) => c.id === chain.id),
      channels: result.channels.filter((c) => ids.has(c.id)),
      spurs: result.spurs.filter((s) => s.chain === chain.id),
      findings: result.findings.filter((f) => f.chain === chain.id),
    };
    const inputs = [
      plan.settings,
      chain,
      laser,
      res,
      det,
      ...channels,
      ...sub.chains,
      ...sub.channels,
      ...sub.spurs,
      ...sub.findings,
    ];
    const old = previous?.chains.get(chain.id);
    const part =
      old && sameInputs(old.inputs, inputs)
        ? old
        : {
            inputs,
            model: buildLaneModel(
              {
                settings: plan.settings,
                lasers: laser ? [laser] : [],
                resonators: res ? [res] : [],
                detectors: det ? [det] : [],
                chains: [chain],
                channels,
              },
              sub,
            ),
          };
    chains.set(chain.id, part);
    for (const l of part.model.lanes) if (!lanes.some((x) => x.id === l.id)) lanes.push(l);
    chainItems.push(...part.model.items);
  }
  // Which reference bands and lines are drawn depends on the hull of every
  // chain's RF items (image bands move with the LO), as in buildLaneModel.
  const rf = rfHull(chainItems);
  const refInputs = [reference, rf[0], rf[1]];
  const reference_ =
    previous?.reference && sameInputs(previous.reference.inputs, refInputs)
      ? previous.reference
      : { inputs: refInputs, items: referenceItems(reference, rf) };
  const items: LaneItem[] = [...reference_.items, ...chainItems];
  if (lanes.length === 0 || lanes[0]?.id !== "rf") lanes.unshift(rfLane());
  let lo = Infinity;
  let hi = -Infinity;
  let flo = Infinity;
  let fhi = -Infinity;
  let ilo = 0;
  let ihi = -Infinity;
  for (const it of reference_.items) {
    lo = Math.min(lo, it.lo);
    hi = Math.max(hi, it.hi);
  }
  for (const part of chains.values()) {
    const m = part.model;
    lo = Math.min(lo, m.extentGHz[0]);
    hi = Math.max(hi, m.extentGHz[1]);
    flo = Math.min(flo, m.focusGHz[0]);
    fhi = Math.max(fhi, m.focusGHz[1]);
    ilo = Math.min(ilo, m.extentIF[0]);
    ihi = Math.max(ihi, m.extentIF[1]);
  }
  if (!Number.isFinite(lo)) [lo, hi] = [0, 400];
  if (!Number.isFinite(flo)) [flo, fhi] = [lo, hi];
  if (!Number.isFinite(ihi)) ihi = 1;
  return {
    model: { lanes, items, extentGHz: [lo, hi], focusGHz: [flo, fhi], extentIF: [ilo, ihi] },
    parts: { reference: reference_, chains },
  };
}
