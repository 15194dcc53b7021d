import type { EnvelopePoint } from "@/lib/plan";
import type { ChannelRow } from "../channel-rows";
import { formatDB, formatK, formatMHz, formatNumber } from "../format";
import { Section, td, th } from "./section";

/** Where a worst value occurs: "u = 20 MHz, t = −1 K". */
export function atText(at: EnvelopePoint | null | undefined): string {
  if (!at) return "";
  const n = (v: number) => formatNumber(v, 3).replace("-", "−");
  return `u ${n(at.loShiftMHz)} MHz, t ${n(at.temperatureOffsetK)} K`;
}

/**
 * The report's channels over the operating envelope (docs/decisions/029):
 * each figure nominal and worst side by side, with where the worst occurs,
 * the IF filter and the centre error against its tolerance.
 */
export function EnvelopeSection({ rows }: { rows: ChannelRow[] }) {
  return (
    <Section title="Channels over the operating envelope: nominal and worst">
      <p className="mb-1 text-xs">
        Worst values are taken over every LO shift u within the laser pair&apos;s drift ±D and every resonator
        temperature offset t within the chain&apos;s temperature control ±Te, with the IF filter fixed where the nominal
        plan puts it.
      </p>
      <table className="w-full border-collapse" data-testid="report-envelope">
        <thead>
          <tr>
            <th className={th}>Channel</th>
            <th className={th}>IF filter</th>
            <th className={th}>NEΔT nominal (K)</th>
            <th className={th}>NEΔT worst (K)</th>
            <th className={th}>Required (K)</th>
            <th className={th}>Radiometric BW nominal / worst (MHz)</th>
            <th className={th}>Image rejection nominal / worst (dB)</th>
            <th className={th}>Mode response worst</th>
            <th className={th}>Centre error (MHz) / tolerance</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((r) => {
            const e = r.result?.envelope;
            const req = r.channel.requiredNedtK;
            const unmet = e?.worstNedtK != null && req !== null && e.worstNedtK > req;
            const detuned = e ? e.worstModeResponse < 0.5 : false;
            const tol = r.channel.centreToleranceMHz;
            const drift = e?.centreErrorMHz != null && tol !== null && e.centreErrorMHz > tol;
            return (
              <tr key={r.channel.id} data-channel={r.channel.key}>
                <td className={td}>
                  <strong>{r.channel.key}</strong> {r.channel.name}
                </td>
                <td className={td}>{r.channel.ifFilter === "occupied" ? "occupied band" : "slot"}</td>
                <td className={td}>{formatK(r.result?.nedtK)}</td>
                <td className={`${td} ${unmet ? "font-semibold text-sev-error" : ""}`}>
                  {formatK(e?.worstNedtK)}
                  <span className="block text-[10px] text-ink-soft">{atText(e?.worstNedtAt)}</span>
                </td>
                <td className={td}>{req === null ? "–" : formatK(req)}</td>
                <td className={td}>
                  {formatMHz(r.result?.radiometricBandwidthMHz, 2)} / {formatMHz(e?.worstRadiometricBandwidthMHz, 2)}
                </td>
                <td className={td}>
                  {formatDB(r.result?.imageRejectionDB)} / {formatDB(e?.worstImageRejectionDB)}
                  <span className="block text-[10px] text-ink-soft">{atText(e?.worstImageRejectionAt)}</span>
                </td>
                <td className={`${td} ${detuned ? "font-semibold text-sev-error" : ""}`}>
                  {formatNumber(e?.worstModeResponse, 4)}
                  <span className="block text-[10px] text-ink-soft">{atText(e?.worstModeResponseAt)}</span>
                </td>
                <td className={`${td} ${drift ? "font-semibold text-sev-error" : ""}`}>
                  {formatMHz(e?.centreErrorMHz, 3)} / {tol === null ? "none" : formatMHz(tol, 3)}
                  <span className="block text-[10px] text-ink-soft">{atText(e?.centreErrorAt)}</span>
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </Section>
  );
}
