import { channelItems } from "./internals/channel-items";
import { envelopeItems } from "./internals/envelope-items";
import { extents } from "./internals/extents";
import { ifItems, ifLane } from "./internals/if-lane";
import { laneIndex } from "./internals/lane-index";
import { opticalItems, opticalLane } from "./internals/optical-lane";
import { referenceItems, rfHull } from "./internals/reference-items";
import { rfChainItems, rfLane } from "./internals/rf-lane";
import type { Lane, LaneItem, LaneModel, LanePlanInput, LaneReferenceInput, LaneResultInput } from "./types";

/**
 * Turn a plan and its result document into the lane view's data model: the RF
 * lane (protected bands, line centres, RF input passbands, resonator mode
 * passbands, channel passbands with DSB pairs linked, image bands), one
 * optical-offset lane per receiver chain (reach, feasibility map, carrier,
 * lock sidebands ±m·fm, wanted sidebands, LO with drift) and one IF lane per
 * chain (detector band, Nyquist edges, guard/occupied/slot per channel, spur
 * products by family and order).
 *
 * Optical offsets of a lower-sideband chain are drawn at `s·x` (mirrored) so
 * they line up with the RF frequencies they carry on the shared GHz axis; the
 * facts always give the signed offset.
 *
 * On the RF lane the operating envelope is drawn faintly: each channel's
 * received band at the envelope's ends (LO shift ±D, for an IF filter on
 * the slot) and the wanted mode over the chain's temperature control ±Te.
 *
 * Items are listed as built: the reference items first, then the envelope
 * items (beneath the rest), then per chain its
 * RF input and modes, per channel its passbands, wanted sidebands and image,
 * and per chain its optical-offset and IF items.
 */
export function buildLaneModel(
  plan: LanePlanInput,
  result: LaneResultInput,
  reference: LaneReferenceInput = { lines: [], protectedBands: [] },
): LaneModel {
  const index = laneIndex(plan, result);
  const items: LaneItem[] = [];
  const lanes: Lane[] = [rfLane()];
  // The envelope's faint bands first, so they are drawn beneath the nominal items.
  envelopeItems(plan, index, items);
  rfChainItems(plan, index, items);
  channelItems(plan, index, items);
  for (const chain of plan.chains) {
    lanes.push(opticalLane(chain), ifLane(chain));
    opticalItems(chain, index, items);
    ifItems(plan, result, chain, index, items);
  }
  const rf = rfHull(items);
  const all = [...referenceItems(reference, rf), ...items];
  return { lanes, items: all, ...extents(lanes, all, items, rf) };
}
