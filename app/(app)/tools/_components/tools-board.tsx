"use client";

import { useState } from "react";
import {
  ChannelNotation,
  DriftBudget,
  OpticalFrequency,
  ReceiverNoise,
  ResonatorSizing,
  WavelengthGrid,
} from "@/components/tools";

interface Applied {
  what: string;
  value: string;
}

/**
 * The helpers side by side. On this page no form receives an applied value,
 * so Apply records it in a small "last applied" line instead.
 */
export function ToolsBoard() {
  const [applied, setApplied] = useState<Applied | null>(null);
  const [carrierTHz, setCarrierTHz] = useState(193.4);

  return (
    <div className="mt-6 space-y-6">
      <div
        className="rounded border border-ink-faint bg-ink-faint/30 px-4 py-2 text-sm"
        aria-live="polite"
        data-testid="tools-applied"
      >
        {applied ? (
          <>
            Last applied: <strong>{applied.what}</strong> = <span className="font-mono">{applied.value}</span>
          </>
        ) : (
          "Apply a result to see the value a form would receive."
        )}
      </div>
      <p className="text-sm text-ink-soft">
        Carrier in use on this page: <OpticalFrequency thz={carrierTHz} />
      </p>
      <div className="grid grid-cols-1 gap-6 lg:grid-cols-2">
        <WavelengthGrid
          initialTHz={carrierTHz}
          onApply={(thz) => {
            setCarrierTHz(thz);
            setApplied({ what: "carrier (THz)", value: String(thz) });
          }}
          applyLabel="Apply carrier"
        />
        <ResonatorSizing
          initialCarrierTHz={carrierTHz}
          onApply={(v) => setApplied({ what: "resonator FSR (GHz), loaded Q", value: `${v.fsrGHz}, ${v.loadedQ}` })}
        />
        <DriftBudget
          initialCarrierTHz={carrierTHz}
          onApply={(mhz) => setApplied({ what: "drift (MHz)", value: String(mhz) })}
        />
        <ReceiverNoise onApply={(k) => setApplied({ what: "receiver noise (K)", value: String(k) })} />
        <ChannelNotation
          onApply={(ch) =>
            setApplied({
              what: "channel centre (GHz), DSB offset (GHz), bandwidth (MHz)",
              value: `${ch.centerGHz}, ${ch.dsbOffsetGHz ?? "none"}, ${ch.bandwidthMHz}`,
            })
          }
        />
      </div>
    </div>
  );
}
