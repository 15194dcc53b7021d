"use client";

import { ChannelEnvelopePlot } from "@/components/envelope/channel-envelope-plot";
import { TemperatureMapChart } from "@/components/envelope/temperature-map-chart";
import { temperatureMapCells } from "@/lib/lanes";
import { envelopeCurves, temperatureMap, type ResultDocument } from "@/lib/plan";
import type { Plan } from "@/schemas/plan";
import { Section } from "./section";

/**
 * The report's envelope plots as static SVG (docs/decisions/029): per chain,
 * its feasibility over LO offset × temperature offset, then for each of its
 * channels NEΔT and mode response against the LO shift and the temperature.
 */
export function EnvelopePlotsSection({ plan, result }: { plan: Plan | undefined; result: ResultDocument | null }) {
  if (!plan || !result) return null;
  return (
    <Section title="Envelope plots">
      <div className="space-y-4" data-testid="report-envelope-plots">
        {plan.chains.map((chain) => {
          const r = result.chains.find((c) => c.id === chain.id);
          const map = temperatureMap(plan, chain.id, { rows: 21 });
          return (
            <div key={chain.id} className="break-inside-avoid-page">
              <TemperatureMapChart
                map={map}
                cells={temperatureMapCells(map, chain.loOffsetGHz)}
                loGHz={chain.loOffsetGHz}
                windowK={r?.temperatureWindowK ?? []}
                marginK={r?.temperatureMarginK ?? null}
                interactive={false}
              />
              <div className="mt-2 flex flex-wrap gap-4">
                {plan.channels
                  .filter((c) => c.chain === chain.id)
                  .map((c) => (
                    <div key={c.id} className="flex break-inside-avoid-page gap-2">
                      <ChannelEnvelopePlot
                        curve={envelopeCurves(plan, c.id, { axis: "lo" })}
                        title={`${c.id}: against the LO shift`}
                        interactive={false}
                      />
                      <ChannelEnvelopePlot
                        curve={envelopeCurves(plan, c.id, { axis: "temperature" })}
                        title={`${c.id}: against the temperature`}
                        interactive={false}
                      />
                    </div>
                  ))}
              </div>
            </div>
          );
        })}
      </div>
    </Section>
  );
}
