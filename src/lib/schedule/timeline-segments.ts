import type { ScheduleResult } from "@/lib/plan";

/** One stretch of a schedule's cycle, for the timeline chart (ms from the start of the cycle). */
export interface TimelineSegment {
  kind: "relock" | "retune" | "dwell" | "idle";
  /** The chain of the dwell the stretch belongs to (null for idle time). */
  chain: string | null;
  startMs: number;
  endMs: number;
}

/**
 * The stretches of one cycle of a schedule (docs/plan-format.md §13.3), in
 * time order: per dwell the carrier's relock (when there is one), the
 * retune of laser 2, then the usable time; then the idle rest of the
 * cycle. Zero-length stretches are left out; the last one ends at the
 * cycle time.
 */
export function timelineSegments(s: Pick<ScheduleResult, "dwells" | "cycleMs">): TimelineSegment[] {
  const out: TimelineSegment[] = [];
  let t = 0;
  const push = (kind: TimelineSegment["kind"], chain: string | null, ms: number) => {
    // a stretch too short to move the clock (a denormal retune, say) has no length to draw
    if (!(ms > 0) || t + ms === t) return;
    out.push({ kind, chain, startMs: t, endMs: t + ms });
    t += ms;
  };
  for (const d of s.dwells) {
    push("relock", d.chain, d.relockMs);
    push("retune", d.chain, d.retuneMs);
    push("dwell", d.chain, d.usableMs);
  }
  push("idle", null, s.cycleMs - t);
  return out;
}
