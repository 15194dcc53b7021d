import { TemperatureWindowLine } from "@/components/envelope/temperature-window-line";
import { explainCode } from "@/lib/lanes";
import { placeReasonText, type ResultDocument } from "@/lib/plan";
import type { Plan } from "@/schemas/plan";
import { SEVERITY_COLOUR } from "../vocabulary";
import { fmt } from "./format";
import type { SaveState } from "./use-lo-save";

export interface ChainControlsProps {
  plan: Plan;
  result: ResultDocument;
  canSave: boolean;
  saveState: SaveState;
  onPlace: (chain: string, L: number) => void;
  onSave: (chain: string) => void;
  onSet: (chain: string, L: number) => void;
}

/** Each chain's LO: typed in, placed in the feasibility map, saved as a revision, and whether it is feasible now. */
export function ChainControls({ plan, result, canSave, saveState, onPlace, onSave, onSet }: ChainControlsProps) {
  return (
    <div className="grid gap-2 md:grid-cols-2" aria-label="LO of each receiver chain">
      {plan.chains.map((c) => {
        const r = result.chains.find((x) => x.id === c.id);
        const L = c.loOffsetGHz;
        const blocked = r?.excludedGHz.find((e) => L >= e.bandGHz[0] && L <= e.bandGHz[1]);
        const feasible = r?.feasibleGHz.some(([a, b]) => L >= a && L <= b) ?? false;
        const st = saveState[c.id];
        return (
          <div key={c.id} className="rounded border border-ink-faint p-2 text-sm" data-chain={c.id}>
            <div className="flex flex-wrap items-center gap-2">
              <span className="font-semibold">Chain {c.id}</span>
              <label className="flex items-center gap-1">
                LO
                <input
                  key={L}
                  className="w-28 rounded border border-ink-faint px-1 py-0.5 text-right tabular-nums"
                  defaultValue={L}
                  inputMode="decimal"
                  aria-label={`LO offset of chain ${c.id} in GHz`}
                  data-testid={`lo-input-${c.id}`}
                  onKeyDown={(e) => {
                    if (e.key !== "Enter") return;
                    const v = Number((e.target as HTMLInputElement).value);
                    if (Number.isFinite(v)) onSet(c.id, v);
                  }}
                />
                GHz
              </label>
              <button
                type="button"
                className="rounded bg-ink px-2 py-0.5 text-white disabled:opacity-40"
                disabled={r?.placeGHz == null}
                title={
                  r?.placeGHz == null
                    ? `No LO to suggest: ${placeReasonText(r?.placeReason) ?? "no result yet"}`
                    : `Set the LO to ${fmt(r.placeGHz)} GHz, the middle of the widest feasible interval`
                }
                onClick={() => r?.placeGHz != null && onPlace(c.id, r.placeGHz)}
                data-testid={`place-${c.id}`}
              >
                Place{r?.placeGHz != null ? ` (${fmt(r.placeGHz)})` : ""}
              </button>
              {canSave ? (
                <button
                  type="button"
                  className="rounded border border-ink px-2 py-0.5 disabled:opacity-40"
                  disabled={st?.busy}
                  onClick={() => onSave(c.id)}
                  data-testid={`save-${c.id}`}
                >
                  {st?.busy ? "Saving…" : "Save as revision"}
                </button>
              ) : null}
            </div>
            <div className="mt-1 text-xs" data-testid={`lo-status-${c.id}`} aria-live="polite">
              {feasible ? (
                <span style={{ color: "#2e7d32" }}>LO inside the feasibility map.</span>
              ) : blocked ? (
                <span style={{ color: SEVERITY_COLOUR.error }}>
                  LO blocked by {blocked.codes.join(", ")} ({fmt(blocked.bandGHz[0])} to {fmt(blocked.bandGHz[1])} GHz):{" "}
                  {blocked.codes.map(explainCode).join(" ")}
                </span>
              ) : (
                <span style={{ color: SEVERITY_COLOUR.error }}>LO outside every reach interval of the laser pair.</span>
              )}
            </div>
            <TemperatureWindowLine
              chainId={c.id}
              excursionK={c.temperatureExcursionK}
              windowK={r?.temperatureWindowK}
              marginK={r?.temperatureMarginK}
            />
            {st?.message ? (
              <div
                className={`mt-1 text-xs ${st.error ? "text-sev-error" : "text-sev-ok"}`}
                role="status"
                data-testid={`save-status-${c.id}`}
              >
                {st.message}
              </div>
            ) : null}
          </div>
        );
      })}
    </div>
  );
}
