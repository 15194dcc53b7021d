"use client";

import { useId } from "react";
import { waiverText, type WaiverNote } from "./waiver-words";

/**
 * "waived" beside a finding that carries a waiver. Who and why show on
 * hover and on keyboard focus (the mark is focusable and its tooltip is
 * its accessible description), not by colour alone.
 */
export function WaivedMark({ waiver }: { waiver: WaiverNote }) {
  const id = useId();
  const text = waiverText(waiver);
  return (
    <span className="group relative inline-flex" data-testid="waived">
      <span
        tabIndex={0}
        aria-describedby={id}
        className="cursor-help rounded bg-emerald-50 px-1.5 py-0.5 text-[11px] font-semibold uppercase tracking-wide text-emerald-900 ring-1 ring-emerald-300 focus:outline-none focus:ring-2 focus:ring-emerald-700"
      >
        waived
      </span>
      <span
        id={id}
        role="tooltip"
        className="invisible absolute left-0 top-full z-20 mt-1 w-72 rounded border border-emerald-300 bg-white px-2 py-1 text-xs font-normal normal-case tracking-normal text-ink shadow group-focus-within:visible group-hover:visible"
      >
        {text}
      </span>
    </span>
  );
}
