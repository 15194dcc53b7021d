import { LINE_CENTRES, PROTECTED_BANDS } from "@/lib/reference";
import { Section } from "./section";

/** Where the report's rules, formulas and reference values come from. */
export function SourcesSection() {
  const lineSources = [...new Set(LINE_CENTRES.map((l) => l.source))];
  const bandSources = [...new Set(PROTECTED_BANDS.map((b) => b.source))];
  return (
    <Section title="Sources of reference values">
      <ul className="list-disc pl-5 text-xs">
        <li>
          Rules, units and the result document: the Heterolane plan format, version 1 (docs/plan-format.md:
          heterolane.plan/1, heterolane.result/1).
        </li>
        <li>
          NEΔT: the total-power radiometer equation with gain fluctuations, (T_A + T_R)·√(1/(Bτ) + (ΔG/G)²), generalised
          to the resonator response (F. T. Ulaby, D. G. Long, Microwave Radar and Radiometric Remote Sensing, 2014; N.
          Skou, D. M. Le Vine, Microwave Radiometer Systems: Design and Analysis, 2nd ed.).
        </li>
        <li>Lock sideband amplitudes: Bessel functions of the first kind J_m(β) of phase modulation.</li>
        {bandSources.map((s) => (
          <li key={s}>Protected passive bands: {s}.</li>
        ))}
        {lineSources.map((s) => (
          <li key={s}>Line centres: {s}.</li>
        ))}
      </ul>
    </Section>
  );
}
