"use client";

import { useCallback, useEffect, useRef, useState } from "react";
import { flushSync } from "react-dom";
import type { Plan } from "@/schemas/plan";
import { checkPlan, type ResultDocument } from "@/lib/plan";
import { recheckAtOffset } from "@/lib/lanes";
import { type PreparedChain as ChainContext, prepareChain as chainContext } from "@/lib/plan";

export interface LiveState {
  plan: Plan;
  result: ResultDocument;
}

/** Snap an offset to the laser pair's tuning step (any offset when the step is 0). */
function snap(plan: Plan, chainId: string, L: number): number {
  const chain = plan.chains.find((c) => c.id === chainId);
  const laser = plan.lasers.find((l) => l.id === chain?.laser);
  const step = (laser?.stepMHz ?? 0) / 1000;
  if (!(step > 0)) return L;
  return Number((Math.round(L / step) * step).toFixed(9));
}

/** Time of one live re-check: `workMs` = re-check + React render and commit + style and layout; `frameMs` = to the next animation frame. */
export interface FrameTime {
  workMs: number;
  frameMs: number;
}

/**
 * The working plan and result of the lane view, re-checked in the browser
 * whenever a chain's LO moves. Moves are coalesced to one re-check per
 * animation frame; the update is committed synchronously and layout forced,
 * so `onFrame` gets the time of the whole update and the time to the next
 * animation frame (milliseconds).
 */
export function useLiveRecheck(
  initialPlan: Plan,
  initialResult: ResultDocument | null,
  onFrame?: (t: FrameTime) => void,
) {
  const [state, setState] = useState<LiveState>(() => ({
    plan: initialPlan,
    result: initialResult ?? checkPlan(initialPlan),
  }));
  const [error, setError] = useState<string | null>(null);
  const stateRef = useRef(state);
  const pending = useRef<{ chain: string; L: number } | null>(null);
  const raf = useRef<number | null>(null);
  const ctxCache = useRef<{ plan: Plan; chain: string; ctx: ChainContext } | null>(null);

  // A new plan from the server (after a save or a refetch) replaces the working copy.
  const [seen, setSeen] = useState({ initialPlan, initialResult });
  if (seen.initialPlan !== initialPlan || seen.initialResult !== initialResult) {
    setSeen({ initialPlan, initialResult });
    const next = { plan: initialPlan, result: initialResult ?? checkPlan(initialPlan) };
    setState(next);
  }
  useEffect(() => {
    stateRef.current = state;
  }, [state]);
  const onFrameRef = useRef(onFrame);
  useEffect(() => {
    onFrameRef.current = onFrame;
  });

  const run = useCallback(() => {
    raf.current = null;
    const p = pending.current;
    pending.current = null;
    if (!p) return;
    const t0 = performance.now();
    try {
      const cur = stateRef.current;
      const L = snap(cur.plan, p.chain, p.L);
      const chain = cur.plan.chains.find((c) => c.id === p.chain);
      if (!chain || chain.loOffsetGHz === L) return;
      // The chain's context does not depend on its LO: build it once per drag.
      let cached = ctxCache.current;
      if (!cached || cached.chain !== p.chain || !sameExceptLo(cached.plan, cur.plan)) {
        cached = { plan: cur.plan, chain: p.chain, ctx: chainContext(cur.plan, p.chain) };
        ctxCache.current = cached;
      }
      const next = recheckAtOffset(cur.plan, cur.result, p.chain, L, cached.ctx);
      stateRef.current = next;
      flushSync(() => {
        setState(next);
        setError(null);
      });
      // Reading a layout property makes the browser apply styles and lay out now.
      void document.body.offsetHeight;
      const workMs = performance.now() - t0;
      requestAnimationFrame(() => onFrameRef.current?.({ workMs, frameMs: performance.now() - t0 }));
    } catch (e) {
      setError(`The re-check failed: ${(e as Error).message}`);
    }
  }, []);

  /** Move chain `chainId`'s LO to `L` (GHz, signed offset); re-checked on the next frame. */
  const moveLo = useCallback(
    (chainId: string, L: number) => {
      pending.current = { chain: chainId, L };
      if (raf.current === null) raf.current = requestAnimationFrame(run);
    },
    [run],
  );

  /** Move now, without waiting for a frame (buttons, keys). */
  const setLo = useCallback(
    (chainId: string, L: number) => {
      pending.current = { chain: chainId, L };
      if (raf.current !== null) cancelAnimationFrame(raf.current);
      run();
    },
    [run],
  );

  /** A full engine run of the working plan (feasibility maps included). */
  const fullCheck = useCallback(() => {
    try {
      const cur = stateRef.current;
      const next = { plan: cur.plan, result: checkPlan(cur.plan) };
      stateRef.current = next;
      setState(next);
    } catch (e) {
      setError(`The re-check failed: ${(e as Error).message}`);
    }
  }, []);

  const reset = useCallback(() => {
    const next = { plan: initialPlan, result: initialResult ?? checkPlan(initialPlan) };
    stateRef.current = next;
    setState(next);
  }, [initialPlan, initialResult]);

  return { ...state, error, moveLo, setLo, fullCheck, reset };
}

function sameExceptLo(a: Plan, b: Plan): boolean {
  if (a === b) return true;
  if (
    a.channels !== b.channels ||
    a.lasers !== b.lasers ||
    a.resonators !== b.resonators ||
    a.detectors !== b.detectors ||
    a.settings !== b.settings
  )
    return false;
  if (a.chains.length !== b.chains.length) return false;
  return a.chains.every((c, i) => {
    const d = b.chains[i]!;
    return (
      c === d ||
      (c.id === d.id &&
        c.laser === d.laser &&
        c.resonator === d.resonator &&
        c.detector === d.detector &&
        c.mode === d.mode &&
        c.sideband === d.sideband &&
        c.rfInput === d.rfInput)
    );
  });
}
