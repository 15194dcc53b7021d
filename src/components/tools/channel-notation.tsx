"use client";

import { useId, useState } from "react";
import { type ChannelSpec, channelPassbands, parseChannelNotation } from "@/lib/optics";
import { formatFixed } from "./format";
import { ApplyButton, type ApplyProps, HelperCard, ResultRow, Working } from "./internals/helper-card";

/** Props; `onApply` receives the channel fields { centerGHz, dsbOffsetGHz, bandwidthMHz }. */
export interface ChannelNotationProps extends ApplyProps<ChannelSpec> {
  /** Starting text, e.g. "183.311 ± 3.00 GHz, 2 × 1000 MHz". */
  initialText?: string;
  /** Bandwidth used when the text has none: MHz, or a text such as "2 x 500 MHz". */
  initialBandwidth?: string;
}

const PART_LABEL = {
  centre: "Centre",
  offset: "DSB offset",
  bandwidth: "Bandwidth",
  notation: "Notation",
} as const;

/** Read a channel written as in sounder tables and show its passbands. */
export function ChannelNotation({
  initialText = "183.311 ± 3.00 GHz, 2 × 1000 MHz",
  initialBandwidth = "",
  onApply,
  applyLabel = "Apply channel",
}: ChannelNotationProps) {
  const id = useId();
  const [text, setText] = useState(initialText);
  const [bandwidth, setBandwidth] = useState(initialBandwidth);
  const bwOption = bandwidth.trim() === "" ? null : /^\s*[\d.]+\s*$/.test(bandwidth) ? Number(bandwidth) : bandwidth;
  const parsed = parseChannelNotation(text, { bandwidth: bwOption });
  const channel = parsed.ok ? parsed.value : null;
  const error = parsed.ok ? null : parsed.error;
  const errorId = `${id}-error`;

  return (
    <HelperCard
      id="channel-notation"
      title="Channel notation"
      summary="Read a channel as sounder tables write it (f0 ± d, 2 × b) into centre, DSB offset and bandwidth."
    >
      <label htmlFor={`${id}-text`} className="text-sm font-medium text-ink">
        Channel
      </label>
      <input
        id={`${id}-text`}
        type="text"
        autoComplete="off"
        value={text}
        onChange={(e) => setText(e.target.value)}
        aria-invalid={error && error.part !== "bandwidth" ? true : undefined}
        aria-describedby={errorId}
        className="mt-1 w-full rounded border border-ink-faint px-2 py-1 font-mono text-sm"
      />
      <label htmlFor={`${id}-bw`} className="mt-2 block text-sm font-medium text-ink">
        Bandwidth, if not in the text (MHz, or e.g. “2 x 500 MHz”)
      </label>
      <input
        id={`${id}-bw`}
        type="text"
        autoComplete="off"
        value={bandwidth}
        onChange={(e) => setBandwidth(e.target.value)}
        aria-invalid={error?.part === "bandwidth" ? true : undefined}
        aria-describedby={errorId}
        className="mt-1 w-full rounded border border-ink-faint px-2 py-1 font-mono text-sm"
      />
      <p id={errorId} role={error ? "alert" : undefined} className="min-h-5 mt-1 text-sm text-sev-error">
        {error ? `${PART_LABEL[error.part]}: ${error.message}` : ""}
      </p>
      <div className="mt-1">
        <ResultRow label="Centre" value={channel ? String(channel.centerGHz) : "—"} unit="GHz" testId="cn-centre" />
        <ResultRow
          label="DSB offset"
          value={channel ? (channel.dsbOffsetGHz === null ? "single sideband" : String(channel.dsbOffsetGHz)) : "—"}
          unit={channel?.dsbOffsetGHz != null ? "GHz" : undefined}
        />
        <ResultRow label="Bandwidth per passband" value={channel ? String(channel.bandwidthMHz) : "—"} unit="MHz" />
        {channel
          ? channelPassbands(channel).map((p, i) => (
              <ResultRow
                key={i}
                label={`Passband ${i + 1}`}
                value={`${formatFixed(p.minGHz, 4)} – ${formatFixed(p.maxGHz, 4)}`}
                unit="GHz"
                testId={`cn-passband-${i + 1}`}
              />
            ))
          : null}
      </div>
      {onApply ? (
        <ApplyButton label={applyLabel} disabled={!channel} onClick={() => channel && onApply(channel)} />
      ) : null}
      <Working
        formulas={[
          "f0 ± d, 2 × b → passbands [f0 − d − b/2, f0 − d + b/2] and [f0 + d − b/2, f0 + d + b/2]",
          "f0, b → [f0 − b/2, f0 + b/2]",
        ]}
        inputs={[
          ["text", text],
          ["bandwidth", bandwidth.trim() === "" ? "from the text" : bandwidth],
        ]}
        sources={[
          "Notation of the MHS, AMSU-B and ICI channel tables (double sideband f0 ± d, bandwidth “2 × b” per sideband)",
          "Quadruple-sideband channels (f0 ± d1 ± d2) are not in model v1",
        ]}
      />
    </HelperCard>
  );
}
