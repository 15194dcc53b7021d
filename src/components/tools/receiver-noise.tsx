"use client";

import { useId, useState } from "react";
import { planckRadiationTemperature, receiverNoise } from "@/lib/optics";
import { ceilToStep, formatFixed, formatSignificant } from "./format";
import { attempt } from "./internals/attempt";
import { ApplyButton, type ApplyProps, ErrorLine, HelperCard, ResultRow, Working } from "./internals/helper-card";
import { FieldGrid, NumberField, useNumberText } from "./internals/number-field";

/** Props; `onApply` receives receiverK, rounded up to 1 K. */
export interface ReceiverNoiseProps extends ApplyProps<number> {
  initialRfGHz?: number;
  /** Photon-number conversion efficiency η_ph as a fraction (0 < η ≤ 1). */
  initialPhotonEfficiency?: number;
  /** Optical path and detection efficiency as a fraction (0 < η ≤ 1). */
  initialOpticalEfficiency?: number;
  /** Lossy front end ahead of the up-converter; null for none. */
  initialFrontEnd?: { lossDB: number; physicalK: number } | null;
}

/** Design estimate of the receiver noise temperature → the plan's receiverK. */
export function ReceiverNoise({
  initialRfGHz = 183.31,
  initialPhotonEfficiency = 0.01,
  initialOpticalEfficiency = 0.5,
  initialFrontEnd = { lossDB: 0.5, physicalK: 290 },
  onApply,
  applyLabel = "Apply receiver noise",
}: ReceiverNoiseProps) {
  const id = useId();
  const [withFrontEnd, setWithFrontEnd] = useState(initialFrontEnd !== null);
  const rfField = useNumberText(String(initialRfGHz), "RF frequency", { min: 0, exclusiveMin: true });
  const phField = useNumberText(String(initialPhotonEfficiency * 100), "Photon conversion efficiency", {
    min: 0,
    exclusiveMin: true,
    max: 100,
  });
  const optField = useNumberText(String(initialOpticalEfficiency * 100), "Optical and detection efficiency", {
    min: 0,
    exclusiveMin: true,
    max: 100,
  });
  const lossField = useNumberText(String(initialFrontEnd?.lossDB ?? 0.5), "Front-end loss", { min: 0 });
  const tPhysField = useNumberText(String(initialFrontEnd?.physicalK ?? 290), "Front-end physical temperature", {
    min: 0,
  });
  const rf = rfField.parsed;
  const ph = phField.parsed;
  const opt = optField.parsed;
  const loss = lossField.parsed;
  const tPhys = tPhysField.parsed;

  const ready = rf.ok && ph.ok && opt.ok && (!withFrontEnd || (loss.ok && tPhys.ok));
  const calc = ready
    ? attempt(() =>
        receiverNoise({
          rfGHz: rf.ok ? rf.value : Number.NaN,
          photonEfficiency: ph.ok ? ph.value / 100 : Number.NaN,
          opticalEfficiency: opt.ok ? opt.value / 100 : Number.NaN,
          frontEnd: withFrontEnd && loss.ok && tPhys.ok ? { lossDB: loss.value, physicalK: tPhys.value } : null,
        }),
      )
    : null;
  const r = calc?.ok ? calc.value : null;
  const applied = r ? ceilToStep(r.receiverK, 1) : null;
  const planck =
    rf.ok && tPhys.ok && withFrontEnd ? attempt(() => planckRadiationTemperature(tPhys.value, rf.value)) : null;

  return (
    <HelperCard
      id="receiver-noise"
      title="Receiver noise"
      badge="Design estimate"
      summary="Receiver noise temperature of an electro-optic up-conversion receiver with ideal heterodyne readout, referred to the antenna port (the plan's receiver noise, K)."
    >
      <FieldGrid>
        <NumberField id={`${id}-rf`} label="RF frequency" unit="GHz" {...rfField.input} />
        <NumberField
          id={`${id}-ph`}
          label="Photon conversion efficiency η_ph"
          unit="%"
          {...phField.input}
          hint="Measured sideband photons out per RF photon in."
        />
        <NumberField
          id={`${id}-opt`}
          label="Optical and detection efficiency η_opt"
          unit="%"
          {...optField.input}
          hint="Resonator output to photocurrent: path loss × quantum efficiency."
        />
      </FieldGrid>
      <label className="mb-2 flex items-center gap-2 text-sm">
        <input type="checkbox" checked={withFrontEnd} onChange={(e) => setWithFrontEnd(e.target.checked)} />
        Lossy mm-wave front end ahead of the up-converter (feed, waveguide, window)
      </label>
      {withFrontEnd ? (
        <FieldGrid>
          <NumberField id={`${id}-loss`} label="Front-end loss L" unit="dB" {...lossField.input} />
          <NumberField id={`${id}-tphys`} label="Front-end physical temperature" unit="K" {...tPhysField.input} />
        </FieldGrid>
      ) : null}
      <ErrorLine message={calc && !calc.ok ? calc.message : null} />
      <div className="mt-2">
        <ResultRow
          label="Quantum limit h·f/k"
          value={r ? formatFixed(r.quantumLimitK, 3) : "—"}
          unit="K"
          testId="rn-quantum"
        />
        <ResultRow label="η = η_ph × η_opt" value={r ? formatSignificant(r.etaTotal, 4) : "—"} />
        <ResultRow label="Up-converter h·f/(k·η)" value={r ? formatFixed(r.upconverterK, 1) : "—"} unit="K" />
        {withFrontEnd ? (
          <>
            <ResultRow label="Front end (L − 1)·T_phys" value={r ? formatFixed(r.frontEndK, 1) : "—"} unit="K" />
            <ResultRow
              label="Up-converter referred through the loss, L·h·f/(k·η)"
              value={r ? formatFixed(r.upconverterReferredK, 1) : "—"}
              unit="K"
            />
          </>
        ) : null}
        <ResultRow
          label="Receiver noise temperature"
          value={r ? formatFixed(r.receiverK, 1) : "—"}
          unit="K"
          emphasis
          testId="rn-receiver"
        />
        <ResultRow
          label="Value applied (rounded up to 1 K)"
          value={applied !== null ? formatFixed(applied, 0) : "—"}
          unit="K"
        />
        {withFrontEnd && planck?.ok ? (
          <ResultRow
            label="Planck radiation temperature J(T_phys) at f"
            value={formatFixed(planck.value, 2)}
            unit="K"
            testId="rn-planck"
          />
        ) : null}
      </div>
      {onApply ? (
        <ApplyButton
          label={applyLabel}
          disabled={applied === null}
          onClick={() => applied !== null && onApply(applied)}
        />
      ) : null}
      <p className="mt-3 text-xs text-ink-soft">
        A design estimate, not a measurement: ideal heterodyne readout, Rayleigh–Jeans front-end term, no excess laser
        noise or detector/amplifier noise. Replace it with a measured receiver temperature when one exists.
      </p>
      <Working
        formulas={[
          "T_up = h·f / (k_B·η),   η = η_ph · η_opt",
          "T_rec = (L − 1)·T_phys + L·T_up   (Friis cascade: T = T₁ + T₂/G₁, lossy two-port T₁ = (L − 1)·T_phys, G₁ = 1/L)",
          "J(T) = (h·f/k) / (exp(h·f/kT) − 1)",
        ]}
        inputs={[
          ["f", rf.ok ? `${rf.value} GHz` : "—"],
          ["η_ph", ph.ok ? `${ph.value} %` : "—"],
          ["η_opt", opt.ok ? `${opt.value} %` : "—"],
          ["L", withFrontEnd && r ? `${loss.ok ? loss.value : "—"} dB = ${formatFixed(r.lossLinear, 4)}` : "none"],
          ["T_phys", withFrontEnd && tPhys.ok ? `${tPhys.value} K` : "—"],
        ]}
        sources={[
          "h, k_B exact (SI 2019)",
          "Quantum-limited up-conversion estimate T_up = h·f/(k_B·η): derived from the photon energy h·f and the conversion efficiency η (working above)",
          "Pozar, Microwave Engineering, 4th ed. (Wiley, 2012), noise chapter: lossy line and cascaded stages",
          "Skou & Le Vine, Microwave Radiometer Systems, 2nd ed. (Artech House): receiver noise temperature",
        ]}
      />
    </HelperCard>
  );
}
