"use client";

import { useMemo, useState } from "react";
import { Group } from "@visx/group";
import { scaleLinear } from "@visx/scale";
import { Bar, Line } from "@visx/shape";
import { noiseWhatIf, type NoiseWhatIfInputs, type NoiseTermEntry } from "@/lib/plan";
import type { Plan } from "@/schemas/plan";
import { LaserSafetyNote } from "@/components/workspace/ui";
import { fmt } from "./format";
import { NOISE_TERM_TEXT } from "./noise-terms";

const WIDTH = 640;
const HEIGHT = 70;
const PAD = { left: 8, right: 8, top: 22, bottom: 18 };

/** The terms with kelvin, largest first (for the chart and the words). */
export function sortedTerms(terms: readonly NoiseTermEntry[]): NoiseTermEntry[] {
  return terms.filter((t) => t.kelvin > 0).sort((a, b) => b.kelvin - a.kelvin);
}

/** The dominant term in words: which term, its share, and what would reduce it. */
export function dominantText(terms: readonly NoiseTermEntry[], totalK: number): string {
  const top = sortedTerms(terms)[0];
  if (!top) return "";
  const t = NOISE_TERM_TEXT[top.term];
  return `${t.name} dominates (${fmt(top.kelvin, 1)} K, ${fmt((100 * top.kelvin) / totalK, 0)} % of ${fmt(totalK, 1)} K): ${t.why}.`;
}

function Slider(props: {
  label: string;
  unit: string;
  value: number;
  min: number;
  max: number;
  step: number;
  onChange: (v: number) => void;
  testId: string;
}) {
  return (
    <label className="grid gap-0.5 text-xs">
      <span>
        {props.label} ({props.unit}): <span className="tabular-nums font-semibold">{props.value}</span>
      </span>
      <input
        type="range"
        min={props.min}
        max={props.max}
        step={props.step}
        value={props.value}
        data-testid={props.testId}
        onChange={(e) => props.onChange(Number(e.target.value))}
      />
    </label>
  );
}

/**
 * Each channel's noise budget as a stacked bar (largest term first) with
 * the requirement as a receiver-temperature budget, the dominant term in
 * words, and what-if controls (LO power, pump power, η, carrier notch)
 * that re-run the engine's budget live (`noiseWhatIf`). Nothing is saved.
 */
export function NoiseBudgetPanel({ plan }: { plan: Plan }) {
  const withBudget = useMemo(
    () =>
      plan.chains.flatMap((c) =>
        noiseWhatIf(plan, c.id)
          .channels.filter((ch) => ch.budget)
          .map((ch) => ({ chain: c.id, channel: ch.id })),
      ),
    [plan],
  );
  const [picked, setPicked] = useState<string | null>(null);
  const current = withBudget.find((x) => x.channel === picked) ?? withBudget[0];
  const chain = current ? plan.chains.find((c) => c.id === current.chain) : undefined;
  const laser = chain ? plan.lasers.find((l) => l.id === chain.laser) : undefined;
  const resonator = chain ? plan.resonators.find((r) => r.id === chain.resonator) : undefined;
  const [inputs, setInputs] = useState<NoiseWhatIfInputs>({});
  const result = useMemo(() => (current ? noiseWhatIf(plan, current.chain, inputs) : null), [plan, current, inputs]);
  if (!current || !chain || !laser || !resonator || !result) return null;
  const ch = result.channels.find((c) => c.id === current.channel);
  const budget = ch?.budget;
  if (!ch || !budget) return null;
  const terms = sortedTerms(budget.terms);
  const limitK = ch.receiverBudgetK;
  const x = scaleLinear({
    domain: [0, Math.max(budget.totalK, limitK ?? 0) * 1.05],
    range: [PAD.left, WIDTH - PAD.right],
  });
  const starts = terms.map((_, i) => terms.slice(0, i).reduce((s, t) => s + t.kelvin, 0));
  const set = (k: keyof NoiseWhatIfInputs) => (v: number) => setInputs((s) => ({ ...s, [k]: v }));
  const lo = inputs.loPowerMW ?? laser.loPowerMW;
  const pump = inputs.carrierPowerMW ?? laser.carrierPowerMW;
  const eta = inputs.conversionEfficiency ?? budget.conversionEfficiency;
  const notch = inputs.carrierRejectionDB ?? chain.carrierRejectionDB;
  return (
    <details className="rounded border border-ink-faint p-3" open data-testid="noise-budget">
      <summary className="cursor-pointer text-sm font-semibold">Receiver noise budget</summary>
      <div className="mt-2 grid gap-3">
        <label className="text-xs">
          Channel{" "}
          <select
            value={current.channel}
            onChange={(e) => {
              setPicked(e.target.value);
              setInputs({});
            }}
            data-testid="noise-budget-channel"
          >
            {withBudget.map((w) => (
              <option key={w.channel} value={w.channel}>
                {w.channel} (chain {w.chain})
              </option>
            ))}
          </select>
        </label>
        <svg width={WIDTH} height={HEIGHT} role="img" aria-label={`Noise budget of ${current.channel}`}>
          <Group>
            {terms.map((t, i) => {
              const x0 = x(starts[i] ?? 0);
              const x1 = x((starts[i] ?? 0) + t.kelvin);
              return (
                <Bar
                  key={t.term}
                  x={x0}
                  y={PAD.top}
                  width={Math.max(0.5, x1 - x0)}
                  height={HEIGHT - PAD.top - PAD.bottom}
                  fill={NOISE_TERM_TEXT[t.term].colour}
                  data-term={t.term}
                >
                  <title>{`${NOISE_TERM_TEXT[t.term].name}: ${fmt(t.kelvin, 2)} K`}</title>
                </Bar>
              );
            })}
            {limitK !== null ? (
              <>
                <Line
                  from={{ x: x(limitK), y: PAD.top - 6 }}
                  to={{ x: x(limitK), y: HEIGHT - PAD.bottom + 4 }}
                  stroke="#111"
                  strokeWidth={2}
                  strokeDasharray="4 2"
                />
                <text x={x(limitK)} y={PAD.top - 9} fontSize={10} textAnchor={x(limitK) > WIDTH / 2 ? "end" : "start"}>
                  {`budget from the requirement: ${fmt(limitK, 1)} K`}
                </text>
              </>
            ) : null}
            <text x={PAD.left} y={HEIGHT - 4} fontSize={10}>
              0 K
            </text>
            <text x={x(budget.totalK)} y={HEIGHT - 4} fontSize={10} textAnchor="end">
              {`${fmt(budget.totalK, 1)} K`}
            </text>
          </Group>
        </svg>
        <p className="text-sm" data-testid="noise-dominant">
          {dominantText(budget.terms, budget.totalK)}
        </p>
        <table className="text-xs" data-testid="noise-terms">
          <tbody>
            {terms.map((t) => (
              <tr key={t.term}>
                <th scope="row" className="px-2 text-left font-normal">
                  <span
                    aria-hidden
                    className="mr-1 inline-block h-2 w-2"
                    style={{ background: NOISE_TERM_TEXT[t.term].colour }}
                  />
                  {NOISE_TERM_TEXT[t.term].name}
                </th>
                <td className="px-2 tabular-nums">{fmt(t.kelvin, 2)} K</td>
                <td className="px-2 tabular-nums">{fmt((100 * t.kelvin) / budget.totalK, 1)} %</td>
              </tr>
            ))}
          </tbody>
        </table>
        <p className="text-sm">
          NEΔT with this budget:{" "}
          <span className="font-semibold tabular-nums" data-testid="whatif-nedt">
            {ch.nedtK !== null ? `${fmt(ch.nedtK, 3)} K` : "—"}
          </span>
          {budget.source === "entered" && budget.enteredK !== null
            ? ` (the channel uses its entered ${fmt(budget.enteredK, 0)} K, ${fmt(budget.ratio ?? 0, 2)}× the computed)`
            : ""}
          . Optimal LO power:{" "}
          <span className="tabular-nums" data-testid="optimal-lo">
            {result.optimalLoPowerMW !== null ? `${fmt(result.optimalLoPowerMW, 3)} mW` : "none without pd-overload"}
          </span>
          ; {fmt(result.pdInputMW, 3)} mW per photodiode.
        </p>
        <fieldset className="grid gap-2 sm:grid-cols-2">
          <legend className="text-xs font-semibold">What if (not saved)</legend>
          <div>
            <Slider
              label="LO power"
              unit="mW"
              value={lo}
              min={0.05}
              max={20}
              step={0.05}
              onChange={set("loPowerMW")}
              testId="whatif-lo"
            />
            <LaserSafetyNote className="mt-1" />
          </div>
          <div>
            <Slider
              label="Pump (carrier) power"
              unit="mW"
              value={pump}
              min={0.1}
              max={100}
              step={0.1}
              onChange={set("carrierPowerMW")}
              testId="whatif-pump"
            />
            <LaserSafetyNote className="mt-1" />
          </div>
          <Slider
            label="Conversion efficiency η"
            unit="0–1"
            value={eta}
            min={0.001}
            max={1}
            step={0.001}
            onChange={set("conversionEfficiency")}
            testId="whatif-eta"
          />
          <Slider
            label="Carrier notch"
            unit="dB"
            value={notch}
            min={0}
            max={60}
            step={0.5}
            onChange={set("carrierRejectionDB")}
            testId="whatif-notch"
          />
        </fieldset>
      </div>
    </details>
  );
}
