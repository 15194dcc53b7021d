import { OpticalFrequency } from "@/components/tools";
import { placeReasonText } from "@/lib/plan";
import type { Chain, Detector, Laser, PlanResult, Resonator } from "@/queries/types";
import { formatGHz, formatInterval, formatMHz, formatNumber } from "../format";
import { loTHz } from "../hardware";
import { Section, td, th } from "./section";

/** The report's receiver chains: hardware, mode and sideband, LO with its optical frequencies, and the chain results. */
export function ChainsSection({
  chains,
  lasers,
  resonators,
  detectors,
  result,
}: {
  chains: Chain[];
  lasers: Laser[] | undefined;
  resonators: Resonator[] | undefined;
  detectors: Detector[] | undefined;
  result: PlanResult | null | undefined;
}) {
  const keyOf = (rows: { id: string; key: string }[] | undefined, id: string) =>
    rows?.find((r) => r.id === id)?.key ?? "?";
  return (
    <Section title="Receiver chains">
      <table className="w-full border-collapse">
        <thead>
          <tr>
            <th className={th}>Chain</th>
            <th className={th}>Hardware</th>
            <th className={th}>Mode, sideband</th>
            <th className={th}>LO offset (GHz)</th>
            <th className={th}>RF input (GHz)</th>
            <th className={th}>Linewidth (MHz)</th>
            <th className={th}>Per-photodiode input (mW)</th>
            <th className={th}>Feasible LO offsets (GHz)</th>
            <th className={th}>Suggested LO (GHz)</th>
            <th className={th}>Temperature control (K)</th>
            <th className={th}>Temperature window (K)</th>
            <th className={th}>Margin (K)</th>
          </tr>
        </thead>
        <tbody>
          {chains.map((c) => {
            const r = result?.chains.find((x) => x.id === c.key);
            return (
              <tr key={c.id}>
                <td className={td}>{c.key}</td>
                <td className={td}>
                  {keyOf(lasers, c.laserId)} · {keyOf(resonators, c.resonatorId)} · {keyOf(detectors, c.detectorId)}
                </td>
                <td className={td}>
                  k = {c.mode}, {c.sideband}
                  <SidebandOptical
                    carrierTHz={lasers?.find((l) => l.id === c.laserId)?.carrierTHz}
                    fsrGHz={resonators?.find((x) => x.id === c.resonatorId)?.fsrGHz}
                    signedMode={(c.sideband === "upper" ? 1 : -1) * c.mode}
                  />
                </td>
                <td className={td}>
                  {formatGHz(c.loOffsetGHz)}
                  <LoOptical
                    carrierTHz={lasers?.find((l) => l.id === c.laserId)?.carrierTHz}
                    loOffsetGHz={c.loOffsetGHz}
                  />
                </td>
                <td className={td}>{formatInterval([c.rfInput.minGHz, c.rfInput.maxGHz], "")}</td>
                <td className={td}>{formatMHz(r?.linewidthMHz, 2)}</td>
                <td className={td}>{formatNumber(r?.pdInputMW, 3)}</td>
                <td className={td}>
                  {r
                    ? r.feasibleGHz.length
                      ? r.feasibleGHz.map((iv) => formatInterval(iv, "")).join(", ")
                      : "none"
                    : "–"}
                </td>
                <td className={td}>
                  {r
                    ? r.placeGHz === null
                      ? `none: ${placeReasonText(r.placeReason) ?? ""}`
                      : formatGHz(r.placeGHz)
                    : "–"}
                </td>
                <td className={td}>±{formatNumber(c.temperatureExcursionK, 3)}</td>
                <td className={td} data-testid={`report-window-${c.key}`}>
                  {r
                    ? r.temperatureWindowK.length
                      ? r.temperatureWindowK.map((iv) => formatInterval(iv, "")).join(", ")
                      : "none"
                    : "–"}
                </td>
                <td className={`${td} ${r && (r.temperatureMarginK ?? -1) < 0 ? "font-semibold text-sev-error" : ""}`}>
                  {r ? (r.temperatureMarginK === null ? "–" : formatNumber(r.temperatureMarginK, 3)) : "–"}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </Section>
  );
}

/** Laser 2 as an optical frequency (carrier + LO offset), when the carrier is known. */
function LoOptical({ carrierTHz, loOffsetGHz }: { carrierTHz: number | undefined; loOffsetGHz: number }) {
  if (carrierTHz === undefined) return null;
  return (
    <span className="block text-xs">
      LO <OpticalFrequency thz={loTHz(carrierTHz, loOffsetGHz)} />
    </span>
  );
}

/** The wanted sideband's resonator mode as an optical frequency (carrier ± k × FSR), when both are known. */
function SidebandOptical({
  carrierTHz,
  fsrGHz,
  signedMode,
}: {
  carrierTHz: number | undefined;
  fsrGHz: number | undefined;
  signedMode: number;
}) {
  if (carrierTHz === undefined || fsrGHz === undefined) return null;
  return (
    <span className="block text-xs">
      mode <OpticalFrequency thz={loTHz(carrierTHz, signedMode * fsrGHz)} />
    </span>
  );
}
