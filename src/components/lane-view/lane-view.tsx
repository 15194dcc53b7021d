"use client";

import { useCallback, useEffect, useMemo, useRef, useState } from "react";
import type { Plan } from "@/schemas/plan";
import type { ResultDocument } from "@/lib/plan";
import {
  GHZ_LIMITS,
  IF_LIMITS,
  laneModelByChain,
  clampDomain,
  explainCode,
  laneReference,
  zoomAbout,
  zoomToItem,
  type Domain,
  type LaneItem,
  type LaneModelParts,
} from "@/lib/lanes";
import { LaneChart } from "./lane-chart";
import { LaneTable } from "./lane-table";
import { Legend } from "./legend";
import { useLiveRecheck, type FrameTime } from "./use-live-recheck";
import { SEVERITY_COLOUR } from "./vocabulary";

export interface SaveOutcome {
  revision: number | null;
  errors: number;
  warnings: number;
  /** The server's own re-check of the saved plan, when it sent one. */
  result: ResultDocument | null;
}

export interface LaneViewProps {
  plan: Plan;
  /** The stored result of the plan (null: check it here). */
  result: ResultDocument | null;
  /** Save a chain's LO as a new plan revision; absent on read-only views. */
  onSaveLo?: (chainId: string, loOffsetGHz: number) => Promise<SaveOutcome>;
  /** Called with the time of every live re-check frame (ms). */
  onFrame?: (t: FrameTime) => void;
}

function fmt(v: number, d = 3): string {
  return v.toFixed(d).replace("-", "−");
}

function initialDomain(extent: Domain): Domain {
  const pad = Math.max(0.5, (extent[1] - extent[0]) * 0.03);
  return clampDomain([extent[0] - pad, extent[1] + pad], [extent[0] - pad, extent[1] + pad], GHZ_LIMITS);
}

/**
 * The lane view: the whole plan on shared frequency axes, the feasibility
 * map of each receiver chain, live re-check while an LO is dragged, place,
 * save as revision, details of any item and a table view of the same data.
 */
export function LaneView({ plan, result, onSaveLo, onFrame }: LaneViewProps) {
  // The frame time is written straight into the page (no re-render per frame).
  const frameText = useRef<HTMLSpanElement>(null);
  const onFrameRef = useRef(onFrame);
  useEffect(() => {
    onFrameRef.current = onFrame;
  });
  const reportFrame = useCallback((t: FrameTime) => {
    if (frameText.current) frameText.current.textContent = ` · last re-check + render ${t.workMs.toFixed(1)} ms`;
    onFrameRef.current?.(t);
  }, []);
  const live = useLiveRecheck(plan, result, reportFrame);
  const reference = useMemo(() => laneReference(), []);
  // Built chain by chain: while an LO moves, only that chain's items are rebuilt.
  const [modelCache] = useState<{ parts: LaneModelParts | null }>(() => ({ parts: null }));
  const model = useMemo(() => {
    const built = laneModelByChain(live.plan, live.result, reference, modelCache.parts);
    modelCache.parts = built.parts;
    return built.model;
  }, [live.plan, live.result, reference, modelCache]);
  const [view, setView] = useState<"chart" | "table">("chart");
  const [selected, setSelected] = useState<LaneItem | null>(null);
  const [saveState, setSaveState] = useState<Record<string, { busy: boolean; message: string | null; error: boolean }>>(
    {},
  );

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

  const wrapRef = useRef<HTMLDivElement>(null);
  const [width, setWidth] = useState(1100);
  const [ready, setReady] = useState(false);
  useEffect(() => {
    const el = wrapRef.current;
    if (!el) return;
    setWidth(Math.max(480, Math.floor(el.getBoundingClientRect().width)));
    setReady(true);
    const ro = new ResizeObserver(([e]) => e && setWidth(Math.max(480, Math.floor(e.contentRect.width))));
    ro.observe(el);
    return () => ro.disconnect();
  }, []);

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

  // Handlers passed to the chart stay the same across re-checks (the memoised lanes compare them).
  const latest = useRef({ lanes: model.lanes, plan: live.plan });
  useEffect(() => {
    latest.current = { lanes: model.lanes, plan: live.plan };
  });
  const zoomTo = useCallback(
    (item: LaneItem) => {
      const lane = latest.current.lanes.find((l) => l.id === item.lane);
      if (lane?.axis === "if")
        setIfDomain(clampDomain(zoomToItem(item.lo, item.hi, 0.6, IF_LIMITS), ifBounds, IF_LIMITS));
      else setDomain(clampDomain(zoomToItem(item.lo, item.hi, 0.6, GHZ_LIMITS), bounds, GHZ_LIMITS));
    },
    [bounds, ifBounds],
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

  const { moveLo, setLo } = live;
  const onLoDrag = useCallback(
    (chain: string, drawn: number, phase: "start" | "move" | "end") => {
      if (phase === "start") return;
      const mirror = latest.current.lanes.find((l) => l.id === `optical:${chain}`)?.mirror ?? 1;
      moveLo(chain, mirror * drawn);
    },
    [moveLo],
  );
  const onLoNudge = useCallback(
    (chain: string, steps: number) => {
      const plan = latest.current.plan;
      const c = plan.chains.find((x) => x.id === chain);
      const l = plan.lasers.find((x) => x.id === c?.laser);
      const step = l && l.stepMHz > 0 ? l.stepMHz / 1000 : 0.001;
      if (c) setLo(chain, c.loOffsetGHz + steps * step);
    },
    [setLo],
  );

  // Keep the details panel on the live version of the selected item.
  const selectedLive = selected ? (model.items.find((i) => i.id === selected.id) ?? null) : null;

  const counts = useMemo(() => {
    const c = { error: 0, warning: 0, info: 0 };
    for (const f of live.result.findings) c[f.severity]++;
    return c;
  }, [live.result]);

  const save = async (chainId: string) => {
    if (!onSaveLo) return;
    const c = live.plan.chains.find((x) => x.id === chainId);
    if (!c) return;
    setSaveState((s) => ({ ...s, [chainId]: { busy: true, message: null, error: false } }));
    try {
      const out = await onSaveLo(chainId, c.loOffsetGHz);
      setSaveState((s) => ({
        ...s,
        [chainId]: {
          busy: false,
          error: false,
          message: `Saved as revision ${out.revision ?? "?"}; the server re-checked it: ${out.errors} errors, ${out.warnings} warnings.`,
        },
      }));
    } catch (e) {
      setSaveState((s) => ({ ...s, [chainId]: { busy: false, error: true, message: (e as Error).message } }));
    }
  };

  return (
    <div className="space-y-4" data-testid="lane-view" data-ready={ready ? "1" : "0"}>
      <div className="flex flex-wrap items-center gap-2 text-sm" role="toolbar" aria-label="Lane view controls">
        <div className="inline-flex overflow-hidden rounded border border-ink-faint" role="group" aria-label="View">
          {(["chart", "table"] as const).map((v) => (
            <button
              key={v}
              type="button"
              aria-pressed={view === v}
              className={`px-3 py-1 ${view === v ? "bg-ink text-white" : "bg-white hover:bg-ink-faint"}`}
              onClick={() => setView(v)}
            >
              {v === "chart" ? "Chart" : "Table view"}
            </button>
          ))}
        </div>
        {view === "chart" ? (
          <>
            <button
              type="button"
              className="rounded border border-ink-faint px-2 py-1 hover:bg-ink-faint"
              onClick={() => onZoom("ghz", { factor: 2, pivot: (domain[0] + domain[1]) / 2 })}
            >
              Zoom in
            </button>
            <button
              type="button"
              className="rounded border border-ink-faint px-2 py-1 hover:bg-ink-faint"
              onClick={() => onZoom("ghz", { factor: 0.5, pivot: (domain[0] + domain[1]) / 2 })}
            >
              Zoom out
            </button>
            <button
              type="button"
              className="rounded border border-ink-faint px-2 py-1 hover:bg-ink-faint"
              onClick={() => {
                setDomain(home);
                setIfDomain(homeIf);
              }}
            >
              Reset zoom
            </button>
            <label className="flex items-center gap-1">
              <span>Zoom to channel</span>
              <select
                className="rounded border border-ink-faint px-2 py-1"
                value=""
                onChange={(e) => e.target.value && zoomToChannel(e.target.value)}
              >
                <option value="">choose…</option>
                {live.plan.channels.map((c) => (
                  <option key={c.id} value={c.id}>
                    {c.id} · {c.name}
                  </option>
                ))}
              </select>
            </label>
            <span className="text-xs text-ink-soft">Wheel: zoom · drag: pan · shift+wheel: pan</span>
          </>
        ) : null}
        <span className="ml-auto text-xs text-ink-soft" aria-live="polite">
          <span style={{ color: SEVERITY_COLOUR.error }}>{counts.error} errors</span> ·{" "}
          <span style={{ color: SEVERITY_COLOUR.warning }}>{counts.warning} warnings</span> · {counts.info} info
          <span ref={frameText} data-testid="frame-time" />
        </span>
      </div>

      <ChainControls
        plan={live.plan}
        result={live.result}
        saveState={saveState}
        canSave={Boolean(onSaveLo)}
        onPlace={(chain, L) => live.setLo(chain, L)}
        onSave={save}
        onSet={(chain, L) => live.setLo(chain, L)}
      />
      {live.error ? (
        <p role="alert" className="text-sm text-sev-error">
          {live.error}
        </p>
      ) : null}

      <div ref={wrapRef} className={view === "chart" ? "" : "hidden"}>
        <LaneChart
          model={model}
          width={width}
          domain={domain}
          ifDomain={ifDomain}
          selectedId={selected?.id ?? null}
          onZoom={onZoom}
          onSelect={setSelected}
          onZoomToItem={zoomTo}
          onLoDrag={onLoDrag}
          onLoNudge={onLoNudge}
        />
      </div>
      {view === "table" ? <LaneTable model={model} /> : null}

      <div className="grid gap-4 lg:grid-cols-[minmax(0,2fr)_minmax(0,3fr)]">
        <DetailsPanel item={selectedLive} result={live.result} onZoom={zoomTo} />
        <FindingsPanel result={live.result} />
      </div>
      <ChannelFigures plan={live.plan} result={live.result} />
      <details className="rounded border border-ink-faint p-3">
        <summary className="cursor-pointer text-sm font-semibold">Legend</summary>
        <div className="mt-2">
          <Legend />
        </div>
      </details>
      <p className="text-xs text-ink-soft">
        Optical offsets of a lower-sideband chain are drawn mirrored (at −x) so they line up with the RF they carry;
        tooltips and the table give the signed offset. Not modelled in v1: laser noise pedestals, parasitic mode
        families, LO side modes, shaped antenna response, image noise in NEΔT. Sensitivity figures are design estimates,
        not calibration.
      </p>
    </div>
  );
}

interface ChainControlsProps {
  plan: Plan;
  result: ResultDocument;
  canSave: boolean;
  saveState: Record<string, { busy: boolean; message: string | null; error: boolean }>;
  onPlace: (chain: string, L: number) => void;
  onSave: (chain: string) => void;
  onSet: (chain: string, L: number) => void;
}

function ChainControls({ plan, result, canSave, saveState, onPlace, onSave, onSet }: ChainControlsProps) {
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
                    ? `No place: ${r?.placeReason ?? "no result"}`
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

function DetailsPanel({
  item,
  result,
  onZoom,
}: {
  item: LaneItem | null;
  result: ResultDocument;
  onZoom: (i: LaneItem) => void;
}) {
  if (!item)
    return (
      <section className="rounded border border-ink-faint p-3 text-sm text-ink-soft" aria-label="Details">
        Click an item (or tab to it and press Enter) to see its numbers and the findings that concern it.
      </section>
    );
  const related = result.findings.filter((f) => {
    if (item.channel) return f.channel === item.channel && (item.kind !== "image-band" || f.code === "image-response");
    if (item.kind === "lo" || item.kind === "blocked" || item.kind === "feasible")
      return f.chain === item.chain && (f.channel === null || (item.kind === "lo" && item.codes.includes(f.code)));
    if (item.kind === "spur") return f.chain === item.chain && f.code === "spur-in-slot";
    return false;
  });
  return (
    <section className="rounded border border-ink-faint p-3 text-sm" aria-label="Details" data-testid="details-panel">
      <div className="flex items-start justify-between gap-2">
        <h2 className="font-semibold">{item.label}</h2>
        <button
          type="button"
          className="rounded border border-ink-faint px-2 py-0.5 text-xs"
          onClick={() => onZoom(item)}
        >
          Zoom to it
        </button>
      </div>
      <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-3 gap-y-0.5 text-xs">
        {item.facts.map(([k, v]) => (
          <div key={k} className="contents">
            <dt className="text-ink-soft">{k}</dt>
            <dd className="tabular-nums">{v}</dd>
          </div>
        ))}
      </dl>
      {item.codes.filter((c) => c !== "wanted").length ? (
        <ul className="mt-2 space-y-1 text-xs">
          {item.codes
            .filter((c) => c !== "wanted")
            .map((c) => (
              <li key={c}>
                <code className="font-semibold">{c}</code>: {explainCode(c)}
              </li>
            ))}
        </ul>
      ) : null}
      {related.length ? (
        <ul className="mt-2 space-y-1 border-t border-ink-faint pt-2 text-xs" data-testid="details-findings">
          {related.slice(0, 30).map((f, i) => (
            <li key={i}>
              <span className="font-semibold" style={{ color: SEVERITY_COLOUR[f.severity] }}>
                {f.severity} {f.code}
              </span>{" "}
              {f.message}
            </li>
          ))}
          {related.length > 30 ? <li>… and {related.length - 30} more</li> : null}
        </ul>
      ) : null}
    </section>
  );
}

function FindingsPanel({ result }: { result: ResultDocument }) {
  const important = result.findings.filter((f) => f.severity !== "info");
  const infoCount = result.findings.length - important.length;
  return (
    <section className="rounded border border-ink-faint p-3 text-sm" aria-label="Findings" data-testid="findings-panel">
      <h2 className="mb-1 font-semibold">Findings (live)</h2>
      <ul className="max-h-64 space-y-1 overflow-auto text-xs">
        {important.slice(0, 80).map((f, i) => (
          <li key={`${f.chain}-${f.channel}-${f.code}-${i}`} data-code={f.code}>
            <span className="font-semibold" style={{ color: SEVERITY_COLOUR[f.severity] }}>
              {f.code}
            </span>{" "}
            <span className="text-ink-soft">
              {f.chain}
              {f.channel ? ` · ${f.channel}` : ""}
            </span>{" "}
            — {f.message}
          </li>
        ))}
        {important.length > 80 ? <li>… and {important.length - 80} more errors and warnings</li> : null}
        {important.length === 0 ? <li>No errors or warnings.</li> : null}
      </ul>
      {infoCount ? (
        <p className="mt-1 text-xs text-ink-soft">
          {infoCount} info findings (spurs of order ≤ 3, protected bands) are listed in the table view and the details.
        </p>
      ) : null}
    </section>
  );
}

function ChannelFigures({ plan, result }: { plan: Plan; result: ResultDocument }) {
  const byId = new Map(result.channels.map((c) => [c.id, c]));
  return (
    <details className="rounded border border-ink-faint p-3" open={plan.channels.length <= 16}>
      <summary className="cursor-pointer text-sm font-semibold">Channel figures (live)</summary>
      <table className="mt-2 w-full text-xs" data-testid="channel-figures">
        <thead>
          <tr className="text-left">
            {["Channel", "Chain", "IF slot (GHz)", "NEΔT (K)", "Required (K)", "Image rejection (dB)"].map((h) => (
              <th key={h} scope="col" className="px-2 font-semibold">
                {h}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {plan.channels.map((c) => {
            const r = byId.get(c.id);
            const unmet = r?.nedtK != null && c.requiredNedtK != null && r.nedtK > c.requiredNedtK;
            return (
              <tr key={c.id} data-channel={c.id}>
                <th scope="row" className="px-2 text-left font-normal">
                  {c.id}
                </th>
                <td className="px-2">{c.chain}</td>
                <td className="px-2 tabular-nums">
                  {r?.ifSlotGHz ? `${fmt(r.ifSlotGHz[0], 4)} – ${fmt(r.ifSlotGHz[1], 4)}` : "no slot"}
                </td>
                <td
                  className="px-2 tabular-nums"
                  style={unmet ? { color: SEVERITY_COLOUR.error } : undefined}
                  data-testid={`nedt-${c.id}`}
                >
                  {r?.nedtK != null ? fmt(r.nedtK, 3) : "—"}
                </td>
                <td className="px-2 tabular-nums">{c.requiredNedtK ?? "—"}</td>
                <td className="px-2 tabular-nums">{r?.imageRejectionDB != null ? fmt(r.imageRejectionDB, 2) : "—"}</td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </details>
  );
}
