import type { PlanResult } from "@/queries/types";
import { NedtBars } from "../schedule/nedt-bars";
import { TimelineChart } from "../schedule/timeline-chart";
import { Section, td, th } from "./section";

/** The report's observation schedules (docs/plan-format.md §13): per laser pair its cycle, dwells and NEΔT against requirement. */
export function SchedulesSection({ result }: { result: PlanResult | null | undefined }) {
  const schedules = result?.schedules ?? [];
  if (schedules.length === 0) return null;
  return (
    <Section title="Observation schedules">
      {schedules.map((s) => (
        <div key={s.laser} className="mb-3" data-testid={`report-schedule-${s.laser}`}>
          <p className="mb-1">
            Laser pair <strong>{s.laser}</strong>: cycle {s.cycleMs} ms (planned {s.plannedCycleMs} ms, idle{" "}
            {s.idleMs.toFixed(3)} ms).
          </p>
          <table className="mb-2 w-full border-collapse text-xs">
            <thead>
              <tr>
                {[
                  "Chain",
                  "Dwell (ms)",
                  "LO change (GHz)",
                  "Retune (ms)",
                  "Relock (ms)",
                  "Usable (ms)",
                  "Duty (%)",
                ].map((h) => (
                  <th key={h} className={th}>
                    {h}
                  </th>
                ))}
              </tr>
            </thead>
            <tbody>
              {s.dwells.map((d) => (
                <tr key={d.chain}>
                  <td className={td}>{d.chain}</td>
                  <td className={td}>{d.dwellMs}</td>
                  <td className={td}>{d.loStepGHz.toFixed(3)}</td>
                  <td className={td}>{d.retuneMs.toFixed(3)}</td>
                  <td className={td}>{d.relockMs.toFixed(3)}</td>
                  <td className={td}>{d.usableMs.toFixed(3)}</td>
                  <td className={td}>{(d.dutyCycle * 100).toFixed(2)}</td>
                </tr>
              ))}
            </tbody>
          </table>
          <TimelineChart schedule={s} />
          <NedtBars schedule={s} />
        </div>
      ))}
    </Section>
  );
}
