import type { LaneItem, LanePlanInput } from "../types";
import { ghz, ghzRange, mhz, num } from "./format";
import { item, sorted } from "./item";
import type { LaneIndex } from "./lane-index";
import { OPTICAL_ROWS, RF_ROWS } from "./rows";
import { uniqueCodes, worstSeverity } from "./severity";

/**
 * The items of each channel, in plan order: per passband (two for a DSB
 * channel, linked) the RF passband and the wanted sideband on its chain's
 * optical lane, then the image band on the RF lane when the result has one.
 */
export function channelItems(plan: LanePlanInput, index: LaneIndex, items: LaneItem[]): void {
  for (const ch of plan.channels) {
    const chain = index.chainOf.get(ch.chain);
    const r = index.chanResult.get(ch.id);
    const fs = index.findingsByChannel.get(ch.id) ?? [];
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
}
