"use client";

import { useId, useState } from "react";
import { frequencyTHzFromNm, GRID_SPACINGS_GHZ, nearestGridChannel, wavelengthNmFromTHz } from "@/lib/optics";
import { formatFixed, formatSigned, parseNumberField } from "./format";
import { attempt } from "./internals/attempt";
import { ApplyButton, type ApplyProps, ErrorLine, HelperCard, ResultRow, Working } from "./internals/helper-card";
import { Choice } from "./internals/choice";
import { fieldInput, NumberField } from "./internals/number-field";

/** Props; `onApply` receives an optical frequency in THz (the entered one or a grid centre). */
export interface WavelengthGridProps extends ApplyProps<number> {
  /** Starting optical frequency, THz (default 193.4). */
  initialTHz?: number;
  /** Which quantity the user types first (default THz). */
  initialUnit?: "THz" | "nm";
}

/**
 * Vacuum wavelength ↔ optical frequency, and the nearest ITU-T G.694.1 grid
 * channel on each fixed grid and the 6.25 GHz flexible grid, with the offset.
 */
export function WavelengthGrid({
  initialTHz = 193.4,
  initialUnit = "THz",
  onApply,
  applyLabel = "Apply carrier",
}: WavelengthGridProps) {
  const id = useId();
  const [unit, setUnit] = useState<"THz" | "nm">(initialUnit);
  const [text, setText] = useState(() =>
    initialUnit === "THz" ? String(initialTHz) : String(Number(wavelengthNmFromTHz(initialTHz).toFixed(4))),
  );

  const label = unit === "THz" ? "Optical frequency" : "Vacuum wavelength";
  const field = parseNumberField(text, label, { min: 0, exclusiveMin: true });
  const calc = field.ok
    ? attempt(() => {
        const thz = unit === "THz" ? field.value : frequencyTHzFromNm(field.value);
        const nm = unit === "THz" ? wavelengthNmFromTHz(field.value) : field.value;
        return { thz, nm, channels: GRID_SPACINGS_GHZ.map((s) => nearestGridChannel(thz, s)) };
      })
    : null;
  const result = calc?.ok ? calc.value : null;

  function switchUnit(next: "THz" | "nm") {
    if (next === unit) return;
    if (result) setText(next === "THz" ? String(Number(result.thz.toFixed(6))) : String(Number(result.nm.toFixed(4))));
    setUnit(next);
  }

  return (
    <HelperCard
      id="wavelength-grid"
      title="Wavelength and grid"
      summary="Optical frequency ↔ vacuum wavelength, and the nearest ITU-T G.694.1 grid channel."
    >
      <Choice
        name={`${id}-unit`}
        legend="Enter the value as"
        options={[
          ["THz", "Frequency (THz)"],
          ["nm", "Wavelength (nm)"],
        ]}
        value={unit}
        onChange={switchUnit}
      />
      <NumberField id={`${id}-value`} label={label} unit={unit} {...fieldInput(text, setText, field)} />
      <ErrorLine message={calc && !calc.ok ? calc.message : null} />
      {result ? (
        <>
          <ResultRow
            label="Frequency"
            value={formatFixed(result.thz, 6)}
            unit="THz"
            emphasis={unit === "nm"}
            testId="wg-thz"
          />
          <ResultRow
            label="Vacuum wavelength"
            value={formatFixed(result.nm, 4)}
            unit="nm"
            emphasis={unit === "THz"}
            testId="wg-nm"
          />
          <table className="mt-3 w-full text-left text-sm">
            <caption className="sr-only">Nearest grid channel per spacing</caption>
            <thead className="text-xs text-ink-soft">
              <tr>
                <th scope="col" className="py-1">
                  Grid
                </th>
                <th scope="col">Index</th>
                <th scope="col">Centre (THz)</th>
                <th scope="col">Centre (nm)</th>
                <th scope="col">Offset (GHz)</th>
                {onApply ? (
                  <th scope="col">
                    <span className="sr-only">Apply</span>
                  </th>
                ) : null}
              </tr>
            </thead>
            <tbody className="font-mono text-xs">
              {result.channels.map((ch) => (
                <tr key={ch.spacingGHz} className="border-t border-ink-faint">
                  <td className="py-1">{ch.grid === "fixed" ? `${ch.spacingGHz} GHz` : "flex 6.25 GHz"}</td>
                  <td>{ch.grid === "fixed" ? `N = ${ch.index}` : `n = ${ch.index}`}</td>
                  <td>{formatFixed(ch.centreTHz, 5)}</td>
                  <td>{formatFixed(wavelengthNmFromTHz(ch.centreTHz), 3)}</td>
                  <td>{formatSigned(ch.offsetGHz, 3)}</td>
                  {onApply ? (
                    <td>
                      <button type="button" className="text-ink underline" onClick={() => onApply(ch.centreTHz)}>
                        Use centre
                      </button>
                    </td>
                  ) : null}
                </tr>
              ))}
            </tbody>
          </table>
        </>
      ) : null}
      {onApply ? (
        <ApplyButton label={applyLabel} disabled={!result} onClick={() => result && onApply(result.thz)} />
      ) : null}
      <Working
        formulas={[
          "λ = c / f   (vacuum, c = 299 792 458 m/s exact)",
          "f_N = 193.1 THz + N × spacing;  offset = f − f_N,  |offset| ≤ spacing/2",
        ]}
        inputs={[[label, field.ok ? `${field.value} ${unit}` : "—"]]}
        sources={[
          "ITU-T G.694.1: fixed DWDM grids anchored at 193.1 THz (100/50/25/12.5 GHz)",
          "ITU-T G.694.1 (2012): flexible grid, centre 193.1 THz + n × 6.25 GHz",
          "SI (2019): c exact",
        ]}
      />
    </HelperCard>
  );
}
