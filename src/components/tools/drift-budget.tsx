"use client";

import { useId, useState } from "react";
import { type DriftCombination, driftBudget, modeShiftPerKelvin } from "@/lib/optics";
import { ceilToStep, formatFixed, LN_FIT_CARRIER_THZ } from "./format";
import { attempt } from "./internals/attempt";
import { ApplyButton, type ApplyProps, ErrorLine, HelperCard, ResultRow, Working } from "./internals/helper-card";
import { Choice } from "./internals/choice";
import { FieldGrid, NumberField, useNumberText } from "./internals/number-field";

/** Props; `onApply` receives driftMHz, rounded up to 0.1 MHz. */
export interface DriftBudgetProps extends ApplyProps<number> {
  initialLaser2MHz?: number;
  initialResonatorMilliK?: number;
  initialLockOffsetMHz?: number;
  initialStepMHz?: number;
  /** Carrier and resonator temperature used to compute the mode shift (defaults 193.4 THz, 25 °C). */
  initialCarrierTHz?: number;
  initialTemperatureC?: number;
  /** A measured mode shift (GHz/K) to use instead of the LiNbO3 estimate. */
  initialModeShiftGHzPerK?: number;
  initialCombine?: DriftCombination;
}

/** Drift budget of the laser-pair offset → the plan's driftMHz. */
export function DriftBudget({
  initialLaser2MHz = 10,
  initialResonatorMilliK = 1,
  initialLockOffsetMHz = 0.5,
  initialStepMHz = 10,
  initialCarrierTHz = 193.4,
  initialTemperatureC = 25,
  initialModeShiftGHzPerK,
  initialCombine = "worst-case",
  onApply,
  applyLabel = "Apply drift",
}: DriftBudgetProps) {
  const id = useId();
  const laser2 = useNumberText(String(initialLaser2MHz), "Laser 2 stability", { min: 0 });
  const milliK = useNumberText(String(initialResonatorMilliK), "Resonator temperature stability", { min: 0 });
  const lock = useNumberText(String(initialLockOffsetMHz), "Lock offset", { min: 0 });
  const step = useNumberText(String(initialStepMHz), "Tuning step", { min: 0 });
  const carrier = useNumberText(String(initialCarrierTHz), "Carrier", LN_FIT_CARRIER_THZ);
  const temp = useNumberText(String(initialTemperatureC), "Resonator temperature", { min: -50, max: 300 });
  const [useMeasured, setUseMeasured] = useState(initialModeShiftGHzPerK !== undefined);
  const shift = useNumberText(
    initialModeShiftGHzPerK !== undefined ? String(initialModeShiftGHzPerK) : "-6.2",
    "Mode shift",
  );
  const [combine, setCombine] = useState<DriftCombination>(initialCombine);
  const f = {
    laser2: laser2.parsed,
    milliK: milliK.parsed,
    lock: lock.parsed,
    step: step.parsed,
    carrier: carrier.parsed,
    temp: temp.parsed,
    shift: shift.parsed,
  };

  const shiftCalc = useMeasured
    ? f.shift.ok
      ? { ok: true as const, value: f.shift.value }
      : null
    : f.carrier.ok && f.temp.ok
      ? attempt(
          () =>
            modeShiftPerKelvin(f.carrier.ok ? f.carrier.value : Number.NaN, f.temp.ok ? f.temp.value : Number.NaN)
              .ghzPerK,
        )
      : null;

  const budget =
    f.laser2.ok && f.milliK.ok && f.lock.ok && f.step.ok && shiftCalc?.ok
      ? attempt(() =>
          driftBudget({
            laser2MHz: f.laser2.ok ? f.laser2.value : 0,
            resonatorMilliK: f.milliK.ok ? f.milliK.value : 0,
            modeShiftGHzPerK: shiftCalc.value,
            lockOffsetMHz: f.lock.ok ? f.lock.value : 0,
            stepMHz: f.step.ok ? f.step.value : 0,
            combine,
          }),
        )
      : null;
  const result = budget?.ok ? budget.value : null;
  const applied = result ? ceilToStep(result.driftMHz, 0.1) : null;
  const calcError = [shiftCalc, budget].find((a) => a && !a.ok);

  return (
    <HelperCard
      id="drift-budget"
      title="Drift budget"
      summary="How far the laser-pair offset can wander from the carrier while observing: the plan's drift (± MHz)."
    >
      <FieldGrid>
        <NumberField id={`${id}-l2`} label="Laser 2 stability (±)" unit="MHz" {...laser2.input} />
        <NumberField id={`${id}-mk`} label="Resonator temperature stability (±)" unit="mK" {...milliK.input} />
        <NumberField id={`${id}-lock`} label="Lock offset from mode centre (±)" unit="MHz" {...lock.input} />
        <NumberField id={`${id}-step`} label="Tuning step" unit="MHz" {...step.input} />
      </FieldGrid>
      <label className="mb-2 flex items-center gap-2 text-sm">
        <input type="checkbox" checked={useMeasured} onChange={(e) => setUseMeasured(e.target.checked)} />
        Use a measured mode shift instead of the LiNbO3 estimate
      </label>
      {useMeasured ? (
        <NumberField id={`${id}-shift`} label="Mode shift dν/dT" unit="GHz/K" {...shift.input} />
      ) : (
        <FieldGrid>
          <NumberField id={`${id}-carrier`} label="Carrier" unit="THz" {...carrier.input} />
          <NumberField id={`${id}-temp`} label="Resonator temperature" unit="°C" {...temp.input} />
        </FieldGrid>
      )}
      <Choice
        name={`${id}-combine`}
        legend="Combine the terms as"
        showLegend
        options={[
          ["worst-case", "Worst case (sum)"],
          ["rss", "Root-sum-square"],
        ]}
        value={combine}
        onChange={setCombine}
      />
      <ErrorLine message={calcError && !calcError.ok ? calcError.message : null} />
      <div className="mt-2">
        {result?.terms.map((t) => (
          <ResultRow key={t.key} label={t.label} value={formatFixed(t.mhz, 3)} unit="MHz" />
        ))}
        <ResultRow
          label={combine === "rss" ? "Drift (root-sum-square)" : "Drift (worst case)"}
          value={result ? `± ${formatFixed(result.driftMHz, 3)}` : "—"}
          unit="MHz"
          emphasis
          testId="db-drift"
        />
        <ResultRow
          label="Value applied (rounded up to 0.1 MHz)"
          value={applied !== null ? formatFixed(applied, 1) : "—"}
          unit="MHz"
        />
      </div>
      {onApply ? (
        <ApplyButton
          label={applyLabel}
          disabled={applied === null}
          onClick={() => applied !== null && onApply(applied)}
        />
      ) : null}
      <Working
        formulas={[
          "resonator term = |dν/dT| [GHz/K] × δT [mK]  (MHz)",
          "worst case: D = laser 2 + resonator + lock + step/2",
          "root-sum-square: D = √(laser 2² + resonator² + lock² + (step/2)²)",
        ]}
        inputs={[
          [
            "dν/dT",
            shiftCalc?.ok
              ? `${formatFixed(shiftCalc.value, 3)} GHz/K${useMeasured ? " (measured)" : " (LiNbO3 e-ray estimate)"}`
              : "—",
          ],
          ["combination", combine === "rss" ? "root-sum-square" : "worst case"],
        ]}
        sources={[
          "Bookkeeping of laser-2, resonator, lock and step terms: the sum or root-sum-square shown in the working above",
          "Guard ≥ full peak-to-peak drift or 3× RMS, plus half the step: common practice",
          "Mode shift: Jundt, Opt. Lett. 22, 1553 (1997) and Kim & Smith, J. Appl. Phys. 40, 4637 (1969); dν/dT = −ν·[(n/n_g)·α_a + (∂n/∂T)/n_g], from 2πR·n·ν/c = m at fixed m",
          "Root-sum-square assumes independent random terms; the half-step is a bound, so rss is optimistic about it",
        ]}
      />
    </HelperCard>
  );
}
