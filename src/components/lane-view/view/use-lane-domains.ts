import { useCallback, useMemo, useState } from "react";
import {
  GHZ_LIMITS,
  IF_LIMITS,
  clampDomain,
  zoomAbout,
  zoomToItem,
  type Domain,
  type LaneItem,
  type LaneModel,
} from "@/lib/lanes";
import type { Plan } from "@/schemas/plan";

function initialDomain(extent: Domain): Domain {
  const pad = Math.max(0.5, (extent[1] - extent[0]) * 0.03);
  return clampDomain([extent[0] - pad, extent[1] + pad], [extent[0] - pad, extent[1] + pad], GHZ_LIMITS);
}

/**
 * The two visible ranges of the lane view (the shared GHz axis and the IF
 * axis), their reset view (from the first model of the plan) and pan
 * bounds, with every way of changing them: wheel and buttons (`onZoom`),
 * zoom to an item, zoom to a channel, reset.
 *
 * `lanesRef` holds the current lanes, so `zoomTo` stays the same function
 * across live re-checks (the memoised lanes compare it).
 */
export function useLaneDomains(
  plan: Plan,
  model: LaneModel,
  lanesRef: { readonly current: { lanes: LaneModel["lanes"] } },
) {
  // Domains: start from the model's extent; the extent of the first model sets the reset view.
  const home = useMemo(() => initialDomain(model.focusGHz), [plan]); // eslint-disable-line react-hooks/exhaustive-deps
  const homeIf = useMemo<Domain>(
    () => [Math.min(0, model.extentIF[0]), Math.max(0.1, model.extentIF[1] * 1.04)],
    // eslint-disable-next-line react-hooks/exhaustive-deps -- the reset view follows the plan, not each live model
    [plan],
  );
  const [domain, setDomain] = useState<Domain>(home);
  const [ifDomain, setIfDomain] = useState<Domain>(homeIf);
  const bounds = useMemo<Domain>(
    () => [Math.min(home[0], model.extentGHz[0], 0) - 10, Math.max(home[1], model.extentGHz[1]) + 10],
    // eslint-disable-next-line react-hooks/exhaustive-deps -- the pan bounds follow the reset view
    [home],
  );
  const ifBounds = useMemo<Domain>(() => [Math.min(0, homeIf[0]) - 0.5, homeIf[1] + 1], [homeIf]);

  const onZoom = useCallback(
    (axis: "ghz" | "if", change: { factor: number; pivot: number } | { pan: number }) => {
      const limits = axis === "ghz" ? GHZ_LIMITS : IF_LIMITS;
      const b = axis === "ghz" ? bounds : ifBounds;
      const set = axis === "ghz" ? setDomain : setIfDomain;
      set((d) => {
        const next: Domain =
          "pan" in change ? [d[0] + change.pan, d[1] + change.pan] : zoomAbout(d, change.factor, change.pivot, limits);
        return clampDomain(next, b, limits);
      });
    },
    [bounds, ifBounds],
  );

  const zoomTo = useCallback(
    (item: LaneItem) => {
      const lane = lanesRef.current.lanes.find((l) => l.id === item.lane);
      if (lane?.axis === "if")
        setIfDomain(clampDomain(zoomToItem(item.lo, item.hi, 0.6, IF_LIMITS), ifBounds, IF_LIMITS));
      else setDomain(clampDomain(zoomToItem(item.lo, item.hi, 0.6, GHZ_LIMITS), bounds, GHZ_LIMITS));
    },
    [bounds, ifBounds, lanesRef],
  );

  const zoomToChannel = (channelId: string) => {
    const bands = model.items.filter((i) => i.channel === channelId && i.kind === "channel-band");
    const slot = model.items.find((i) => i.channel === channelId && i.kind === "guard");
    if (bands.length) {
      const lo = Math.min(...bands.map((b) => b.lo));
      const hi = Math.max(...bands.map((b) => b.hi));
      setDomain(clampDomain(zoomToItem(lo, hi, 0.6, GHZ_LIMITS), bounds, GHZ_LIMITS));
    }
    if (slot) setIfDomain(clampDomain(zoomToItem(slot.lo, slot.hi, 1, IF_LIMITS), ifBounds, IF_LIMITS));
  };

  const reset = () => {
    setDomain(home);
    setIfDomain(homeIf);
  };

  return { domain, ifDomain, onZoom, zoomTo, zoomToChannel, reset };
}
