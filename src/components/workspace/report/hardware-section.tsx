import type { Detector, Laser, Resonator } from "@/queries/types";
import { formatGHz, formatInterval, formatNumber, formatQ } from "../format";
import { LASER_HEADERS, laserCells } from "../laser-cells";
import { LASER_SAFETY_TEXT } from "../ui";
import { Section, td, th } from "./section";

/** The report's hardware: laser pairs (with the laser-safety caution), resonators and detectors. */
export function HardwareSection({
  lasers,
  resonators,
  detectors,
}: {
  lasers: Laser[];
  resonators: Resonator[];
  detectors: Detector[];
}) {
  return (
    <Section title="Hardware">
      <table className="w-full border-collapse">
        <thead>
          <tr>
            {LASER_HEADERS.map((h) => (
              <th key={h} className={th}>
                {h}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {lasers.map((l) => (
            <tr key={l.id}>
              {laserCells(l).map((cell, i) => (
                <td key={LASER_HEADERS[i]} className={td}>
                  {cell}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
      <p className="mt-1 text-[11px] text-sev-warning">Optical powers above: {LASER_SAFETY_TEXT}</p>
      <div className="mt-3 grid grid-cols-2 gap-4">
        <table className="w-full border-collapse">
          <thead>
            <tr>
              <th className={th}>Resonator</th>
              <th className={th}>FSR (GHz)</th>
              <th className={th}>Loaded Q</th>
            </tr>
          </thead>
          <tbody>
            {resonators.map((r) => (
              <tr key={r.id}>
                <td className={td}>{r.key}</td>
                <td className={td}>{formatGHz(r.fsrGHz)}</td>
                <td className={td}>{formatQ(r.loadedQ)}</td>
              </tr>
            ))}
          </tbody>
        </table>
        <table className="w-full border-collapse">
          <thead>
            <tr>
              <th className={th}>Detector</th>
              <th className={th}>IF band (GHz)</th>
              <th className={th}>Max input per photodiode (mW)</th>
              <th className={th}>Sample rate (GHz)</th>
            </tr>
          </thead>
          <tbody>
            {detectors.map((d) => (
              <tr key={d.id}>
                <td className={td}>{d.key}</td>
                <td className={td}>{formatInterval([d.minGHz, d.maxGHz], "")}</td>
                <td className={td}>{formatNumber(d.maxInputMW, 2)}</td>
                <td className={td}>{d.sampleRateGHz === null ? "–" : formatGHz(d.sampleRateGHz)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </Section>
  );
}
