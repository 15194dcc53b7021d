import type { Lane, LaneItem, LanePlanInput } from "../types";
import { ghz, ghzRange, mhz } from "./format";
import { item } from "./item";
import type { LaneIndex } from "./lane-index";
import { RF_ROWS } from "./rows";

/** Most modes drawn per resonator (a very small FSR would otherwise draw hundreds). */
const MAX_MODES = 64;
/** Modes other than the wanted one are drawn when centred this close to the RF input passband (GHz). */
const MODE_MARGIN_GHz = 20;

/** The RF lane, shared by every chain. */
export function rfLane(): Lane {
  return { id: "rf", kind: "rf", chain: null, title: "RF", rows: 5, axis: "ghz", mirror: 1 };
}

/**
 * The RF lane's items of each chain: its RF input passband, and the
 * resonator's mode passbands (the wanted mode and every other mode centred
 * within `MODE_MARGIN_GHz` of the RF input, at most `MAX_MODES`; a mode
 * shared by two chains of one resonator is drawn per chain).
 */
export function rfChainItems(plan: LanePlanInput, index: LaneIndex, items: LaneItem[]): void {
  const modeSeen = new Set<string>();
  for (const chain of plan.chains) {
    const s = chain.sideband === "upper" ? 1 : -1;
    items.push(
      item({
        id: `rf:input:${chain.id}`,
        lane: "rf",
        kind: "rf-input",
        row: RF_ROWS.input,
        lo: chain.rfInput.minGHz,
        hi: chain.rfInput.maxGHz,
        chain: chain.id,
        label: `RF input of chain ${chain.id}`,
        facts: () => [["passband", ghzRange(chain.rfInput.minGHz, chain.rfInput.maxGHz)]],
      }),
    );
    const res = index.resonatorOf.get(chain.resonator);
    const laser = index.laserOf.get(chain.laser);
    if (!res || !laser) continue;
    const delta = (laser.carrierTHz * 1000) / res.loadedQ;
    const wanted = chain.mode;
    // The wanted mode and every other mode centred within MODE_MARGIN_GHz of the RF input passband.
    const lo = Math.max(1, Math.ceil((chain.rfInput.minGHz - MODE_MARGIN_GHz) / res.fsrGHz));
    const hi = Math.floor((chain.rfInput.maxGHz + MODE_MARGIN_GHz) / res.fsrGHz);
    const ns = new Set<number>([wanted]);
    for (let n = lo; n <= hi && ns.size < MAX_MODES; n++) ns.add(n);
    for (const n of [...ns].sort((a, b) => a - b)) {
      const id = `rf:mode:${chain.resonator}:${s > 0 ? "+" : "-"}${n}:${chain.id}`;
      if (modeSeen.has(id)) continue;
      modeSeen.add(id);
      const centre = n * res.fsrGHz;
      items.push(
        item({
          id,
          lane: "rf",
          kind: "mode-passband",
          row: RF_ROWS.mode,
          lo: centre - delta / 2,
          hi: centre + delta / 2,
          chain: chain.id,
          label: `${n === wanted ? "wanted " : ""}mode ${s * n} of ${res.id} (chain ${chain.id})`,
          codes: n === wanted ? ["wanted"] : [],
          facts: () => [
            ["mode", `n = ${s * n}${n === wanted ? " (wanted)" : ""}`],
            ["centre", `${ghz(centre)} GHz (offset ${ghz(s * centre)} GHz)`],
            ["linewidth δ", mhz(delta)],
            ["passband", ghzRange(centre - delta / 2, centre + delta / 2)],
          ],
        }),
      );
    }
  }
}
