import { envelopeCurves, type EnvelopePoint, type ResultDocument } from "@/lib/plan";
import type { Plan } from "@/schemas/plan";
import { fmtNumber } from "@/components/envelope/format";

const where = (at: EnvelopePoint | null) =>
  at ? `u ${fmtNumber(at.loShiftMHz, 4)} MHz, t ${fmtNumber(at.temperatureOffsetK, 4)} K` : "—";
const val = (v: number | null | undefined, digits: number, unit: string) =>
  v === null || v === undefined ? "—" : `${fmtNumber(v, digits)} ${unit}`.trim();

/**
 * A channel's figures nominal and worst over the operating envelope side by
 * side, with where each worst value occurs (docs/decisions/029), from the
 * live re-check. The result has no nominal centre error (only its worst),
 * so that cell is a dash.
 */
export function EnvelopeFigures({
  channelId,
  plan,
  result,
}: {
  channelId: string;
  plan: Plan;
  result: ResultDocument;
}) {
  const r = result.channels.find((c) => c.id === channelId);
  if (!r || !plan.channels.some((c) => c.id === channelId)) return null;
  const e = r.envelope;
  // The nominal mode response: the curve's middle point (u = 0, t = 0).
  const nominalMode = envelopeCurves(plan, channelId, { axis: "lo", points: 3 }).points[1]!.modeResponse;
  const rows: [string, string, string, string][] = [
    ["NEΔT", val(r.nedtK, 4, "K"), val(e.worstNedtK, 4, "K"), where(e.worstNedtAt)],
    [
      "Radiometric bandwidth",
      val(r.radiometricBandwidthMHz, 4, "MHz"),
      val(e.worstRadiometricBandwidthMHz, 4, "MHz"),
      where(e.worstRadiometricBandwidthAt),
    ],
    [
      "Image rejection",
      val(r.imageRejectionDB, 4, "dB"),
      val(e.worstImageRejectionDB, 4, "dB"),
      where(e.worstImageRejectionAt),
    ],
    ["Mode response", val(nominalMode, 4, ""), val(e.worstModeResponse, 4, ""), where(e.worstModeResponseAt)],
    ["Centre error", "—", val(e.centreErrorMHz, 4, "MHz"), where(e.centreErrorAt)],
  ];
  return (
    <table className="mt-2 w-full border-t border-ink-faint text-xs tabular-nums" data-testid="details-envelope">
      <caption className="pt-1 text-left font-semibold">Nominal and worst over the operating envelope</caption>
      <thead>
        <tr className="text-left text-ink-soft">
          <th scope="col">Figure</th>
          <th scope="col">Nominal</th>
          <th scope="col">Worst</th>
          <th scope="col">Where</th>
        </tr>
      </thead>
      <tbody>
        {rows.map(([name, nominal, worst, at]) => (
          <tr key={name}>
            <th scope="row" className="pr-2 text-left font-normal">
              {name}
            </th>
            <td className="pr-2">{nominal}</td>
            <td className="pr-2">{worst}</td>
            <td>{at}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
