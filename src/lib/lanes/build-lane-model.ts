import { ghz, ghzRange, mhz, num } from "./internals/format";
import { uniqueCodes, worstSeverity } from "./internals/severity";
import type {
  GHzPair,
  Lane,
  LaneFindingInput,
  LaneItem,
  LaneModel,
  LanePlanInput,
  LaneReferenceInput,
  LaneResultInput,
  Severity,
  SpurFamily,
} from "./types";

/** Row of every item kind inside its lane (0 = top). */
export const RF_ROWS = { reference: 0, input: 1, mode: 2, channel: 3, image: 4 } as const;
export const OPTICAL_ROWS = { reach: 0, map: 1, signal: 2, lo: 3 } as const;
export const SPUR_FAMILIES: readonly SpurFamily[] = ["carrier-beat", "lock-lo", "lock-self", "harmonic", "intermod"];
export const IF_ROWS = { detector: 0, slot: 1, spur0: 2 } as const;

/** Most modes drawn per resonator (a very small FSR would otherwise draw hundreds). */
const MAX_MODES = 64;
/** Modes other than the wanted one are drawn when centred this close to the RF input passband (GHz). */
const MODE_MARGIN_GHz = 20;
/** Reference lines and bands are kept within this distance of the plan's own items (GHz). */
const REFERENCE_MARGIN_GHz = 20;

/** What the opening view of the GHz axis frames: the plan's own bands and offsets, not the carrier or far references. */
const FOCUS_KINDS = new Set<LaneItem["kind"]>(["rf-input", "channel-band", "image-band", "reach", "lo", "sideband"]);

type Mutable<T> = { -readonly [K in keyof T]: T[K] };

type ItemInput = Omit<Partial<Mutable<LaneItem>>, "facts"> &
  Pick<LaneItem, "id" | "lane" | "kind" | "row" | "lo" | "hi" | "label"> & { facts?: () => [string, string][] };

/**
 * One item. Its facts (formatted numbers) are only worked out when first
 * read — tooltips, details and the table read a few items, while a live
 * re-check rebuilds thousands of them on every frame. A class keeps every
 * item on one object shape.
 */
class Item implements LaneItem {
  readonly id: string;
  readonly lane: string;
  readonly kind: LaneItem["kind"];
  readonly row: number;
  readonly lo: number;
  readonly hi: number;
  readonly chain: string | null;
  readonly channel: string | null;
  readonly label: string;
  readonly link: string | null;
  readonly family: SpurFamily | null;
  readonly order: number | null;
  readonly codes: readonly string[];
  readonly severity: Severity | null;
  #facts: (() => [string, string][]) | undefined;
  #cached: [string, string][] | null = null;
  constructor(p: ItemInput) {
    this.id = p.id;
    this.lane = p.lane;
    this.kind = p.kind;
    this.row = p.row;
    this.lo = p.lo;
    this.hi = p.hi;
    this.chain = p.chain ?? null;
    this.channel = p.channel ?? null;
    this.label = p.label;
    this.link = p.link ?? null;
    this.family = p.family ?? null;
    this.order = p.order ?? null;
    this.codes = p.codes ?? [];
    this.severity = p.severity ?? null;
    this.#facts = p.facts;
  }
  get facts(): readonly (readonly [string, string])[] {
    this.#cached ??= this.#facts ? this.#facts() : [];
    return this.#cached;
  }
}

function item(p: ItemInput): LaneItem {
  return new Item(p);
}

const sorted = (a: number, b: number): GHzPair => (a <= b ? [a, b] : [b, a]);

/** Severity of a spur family that hits a slot (plan-format.md, spur families table). */
function spurSeverity(family: string, order: number, hits: number): Severity | null {
  if (hits === 0) return null;
  if (family === "harmonic" || family === "intermod") return order <= 3 ? "info" : null;
  return "error";
}

/**
 * Turn a plan and its result document into the lane view's data model: the RF
 * lane (protected bands, line centres, RF input passbands, resonator mode
 * passbands, channel passbands with DSB pairs linked, image bands), one
 * optical-offset lane per receiver chain (reach, feasibility map, carrier,
 * lock sidebands ±m·fm, wanted sidebands, LO with drift) and one IF lane per
 * chain (detector band, Nyquist edges, guard/occupied/slot per channel, spur
 * products by family and order).
 *
 * Optical offsets of a lower-sideband chain are drawn at `s·x` (mirrored) so
 * they line up with the RF frequencies they carry on the shared GHz axis; the
 * facts always give the signed offset.
 */
export function buildLaneModel(
  plan: LanePlanInput,
  result: LaneResultInput,
  reference: LaneReferenceInput = { lines: [], protectedBands: [] },
): LaneModel {
  const items: LaneItem[] = [];
  const lanes: Lane[] = [{ id: "rf", kind: "rf", chain: null, title: "RF", rows: 5, axis: "ghz", mirror: 1 }];
  const guard = plan.settings.guardMHz / 1000;
  const chanResult = new Map(result.channels.map((c) => [c.id, c]));
  const chainResult = new Map(result.chains.map((c) => [c.id, c]));
  const findingsByChannel = new Map<string, LaneFindingInput[]>();
  const findingsByChain = new Map<string, LaneFindingInput[]>();
  for (const f of result.findings) {
    if (f.channel !== null) {
      const list = findingsByChannel.get(f.channel) ?? [];
      list.push(f);
      findingsByChannel.set(f.channel, list);
    } else {
      const list = findingsByChain.get(f.chain) ?? [];
      list.push(f);
      findingsByChain.set(f.chain, list);
    }
  }
  const chainOf = new Map(plan.chains.map((c) => [c.id, c]));
  const laserOf = new Map(plan.lasers.map((l) => [l.id, l]));
  const resonatorOf = new Map(plan.resonators.map((r) => [r.id, r]));
  const detectorOf = new Map(plan.detectors.map((d) => [d.id, d]));

  // ---- RF lane: chain inputs, modes, channels, images ----
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
    const res = resonatorOf.get(chain.resonator);
    const laser = laserOf.get(chain.laser);
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

  for (const ch of plan.channels) {
    const chain = chainOf.get(ch.chain);
    const r = chanResult.get(ch.id);
    const fs = findingsByChannel.get(ch.id) ?? [];
    const B = ch.bandwidthMHz / 1000;
    const d = ch.dsbOffsetGHz ?? null;
    const centres = d === null ? [ch.centerGHz] : [ch.centerGHz - d, ch.centerGHz + d];
    const link = d === null ? null : `dsb:${ch.id}`;
    const common: [string, string][] = [
      ["channel", `${ch.name} (${ch.id})`],
      [
        "NEΔT",
        `${num(r?.nedtK, 3, "K")}${ch.requiredNedtK != null ? ` (required ${ghz(ch.requiredNedtK, 3)} K)` : ""}`,
      ],
      ["IF slot", r?.ifSlotGHz ? ghzRange(r.ifSlotGHz[0], r.ifSlotGHz[1]) : "none"],
    ];
    centres.forEach((c, j) => {
      const facts: [string, string][] = [
        ["passband", ghzRange(c - B / 2, c + B / 2)],
        ["bandwidth", mhz(B)],
        ...(d === null ? [] : ([["double sideband", `${ghz(ch.centerGHz)} ± ${ghz(d)} GHz`]] as [string, string][])),
        ...common,
      ];
      items.push(
        item({
          id: `rf:channel:${ch.id}:${j}`,
          lane: "rf",
          kind: "channel-band",
          row: RF_ROWS.channel,
          lo: c - B / 2,
          hi: c + B / 2,
          chain: ch.chain,
          channel: ch.id,
          link,
          label: d === null ? `channel ${ch.name}` : `channel ${ch.name}, ${j === 0 ? "lower" : "upper"} passband`,
          codes: uniqueCodes(fs),
          severity: worstSeverity(fs),
          facts: () => facts,
        }),
      );
      if (chain) {
        const s = chain.sideband === "upper" ? 1 : -1;
        const x = sorted(s * (c - B / 2), s * (c + B / 2));
        items.push(
          item({
            id: `optical:${chain.id}:sideband:${ch.id}:${j}`,
            lane: `optical:${chain.id}`,
            kind: "sideband",
            row: OPTICAL_ROWS.signal,
            lo: c - B / 2,
            hi: c + B / 2,
            chain: chain.id,
            channel: ch.id,
            link,
            label: `wanted sideband of ${ch.name}${d === null ? "" : j === 0 ? " (lower passband)" : " (upper passband)"}`,
            codes: uniqueCodes(fs.filter((f) => f.code === "lo-in-band")),
            severity: worstSeverity(fs.filter((f) => f.code === "lo-in-band")),
            facts: () => [
              ["optical offset", ghzRange(x[0], x[1])],
              ["RF passband", ghzRange(c - B / 2, c + B / 2)],
            ],
          }),
        );
      }
    });
    const img = r?.imageGHz ?? null;
    if (r && img) {
      const imgF = fs.filter((f) => f.code === "image-response");
      items.push(
        item({
          id: `rf:image:${ch.id}`,
          lane: "rf",
          kind: "image-band",
          row: RF_ROWS.image,
          lo: img[0],
          hi: img[1],
          chain: ch.chain,
          channel: ch.id,
          label: `image of ${ch.name}`,
          codes: uniqueCodes(imgF),
          severity: worstSeverity(imgF),
          facts: () => [
            ["image band", ghzRange(img[0], img[1])],
            ["image rejection", r.imageRejectionDB === null ? "no image response" : num(r.imageRejectionDB, 2, "dB")],
          ],
        }),
      );
    }
  }

  // ---- optical-offset and IF lanes, per chain ----
  for (const chain of plan.chains) {
    const s: 1 | -1 = chain.sideband === "upper" ? 1 : -1;
    const laser = laserOf.get(chain.laser);
    const det = detectorOf.get(chain.detector);
    const cr = chainResult.get(chain.id);
    const oLane = `optical:${chain.id}`;
    const iLane = `if:${chain.id}`;
    const chainFindings = findingsByChain.get(chain.id) ?? [];
    lanes.push({
      id: oLane,
      kind: "optical",
      chain: chain.id,
      title: `Optical offset · chain ${chain.id}${s < 0 ? " (lower sideband, drawn mirrored)" : ""}`,
      rows: 4,
      axis: "ghz",
      mirror: s,
    });
    lanes.push({
      id: iLane,
      kind: "if",
      chain: chain.id,
      title: `IF · chain ${chain.id}`,
      rows: IF_ROWS.spur0 + SPUR_FAMILIES.length,
      axis: "if",
      mirror: 1,
    });
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

    // IF lane
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
        for (let k = 1; k * half <= det.maxGHz + half && k <= 64; k++) {
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
      const r = chanResult.get(ch.id);
      const slot = r?.ifSlotGHz ?? null;
      const occ = r?.occupiedGHz ?? null;
      if (!r || !slot || !occ) continue;
      const fs = findingsByChannel.get(ch.id) ?? [];
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

  // ---- reference table, kept near the plan's RF items ----
  let lo = Infinity;
  let hi = -Infinity;
  for (const it of items) {
    if (it.lane !== "rf") continue;
    lo = Math.min(lo, it.lo);
    hi = Math.max(hi, it.hi);
  }
  if (!Number.isFinite(lo)) [lo, hi] = [0, 400];
  const refLo = lo - REFERENCE_MARGIN_GHz;
  const refHi = hi + REFERENCE_MARGIN_GHz;
  const refItems: LaneItem[] = [];
  reference.protectedBands.forEach((b, k) => {
    if (b.maxGHz < refLo || b.minGHz > refHi) return;
    refItems.push(
      item({
        id: `rf:protected:${k}`,
        lane: "rf",
        kind: "protected-band",
        row: RF_ROWS.reference,
        lo: b.minGHz,
        hi: b.maxGHz,
        label: `protected passive band ${ghz(b.minGHz)}–${ghz(b.maxGHz)} GHz`,
        facts: () => [
          ["band", ghzRange(b.minGHz, b.maxGHz)],
          ["source", b.source],
        ],
      }),
    );
  });
  reference.lines.forEach((l, k) => {
    if (l.centreGHz < refLo || l.centreGHz > refHi) return;
    refItems.push(
      item({
        id: `rf:line:${k}`,
        lane: "rf",
        kind: "line-centre",
        row: RF_ROWS.reference,
        lo: l.centreGHz,
        hi: l.centreGHz,
        label: `${l.label} line`,
        facts: () => [
          ["centre", `${ghz(l.centreGHz)} GHz`],
          ["source", l.source],
        ],
      }),
    );
  });
  const all = [...refItems, ...items];
  let ilo = Infinity;
  let ihi = -Infinity;
  for (const it of all) {
    if (laneAxis(lanes, it.lane) === "ghz") {
      lo = Math.min(lo, it.lo);
      hi = Math.max(hi, it.hi);
    } else {
      ilo = Math.min(ilo, it.lo);
      ihi = Math.max(ihi, it.hi);
    }
  }
  if (!Number.isFinite(ilo)) [ilo, ihi] = [0, 1];
  let flo = Infinity;
  let fhi = -Infinity;
  for (const it of items) {
    if (!FOCUS_KINDS.has(it.kind)) continue;
    flo = Math.min(flo, it.lo);
    fhi = Math.max(fhi, it.hi);
  }
  if (!Number.isFinite(flo)) [flo, fhi] = [lo, hi];
  return { lanes, items: all, extentGHz: [lo, hi], focusGHz: [flo, fhi], extentIF: [Math.min(0, ilo), ihi] };
}

function laneAxis(lanes: readonly Lane[], id: string): "ghz" | "if" {
  return id.startsWith("if:") ? "if" : (lanes.find((l) => l.id === id)?.axis ?? "ghz");
}
