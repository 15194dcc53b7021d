"use client";

import { useId, useState } from "react";
import { linewidthFromQ } from "@/lib/optics";
import { formatFixed, formatSignificant, type FieldParse } from "./format";
import { ApplyButton, type ApplyProps, ErrorLine, HelperCard, ResultRow, Working } from "./internals/helper-card";
import { Choice } from "./internals/choice";
import { fieldInput, FieldGrid, NumberField } from "./internals/number-field";
import { INDEX_SOURCES, resonatorSizing, type IndexSource, type SizingTexts } from "./internals/resonator-sizing-calc";

export interface ResonatorApplyValue {
  fsrGHz: number;
  loadedQ: number;
}

/** Props; `onApply` receives the FSR and loaded Q, the two numbers a resonator entry holds. */
export interface ResonatorSizingProps extends ApplyProps<ResonatorApplyValue> {
  /** Start from a radius (µm) instead of an FSR. */
  initialRadiusUm?: number;
  /** Start from an FSR (GHz); default 183.31 when no radius is given. */
  initialFsrGHz?: number;
  initialCarrierTHz?: number;
  initialTemperatureC?: number;
  initialLoadedQ?: number;
  /** A measured group index; when given it is used instead of the fit. */
  initialMeasuredGroupIndex?: number;
  /**
   * Receives the FSR shift per kelvin of the mode pair (MHz/K, the "following
   * the modes" figure of ADR 007), the number a resonator's
   * `fsrShiftMHzPerK` holds.
   */
  onApplyFsrShift?: (mhzPerK: number) => void;
}

/**
 * Whispering-gallery resonator sizing: radius ↔ FSR with the group index from
 * a LiNbO3 fit (or a measured value), thermal shifts of a mode and of the
 * FSR, and loaded Q ↔ linewidth.
 */
export function ResonatorSizing({
  initialRadiusUm,
  initialFsrGHz = 183.31,
  initialCarrierTHz = 193.4,
  initialTemperatureC = 25,
  initialLoadedQ = 1e7,
  initialMeasuredGroupIndex,
  onApply,
  applyLabel = "Apply FSR and Q",
  onApplyFsrShift,
}: ResonatorSizingProps) {
  const id = useId();
  const [direction, setDirection] = useState<"fromRadius" | "fromFsr">(
    initialRadiusUm !== undefined ? "fromRadius" : "fromFsr",
  );
  const [source, setSource] = useState<IndexSource>(initialMeasuredGroupIndex !== undefined ? "measured" : "jundt");
  const [qDirection, setQDirection] = useState<"fromQ" | "fromLinewidth">("fromQ");
  const [text, setText] = useState<SizingTexts>(() => ({
    radius: initialRadiusUm !== undefined ? String(initialRadiusUm) : "1000",
    fsr: String(initialFsrGHz),
    carrier: String(initialCarrierTHz),
    temp: String(initialTemperatureC),
    ng: initialMeasuredGroupIndex !== undefined ? String(initialMeasuredGroupIndex) : "2.18",
    q: String(initialLoadedQ),
    lw: String(Number(linewidthFromQ(initialCarrierTHz, initialLoadedQ).toPrecision(6))),
  }));
  const { carrier, temp, radius, fsrIn, ngIn, qIn, lwIn, index, ng, size, thermal, q, firstError, canApply } =
    resonatorSizing(text, { source, direction, qDirection });
  /** A NumberField's value, change handler and error for one field's text and its parse. */
  const bound = (k: keyof SizingTexts, parsed: FieldParse) =>
    fieldInput(text[k], (v) => setText((t) => ({ ...t, [k]: v })), parsed);

  return (
    <HelperCard
      id="resonator-sizing"
      title="Resonator sizing"
      summary="Radius ↔ free spectral range, thermal shifts, and loaded Q ↔ linewidth for a LiNbO3 whispering-gallery disc."
    >
      <FieldGrid>
        <NumberField id={`${id}-carrier`} label="Carrier (laser 1)" unit="THz" {...bound("carrier", carrier)} />
        <NumberField id={`${id}-temp`} label="Resonator temperature" unit="°C" {...bound("temp", temp)} />
      </FieldGrid>

      <label htmlFor={`${id}-source`} className="text-sm font-medium text-ink">
        Group index from
      </label>
      <select
        id={`${id}-source`}
        value={source}
        onChange={(e) => setSource(e.target.value as IndexSource)}
        className="mb-2 mt-1 w-full rounded border border-ink-faint px-2 py-1 text-sm"
      >
        {(Object.keys(INDEX_SOURCES) as IndexSource[]).map((k) => (
          <option key={k} value={k}>
            {INDEX_SOURCES[k]}
          </option>
        ))}
      </select>
      {source === "measured" ? (
        <NumberField
          id={`${id}-ng`}
          label="Measured group index n_g"
          {...bound("ng", ngIn)}
          hint="Overrides the material fit (a measured FSR includes the mode's geometric dispersion)."
        />
      ) : null}

      <Choice
        name={`${id}-dir`}
        legend="Size from"
        options={[
          ["fromFsr", "Radius for an FSR"],
          ["fromRadius", "FSR of a radius"],
        ]}
        value={direction}
        onChange={setDirection}
        className="mb-2 mt-2 flex gap-4 text-sm"
      />
      {direction === "fromFsr" ? (
        <NumberField id={`${id}-fsr`} label="Free spectral range" unit="GHz" {...bound("fsr", fsrIn)} />
      ) : (
        <NumberField id={`${id}-radius`} label="Major radius R" unit="µm" {...bound("radius", radius)} />
      )}

      <Choice
        name={`${id}-q`}
        legend="Linewidth from"
        options={[
          ["fromQ", "Linewidth from Q"],
          ["fromLinewidth", "Q from linewidth"],
        ]}
        value={qDirection}
        onChange={setQDirection}
      />
      {qDirection === "fromQ" ? (
        <NumberField id={`${id}-qval`} label="Loaded Q" {...bound("q", qIn)} />
      ) : (
        <NumberField id={`${id}-lw`} label="Loaded linewidth (FWHM)" unit="MHz" {...bound("lw", lwIn)} />
      )}

      <ErrorLine message={firstError && !firstError.ok ? firstError.message : null} />

      <div className="mt-2">
        {index?.ok && index.value.n !== null ? (
          <ResultRow label="Phase index n" value={formatFixed(index.value.n, 5)} />
        ) : null}
        <ResultRow label="Group index n_g" value={ng !== null ? formatFixed(ng, 5) : "—"} />
        <ResultRow
          label="Free spectral range"
          value={size ? formatFixed(size.fsrGHz, 4) : "—"}
          unit="GHz"
          emphasis={direction === "fromRadius"}
          testId="rs-fsr"
        />
        <ResultRow
          label="Major radius"
          value={size ? formatFixed(size.radiusUm, 3) : "—"}
          unit="µm"
          emphasis={direction === "fromFsr"}
          testId="rs-radius"
        />
        <ResultRow
          label="Loaded linewidth"
          value={q ? formatSignificant(q.linewidthMHz, 4) : "—"}
          unit="MHz"
          testId="rs-linewidth"
        />
        <ResultRow label="Loaded Q" value={q ? formatSignificant(q.loadedQ, 4) : "—"} />
        <ResultRow
          label="Finesse FSR/δν"
          value={q && size ? formatSignificant((size.fsrGHz * 1000) / q.linewidthMHz, 3) : "—"}
        />
        <ResultRow
          label="Mode shift dν/dT"
          value={thermal?.ok ? formatFixed(thermal.value.mode.ghzPerK, 3) : "—"}
          unit="GHz/K"
          testId="rs-mode-shift"
        />
        <ResultRow
          label="FSR shift dFSR/dT (n_g at fixed λ)"
          value={thermal?.ok ? formatFixed(thermal.value.fsr.mhzPerK, 3) : "—"}
          unit="MHz/K"
          testId="rs-fsr-shift"
        />
        <ResultRow
          label="FSR shift, following the modes"
          value={thermal?.ok ? formatFixed(thermal.value.fsr.mhzPerKFollowingMode, 3) : "—"}
          unit="MHz/K"
        />
      </div>
      <div className="flex flex-wrap gap-2">
        {onApply ? (
          <ApplyButton
            label={applyLabel}
            disabled={!canApply}
            onClick={() => size && q && onApply({ fsrGHz: size.fsrGHz, loadedQ: q.loadedQ })}
          />
        ) : null}
        {onApplyFsrShift ? (
          <ApplyButton
            label="Apply FSR shift"
            disabled={!thermal?.ok}
            onClick={() => thermal?.ok && onApplyFsrShift(thermal.value.fsr.mhzPerKFollowingMode)}
          />
        ) : null}
      </div>

      <Working
        formulas={[
          "n_g = n − λ·dn/dλ   (analytic derivative of the Sellmeier form)",
          "FSR = c / (2π·R·n_g)     R = c / (2π·FSR·n_g)",
          "δν = ν / Q_L     finesse = FSR / δν",
          "dν/dT = −ν·[(n/n_g)·α_a + (∂n/∂T)/n_g]",
          "dFSR/dT = −FSR·[α_a + (dn_g/dT)/n_g]",
        ]}
        inputs={[
          ["ν (carrier)", carrier.ok ? `${carrier.value} THz` : "—"],
          ["λ (vacuum)", index?.ok ? `${formatFixed(index.value.lambdaUm * 1000, 3)} nm` : "—"],
          ["T", temp.ok ? `${temp.value} °C` : "—"],
          ["n_g source", INDEX_SOURCES[source]],
          ["α_a", thermal?.ok ? `${formatSignificant(thermal.value.mode.alphaA, 4)} /K` : "—"],
          ["∂n_e/∂T", thermal?.ok ? `${formatSignificant(thermal.value.mode.dnDT, 4)} /K` : "—"],
          ["∂n_g/∂T", thermal?.ok ? `${formatSignificant(thermal.value.fsr.dngDT, 4)} /K` : "—"],
        ]}
        sources={[
          "Zelmon, Small & Jundt, JOSA B 14, 3319 (1997): LiNbO3 Sellmeier, 21 °C",
          "Jundt, Opt. Lett. 22, 1553 (1997): temperature-dependent n_e (used for the thermal shifts in every case)",
          "Kim & Smith, J. Appl. Phys. 40, 4637 (1969): thermal expansion ⊥ c, α_a",
          "FSR and thermal-shift formulas: derived from the relations above (FSR = c/(2πR·n_g)); material dispersion only, a measured FSR is better",
        ]}
      />
    </HelperCard>
  );
}
