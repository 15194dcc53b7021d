import { useMemo, useState } from "react";
import { laneModelByChain, laneReference, type LaneModel, type LaneModelParts } from "@/lib/lanes";

type Args = Parameters<typeof laneModelByChain>;

/** A lane-model builder that keeps each chain's parts between calls. */
function incrementalBuilder() {
  let parts: LaneModelParts | null = null;
  return (plan: Args[0], result: Args[1], reference: Args[2]): LaneModel => {
    const built = laneModelByChain(plan, result, reference, parts);
    parts = built.parts;
    return built.model;
  };
}

/**
 * The lane model of the live plan, built chain by chain: while an LO moves,
 * only that chain's items are rebuilt (the builder lives as long as the view).
 */
export function useLaneModel(plan: Args[0], result: Args[1]): LaneModel {
  const reference = useMemo(() => laneReference(), []);
  const [build] = useState(incrementalBuilder);
  return useMemo(() => build(plan, result, reference), [build, plan, result, reference]);
}
