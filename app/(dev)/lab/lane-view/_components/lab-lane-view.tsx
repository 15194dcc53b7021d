"use client";

import { useMemo } from "react";
import { parsePlan } from "@/schemas/plan";
import { demoPlan } from "@/lib/lanes";
import { LaneView } from "@/components/lane-view/lane-view";
import type { FrameTime } from "@/components/lane-view/use-live-recheck";

declare global {
  interface Window {
    /** Frame times of the live re-check (ms), read by the lane view benchmark. */
    __laneFrames?: FrameTime[];
  }
}

function recordFrame(t: FrameTime) {
  (window.__laneFrames ??= []).push(t);
}

export function LabLaneView({ name }: { name: string }) {
  const parsed = useMemo(() => {
    const m = /^demo(\d+)$/.exec(name);
    const raw = m ? demoPlan(Number(m[1])) : undefined;
    if (raw === undefined)
      return { ok: false as const, message: `Unknown plan "${name}": use demoN (for example demo64).` };
    const p = parsePlan(raw);
    return p.ok
      ? { ok: true as const, plan: p.plan }
      : { ok: false as const, message: p.issues.map((i) => `${i.path}: ${i.message}`).join("; ") };
  }, [name]);
  if (!parsed.ok)
    return (
      <p role="alert" className="text-sev-error">
        {parsed.message}
      </p>
    );
  return (
    <>
      <p className="mb-2 text-sm text-ink">
        {parsed.plan.name} · {parsed.plan.chains.length} chains · {parsed.plan.channels.length} channels
      </p>
      <LaneView plan={parsed.plan} result={null} onFrame={recordFrame} />
    </>
  );
}
