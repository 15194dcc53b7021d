import { NOISE_TERMS } from "@/lib/plan/types";
import { NOISE_TERM_TEXT } from "@/components/lane-view/view/noise-terms";
import { dominantText } from "@/components/lane-view/view/noise-budget-panel";
import type { ChannelRow } from "../channel-rows";
import { formatK, formatNumber } from "../format";
import { Section, td, th } from "./section";

/**
 * The report's noise budget per channel (docs/plan-format.md §14.4): every
 * term in kelvin at the antenna, the total, which temperature NEΔT uses and
 * the dominant term in words. Only channels whose chain has a budget.
 */
export function NoiseBudgetSection({ rows }: { rows: ChannelRow[] }) {
  const withBudget = rows.filter((r) => r.result?.noiseBudget);
  if (withBudget.length === 0) return null;
  return (
    <Section title="Receiver noise budget">
      <p className="mb-1 text-xs">
        Receiver temperature computed from the hardware, term by term, in K referred to the antenna (design estimates).
        &ldquo;Used&rdquo; says which temperature NEΔT uses.
      </p>
      <table className="w-full border-collapse" data-testid="report-noise-budget">
        <thead>
          <tr>
            <th className={th}>Channel</th>
            {NOISE_TERMS.map((t) => (
              <th key={t} className={th}>
                {NOISE_TERM_TEXT[t].name} (K)
              </th>
            ))}
            <th className={th}>Total (K)</th>
            <th className={th}>Used</th>
            <th className={th}>η</th>
          </tr>
        </thead>
        <tbody>
          {withBudget.map((r) => {
            const b = r.result!.noiseBudget!;
            return (
              <tr key={r.channel.id}>
                <td className={td}>
                  <strong>{r.channel.key}</strong>
                </td>
                {NOISE_TERMS.map((t) => (
                  <td key={t} className={td}>
                    {formatK(b.terms.find((x) => x.term === t)?.kelvin ?? 0, 1)}
                  </td>
                ))}
                <td className={td}>{formatK(b.totalK, 1)}</td>
                <td className={td}>
                  {b.source === "computed"
                    ? "computed"
                    : `entered ${formatK(b.enteredK, 0)} K (${formatNumber(b.ratio, 2)}× computed)`}
                </td>
                <td className={td}>
                  {formatNumber(b.conversionEfficiency, 4)} ({b.conversionEfficiencySource})
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
      <ul className="mt-1 list-disc pl-5 text-xs">
        {withBudget.map((r) => (
          <li key={r.channel.id}>
            {r.channel.key}: {dominantText(r.result!.noiseBudget!.terms, r.result!.noiseBudget!.totalK)}
          </li>
        ))}
      </ul>
    </Section>
  );
}
