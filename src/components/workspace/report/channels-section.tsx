import type { ChannelRow } from "../channel-rows";
import { formatDB, formatInterval, formatK, formatMHz, formatNumber } from "../format";
import { SENSITIVITY_TEXT } from "../ui";
import { Section, td, th } from "./section";

/** The report's channels: RF bands, IF slot, image, radiometric bandwidth, NEΔT against its requirement, worst finding. */
export function ChannelsSection({ rows }: { rows: ChannelRow[] }) {
  const unmet = rows.filter((r) => r.nedt.state === "unmet").length;
  const withReq = rows.filter((r) => r.nedt.state === "met" || r.nedt.state === "unmet").length;
  return (
    <Section title="Channels and NEΔT">
      <p className="mb-1 text-xs">
        {withReq} channels with an NEΔT requirement, {unmet} not met. {SENSITIVITY_TEXT}
      </p>
      <table className="w-full border-collapse">
        <thead>
          <tr>
            <th className={th}>Channel</th>
            <th className={th}>Chain</th>
            <th className={th}>RF band (GHz)</th>
            <th className={th}>SSB/DSB</th>
            <th className={th}>IF slot (GHz)</th>
            <th className={th}>Image (GHz)</th>
            <th className={th}>Image rejection (dB)</th>
            <th className={th}>Radiometric BW (MHz)</th>
            <th className={th}>τ (ms)</th>
            <th className={th}>NEΔT (K)</th>
            <th className={th}>Required (K)</th>
            <th className={th}>Worst finding</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((r) => (
            <tr key={r.channel.id}>
              <td className={td}>
                <strong>{r.channel.key}</strong> {r.channel.name}
              </td>
              <td className={td}>{r.chainKey}</td>
              <td className={td}>{r.bandsGHz.map((b) => formatInterval(b, "")).join(" + ")}</td>
              <td className={td}>{r.sideband}</td>
              <td className={td}>{r.result?.ifSlotGHz ? formatInterval(r.result.ifSlotGHz, "") : "no slot"}</td>
              <td className={td}>{r.result?.imageGHz ? formatInterval(r.result.imageGHz, "") : "–"}</td>
              <td className={td}>
                {r.result?.imageGHz
                  ? r.result.imageRejectionDB === null
                    ? "full"
                    : formatDB(r.result.imageRejectionDB)
                  : "–"}
              </td>
              <td className={td}>{formatMHz(r.result?.radiometricBandwidthMHz, 2)}</td>
              <td className={td}>{formatNumber(r.channel.integrationMs, 1)}</td>
              <td className={`${td} ${r.nedt.state === "unmet" ? "font-semibold text-sev-error" : ""}`}>
                {formatK(r.result?.nedtK)}
              </td>
              <td className={td}>{r.channel.requiredNedtK === null ? "–" : formatK(r.channel.requiredNedtK)}</td>
              <td className={td}>{r.worst ? `${r.worst.severity}: ${r.worst.code}` : "none"}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </Section>
  );
}
