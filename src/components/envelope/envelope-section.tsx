"use client";

import { memo, useEffect, useState } from "react";
import { temperatureMapCells } from "@/lib/lanes";
import { envelopeCurves, temperatureMap, type ResultDocument, type TemperatureMap } from "@/lib/plan";
import type { Plan } from "@/schemas/plan";
import { ChannelEnvelopePlot } from "./channel-envelope-plot";
import { TemperatureMapChart } from "./temperature-map-chart";

/** The plan is redrawn here once it has not changed for this long (ms). */
const SETTLE_MS = 250;

/** `value`, or its last value until it has stayed the same for `ms`. */
function useSettled<T>(value: T, ms: number): T {
  const [settled, setSettled] = useState(value);
  useEffect(() => {
    if (settled === value) return;
    const timer = setTimeout(() => setSettled(value), ms);
    return () => clearTimeout(timer);
  }, [value, settled, ms]);
  return settled;
}

/** The last few temperature maps, keyed on the plan without the chain's LO (the map does not depend on it). */
const MAP_CACHE = new Map<string, TemperatureMap>();

function cachedTemperatureMap(plan: Plan, chainId: string): TemperatureMap {
  const key = JSON.stringify({
    chainId,
    plan: { ...plan, chains: plan.chains.map((c) => (c.id === chainId ? { ...c, loOffsetGHz: 0 } : c)) },
  });
  let map = MAP_CACHE.get(key);
  if (!map) {
    map = temperatureMap(plan, chainId, { rows: 21 });
    if (MAP_CACHE.size >= 8) MAP_CACHE.delete(MAP_CACHE.keys().next().value!);
    MAP_CACHE.set(key, map);
  }
  return map;
}

/**
 * The lane view's envelope plots (docs/decisions/029): for one chain (chosen
 * here), the feasibility map over LO offset × temperature offset, and for one
 * of its channels the NEΔT and mode response against the LO shift and
 * against the temperature. Drawn from the live plan once it has settled
 * (no change for `SETTLE_MS`), so that dragging an LO costs nothing here.
 */
export function EnvelopeSection({ plan, result }: { plan: Plan; result: ResultDocument }) {
  return <EnvelopeBody plan={useSettled(plan, SETTLE_MS)} result={useSettled(result, SETTLE_MS)} />;
}

/** The section itself, re-rendered only when the settled plan or result (or a choice) changes. */
const EnvelopeBody = memo(function EnvelopeBody({ plan: live, result }: { plan: Plan; result: ResultDocument }) {
  const [chainPick, setChainPick] = useState<string | null>(null);
  const [channelPick, setChannelPick] = useState<string | null>(null);
  const chain = live.chains.find((c) => c.id === chainPick) ?? live.chains[0];
  const channels = live.channels.filter((c) => c.chain === chain?.id);
  const channel = channels.find((c) => c.id === channelPick) ?? channels[0];
  const map = chain ? cachedTemperatureMap(live, chain.id) : null;
  const curves = channel
    ? {
        lo: envelopeCurves(live, channel.id, { axis: "lo" }),
        temperature: envelopeCurves(live, channel.id, { axis: "temperature" }),
      }
    : null;
  if (!chain || !map) return null;
  const r = result.chains.find((c) => c.id === chain.id);
  const cells = temperatureMapCells(map, chain.loOffsetGHz);
  return (
    <section
      className="rounded border border-ink-faint p-3"
      aria-label="Operating envelope"
      data-testid="envelope-section"
    >
      <div className="flex flex-wrap items-center gap-3 text-sm">
        <h2 className="font-semibold">Operating envelope</h2>
        <label className="flex items-center gap-1">
          Chain
          <select
            className="rounded border border-ink-faint px-1 py-0.5"
            value={chain.id}
            onChange={(e) => {
              setChainPick(e.target.value);
              setChannelPick(null);
            }}
            data-testid="envelope-chain"
          >
            {live.chains.map((c) => (
              <option key={c.id} value={c.id}>
                {c.id}
              </option>
            ))}
          </select>
        </label>
        {channels.length ? (
          <label className="flex items-center gap-1">
            Channel
            <select
              className="rounded border border-ink-faint px-1 py-0.5"
              value={channel?.id}
              onChange={(e) => setChannelPick(e.target.value)}
              data-testid="envelope-channel"
            >
              {channels.map((c) => (
                <option key={c.id} value={c.id}>
                  {c.id} {c.name}
                </option>
              ))}
            </select>
          </label>
        ) : null}
      </div>
      <div className="mt-2 flex flex-wrap gap-6">
        <TemperatureMapChart
          map={map}
          cells={cells}
          loGHz={chain.loOffsetGHz}
          windowK={r?.temperatureWindowK ?? []}
          marginK={r?.temperatureMarginK ?? null}
        />
        {curves && channel ? (
          <>
            <ChannelEnvelopePlot curve={curves.lo} title={`${channel.id}: against the LO shift`} />
            <ChannelEnvelopePlot curve={curves.temperature} title={`${channel.id}: against the temperature`} />
          </>
        ) : (
          <p className="text-sm text-ink-soft">This chain has no channels.</p>
        )}
      </div>
    </section>
  );
});
