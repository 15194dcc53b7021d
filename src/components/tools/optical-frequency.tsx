import { nearestGridChannel, wavelengthNmFromTHz } from "@/lib/optics";
import { formatFixed, formatSigned } from "./format";

export interface OpticalFrequencyProps {
  /** Optical frequency in THz. */
  thz: number;
  /** Decimals for the THz figure (default 4). */
  decimals?: number;
  /** Show the nearest 50 GHz ITU-T G.694.1 channel and offset (default true). */
  showGrid?: boolean;
  className?: string;
}

/**
 * Inline display of an optical frequency: THz, vacuum wavelength, and the
 * nearest 50 GHz G.694.1 channel with the offset from it. No state, so it
 * renders in server and client components alike.
 */
export function OpticalFrequency({ thz, decimals = 4, showGrid = true, className }: OpticalFrequencyProps) {
  if (!Number.isFinite(thz) || !(thz > 0)) {
    return <span className={className}>—</span>;
  }
  const nm = wavelengthNmFromTHz(thz);
  const ch = nearestGridChannel(thz, 50);
  const title = `${thz} THz = ${nm} nm (vacuum); nearest ITU-T G.694.1 50 GHz channel N = ${ch.index} at ${ch.centreTHz} THz`;
  return (
    <span className={`font-mono ${className ?? ""}`} title={title} data-optical-frequency={thz}>
      {formatFixed(thz, decimals)} THz
      <span className="text-ink-soft"> · {formatFixed(nm, 3)} nm</span>
      {showGrid ? (
        <span className="text-ink-soft">
          {" "}
          · 50 GHz grid N = {ch.index} ({formatFixed(ch.centreTHz, 2)} THz) {formatSigned(ch.offsetGHz, 1)} GHz
        </span>
      ) : null}
    </span>
  );
}
