"use client";

import Link from "next/link";
import { OpticalFrequency } from "@/components/tools";
import { LASER_HEADERS, loTHz } from "./hardware";
import { LINE_CENTRES, PROTECTED_BANDS } from "@/lib/reference";
import {
  useCollectionQuery,
  useMissionQuery,
  useResultQuery,
  useRevisionsQuery,
  useSettingsQuery,
} from "@/queries/missions";
import { buildChannelRows } from "./channel-rows";
import { countBySeverity, groupFindings } from "./findings";
import { formatDB, formatGHz, formatInterval, formatK, formatMHz, formatNumber, formatQ } from "./format";
import { buttonClass, LASER_SAFETY_TEXT, SENSITIVITY_TEXT, SeverityBadge, Spinner } from "./ui";

/** What model v1 leaves out (plan-format.md, "Not in model v1"). */
export const MODEL_V1_LIMITS = [
  "The detector is assumed to be a balanced pair of photodiodes.",
  "Laser noise pedestals beating with the carrier or the LO are not modelled.",
  "Parasitic mode families of the resonator (other radial/polar orders, polarisations) are not modelled.",
  "LO modulation or side modes are not modelled.",
  "The antenna response is an ideal box (the RF input band), not a shaped response.",
  "The resonator's coupling regime is not modelled: the carrier power used is an upper bound.",
  "Image noise is not added to NEΔT (the image rule covers it).",
  "Guard bands are fixed; they do not scale with filter skirts.",
];

const th = "border-b border-ink/30 px-1.5 py-1 text-left text-[11px] font-semibold text-ink-soft";
const td = "border-b border-ink/10 px-1.5 py-1 align-top tabular-nums";

function Section({ title, children }: { title: string; children: React.ReactNode }) {
  return (
    <section className="mt-6 break-inside-avoid-page">
      <h2 className="mb-1.5 border-b-2 border-ink pb-0.5 text-base font-semibold">{title}</h2>
      {children}
    </section>
  );
}

export function MissionReport({ missionId }: { missionId: string }) {
  const mission = useMissionQuery(missionId);
  const lasers = useCollectionQuery(missionId, "lasers");
  const resonators = useCollectionQuery(missionId, "resonators");
  const detectors = useCollectionQuery(missionId, "detectors");
  const chains = useCollectionQuery(missionId, "chains");
  const channels = useCollectionQuery(missionId, "channels");
  const settings = useSettingsQuery(missionId);
  const result = useResultQuery(missionId);
  const revisions = useRevisionsQuery(missionId);
  const queries = [mission, lasers, resonators, detectors, chains, channels, settings, result, revisions];
  if (queries.some((q) => q.isLoading)) return <Spinner label="Preparing the report…" />;
  const failed = queries.find((q) => q.error);
  if (failed?.error) return <p className="text-sev-error">The report could not be prepared: {failed.error.message}</p>;

  const ch = chains.data ?? [];
  const keyOf = (rows: { id: string; key: string }[] | undefined, id: string) =>
    rows?.find((r) => r.id === id)?.key ?? "?";
  const rows = buildChannelRows(channels.data ?? [], ch, result.data);
  const findings = result.data?.findings ?? [];
  const counts = countBySeverity(findings);
  const latest = [...(revisions.data ?? [])].sort((a, b) => b.number - a.number)[0];
  const unmet = rows.filter((r) => r.nedt.state === "unmet").length;
  const withReq = rows.filter((r) => r.nedt.state === "met" || r.nedt.state === "unmet").length;
  const lineSources = [...new Set(LINE_CENTRES.map((l) => l.source))];
  const bandSources = [...new Set(PROTECTED_BANDS.map((b) => b.source))];

  return (
    <article className="report-root mx-auto max-w-5xl bg-white text-[13px] leading-snug text-ink" data-testid="report">
      <style>{`
        @page { size: A4 landscape; margin: 12mm; }
        @media print {
          body * { visibility: hidden; }
          .report-root, .report-root * { visibility: visible; }
          .report-root { position: absolute; left: 0; top: 0; width: 100%; max-width: none; font-size: 10.5px; }
          .report-root table { page-break-inside: auto; }
          .report-root tr { page-break-inside: avoid; }
          .report-root thead { display: table-header-group; }
        }
      `}</style>
      <div className="no-print mb-4 flex gap-2">
        <Link href={`/missions/${missionId}`} className={buttonClass.quiet}>
          ← Back to the mission
        </Link>
        <button type="button" className={buttonClass.primary} onClick={() => window.print()}>
          Print or save as PDF
        </button>
      </div>
      <header className="border-b-2 border-ink pb-2">
        <p className="text-xs uppercase tracking-widest text-ink-soft">Heterolane · frequency plan report</p>
        <h1 className="text-2xl font-semibold">{mission.data?.name}</h1>
        {mission.data?.description ? <p className="text-ink-soft">{mission.data.description}</p> : null}
        <p className="mt-1 text-xs">
          Status {mission.data?.status ?? "draft"} · revision {latest?.number ?? "–"}
          {latest?.authorName ? ` by ${latest.authorName}` : ""}
          {latest?.createdAt
            ? ` · ${new Date(latest.createdAt).toISOString().replace("T", " ").slice(0, 16)} UTC`
            : ""}{" "}
          · printed {new Date().toISOString().replace("T", " ").slice(0, 16)} UTC · {counts.error} errors,{" "}
          {counts.warning} warnings, {counts.info} info
        </p>
      </header>

      <section
        className="mt-3 rounded border border-sev-warning/50 p-2.5 text-xs"
        aria-label="Cautions"
        data-testid="report-cautions"
      >
        <p>
          <strong>Laser safety.</strong> {LASER_SAFETY_TEXT}
        </p>
        <p className="mt-1">
          <strong>Sensitivity.</strong> {SENSITIVITY_TEXT}
        </p>
        <p className="mt-1">
          <strong>What model v1 leaves out.</strong> {MODEL_V1_LIMITS.join(" ")}
        </p>
      </section>

      <Section title="Check settings">
        {settings.data ? (
          <p>
            Guard band {formatNumber(settings.data.guardMHz, 1)} MHz · required image rejection{" "}
            {formatNumber(settings.data.imageRejectionDB, 1)} dB · spur orders up to {settings.data.spurMaxOrder} · lock
            replica limit {formatNumber(settings.data.replicaLimitDB, 1)} dB
          </p>
        ) : null}
      </Section>

      <Section title="Hardware">
        <table className="w-full border-collapse">
          <thead>
            <tr>
              {LASER_HEADERS.map((h) => (
                <th key={h} className={th}>
                  {h}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {(lasers.data ?? []).map((l) => (
              <tr key={l.id}>
                <td className={td}>{l.key}</td>
                <td className={td}>
                  {formatNumber(l.carrierTHz, 3)}
                  <OpticalFrequency thz={l.carrierTHz} className="block text-xs" />
                </td>
                <td className={td}>{formatNumber(l.carrierPowerMW, 2)}</td>
                <td className={td}>{formatNumber(l.loPowerMW, 2)}</td>
                <td className={td}>{l.reach.map((r) => formatInterval([r.minGHz, r.maxGHz], "")).join(", ")}</td>
                <td className={td}>{formatMHz(l.stepMHz)}</td>
                <td className={td}>{formatMHz(l.driftMHz)}</td>
                <td className={td}>
                  {formatMHz(l.lock.modulationMHz)} MHz, β {formatNumber(l.lock.modulationIndex, 2)}, {l.lock.orders}{" "}
                  {l.lock.orders === 1 ? "order" : "orders"}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
        <p className="mt-1 text-[11px] text-sev-warning">Optical powers above: {LASER_SAFETY_TEXT}</p>
        <div className="mt-3 grid grid-cols-2 gap-4">
          <table className="w-full border-collapse">
            <thead>
              <tr>
                <th className={th}>Resonator</th>
                <th className={th}>FSR (GHz)</th>
                <th className={th}>Loaded Q</th>
              </tr>
            </thead>
            <tbody>
              {(resonators.data ?? []).map((r) => (
                <tr key={r.id}>
                  <td className={td}>{r.key}</td>
                  <td className={td}>{formatGHz(r.fsrGHz)}</td>
                  <td className={td}>{formatQ(r.loadedQ)}</td>
                </tr>
              ))}
            </tbody>
          </table>
          <table className="w-full border-collapse">
            <thead>
              <tr>
                <th className={th}>Detector</th>
                <th className={th}>IF band (GHz)</th>
                <th className={th}>Max input (mW)</th>
                <th className={th}>Sample rate (GHz)</th>
              </tr>
            </thead>
            <tbody>
              {(detectors.data ?? []).map((d) => (
                <tr key={d.id}>
                  <td className={td}>{d.key}</td>
                  <td className={td}>{formatInterval([d.minGHz, d.maxGHz], "")}</td>
                  <td className={td}>{formatNumber(d.maxInputMW, 2)}</td>
                  <td className={td}>{d.sampleRateGHz === null ? "–" : formatGHz(d.sampleRateGHz)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      </Section>

      <Section title="Receiver chains">
        <table className="w-full border-collapse">
          <thead>
            <tr>
              <th className={th}>Chain</th>
              <th className={th}>Hardware</th>
              <th className={th}>Mode, sideband</th>
              <th className={th}>LO offset (GHz)</th>
              <th className={th}>RF input (GHz)</th>
              <th className={th}>Linewidth (MHz)</th>
              <th className={th}>Per-photodiode input (mW)</th>
              <th className={th}>Feasible LO offsets (GHz)</th>
              <th className={th}>Place (GHz)</th>
            </tr>
          </thead>
          <tbody>
            {ch.map((c) => {
              const r = result.data?.chains.find((x) => x.id === c.key);
              return (
                <tr key={c.id}>
                  <td className={td}>{c.key}</td>
                  <td className={td}>
                    {keyOf(lasers.data, c.laserId)} · {keyOf(resonators.data, c.resonatorId)} ·{" "}
                    {keyOf(detectors.data, c.detectorId)}
                  </td>
                  <td className={td}>
                    k = {c.mode}, {c.sideband}
                    <SidebandOptical
                      carrierTHz={lasers.data?.find((l) => l.id === c.laserId)?.carrierTHz}
                      fsrGHz={resonators.data?.find((x) => x.id === c.resonatorId)?.fsrGHz}
                      signedMode={(c.sideband === "upper" ? 1 : -1) * c.mode}
                    />
                  </td>
                  <td className={td}>
                    {formatGHz(c.loOffsetGHz)}
                    <LoOptical
                      carrierTHz={lasers.data?.find((l) => l.id === c.laserId)?.carrierTHz}
                      loOffsetGHz={c.loOffsetGHz}
                    />
                  </td>
                  <td className={td}>{formatInterval([c.rfInput.minGHz, c.rfInput.maxGHz], "")}</td>
                  <td className={td}>{formatMHz(r?.linewidthMHz, 2)}</td>
                  <td className={td}>{formatNumber(r?.pdInputMW, 3)}</td>
                  <td className={td}>
                    {r
                      ? r.feasibleGHz.length
                        ? r.feasibleGHz.map((iv) => formatInterval(iv, "")).join(", ")
                        : "none"
                      : "–"}
                  </td>
                  <td className={td}>
                    {r ? (r.placeGHz === null ? `none (${r.placeReason ?? ""})` : formatGHz(r.placeGHz)) : "–"}
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </Section>

      <Section title="Channels and NEΔT">
        <p className="mb-1 text-xs">
          {withReq} channels with an NEΔT requirement, {unmet} not met. {SENSITIVITY_TEXT}
        </p>
        <table className="w-full border-collapse">
          <thead>
            <tr>
              <th className={th}>Channel</th>
              <th className={th}>Chain</th>
              <th className={th}>RF band (GHz)</th>
              <th className={th}>SSB/DSB</th>
              <th className={th}>IF slot (GHz)</th>
              <th className={th}>Image (GHz)</th>
              <th className={th}>Image rejection (dB)</th>
              <th className={th}>Radiometric BW (MHz)</th>
              <th className={th}>τ (ms)</th>
              <th className={th}>NEΔT (K)</th>
              <th className={th}>Required (K)</th>
              <th className={th}>Worst finding</th>
            </tr>
          </thead>
          <tbody>
            {rows.map((r) => (
              <tr key={r.channel.id}>
                <td className={td}>
                  <strong>{r.channel.key}</strong> {r.channel.name}
                </td>
                <td className={td}>{r.chainKey}</td>
                <td className={td}>{r.bandsGHz.map((b) => formatInterval(b, "")).join(" + ")}</td>
                <td className={td}>{r.sideband}</td>
                <td className={td}>{r.result?.ifSlotGHz ? formatInterval(r.result.ifSlotGHz, "") : "no slot"}</td>
                <td className={td}>{r.result?.imageGHz ? formatInterval(r.result.imageGHz, "") : "–"}</td>
                <td className={td}>
                  {r.result?.imageGHz
                    ? r.result.imageRejectionDB === null
                      ? "full"
                      : formatDB(r.result.imageRejectionDB)
                    : "–"}
                </td>
                <td className={td}>{formatMHz(r.result?.radiometricBandwidthMHz, 2)}</td>
                <td className={td}>{formatNumber(r.channel.integrationMs, 1)}</td>
                <td className={`${td} ${r.nedt.state === "unmet" ? "font-semibold text-sev-error" : ""}`}>
                  {formatK(r.result?.nedtK)}
                </td>
                <td className={td}>{r.channel.requiredNedtK === null ? "–" : formatK(r.channel.requiredNedtK)}</td>
                <td className={td}>{r.worst ? `${r.worst.severity}: ${r.worst.code}` : "none"}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </Section>

      <Section title={`Findings (${findings.length})`}>
        {findings.length === 0 ? <p>Every rule passes.</p> : null}
        {groupFindings(findings).map((g) => (
          <div key={g.chain} className="mb-2">
            <h3 className="font-semibold">Chain {g.chain}</h3>
            <ul>
              {[
                ...g.chainFindings.map((f) => ({ where: "chain", f })),
                ...g.channels.flatMap((c) => c.findings.map((f) => ({ where: c.channel, f }))),
              ].map(({ where, f }, i) => (
                <li key={i} className="flex gap-2 border-b border-ink/5 py-0.5">
                  <span className="shrink-0">
                    <SeverityBadge severity={f.severity} />
                  </span>
                  <span className="w-16 shrink-0 font-medium">{where}</span>
                  <span className="w-40 shrink-0 font-mono text-[11px]">{f.code}</span>
                  <span>{f.message}</span>
                </li>
              ))}
            </ul>
          </div>
        ))}
      </Section>

      <Section title="Sources of reference values">
        <ul className="list-disc pl-5 text-xs">
          <li>
            Rules, units and the result document: Heterolane plan model v1 (heterolane.plan/1, heterolane.result/1).
          </li>
          <li>
            NEΔT: the total-power radiometer equation with gain fluctuations, (T_A + T_R)·√(1/(Bτ) + (ΔG/G)²),
            generalised to the resonator response (F. T. Ulaby, D. G. Long, Microwave Radar and Radiometric Remote
            Sensing, 2014; N. Skou, D. M. Le Vine, Microwave Radiometer Systems: Design and Analysis, 2nd ed.).
          </li>
          <li>Lock sideband amplitudes: Bessel functions of the first kind J_m(β) of phase modulation.</li>
          {bandSources.map((s) => (
            <li key={s}>Protected passive bands: {s}.</li>
          ))}
          {lineSources.map((s) => (
            <li key={s}>Line centres: {s}.</li>
          ))}
        </ul>
      </Section>
    </article>
  );
}

/** Laser 2 as an optical frequency (carrier + LO offset), when the carrier is known. */
function LoOptical({ carrierTHz, loOffsetGHz }: { carrierTHz: number | undefined; loOffsetGHz: number }) {
  if (carrierTHz === undefined) return null;
  return (
    <span className="block text-xs">
      LO <OpticalFrequency thz={loTHz(carrierTHz, loOffsetGHz)} />
    </span>
  );
}

/** The wanted sideband's resonator mode as an optical frequency (carrier ± k × FSR), when both are known. */
function SidebandOptical({
  carrierTHz,
  fsrGHz,
  signedMode,
}: {
  carrierTHz: number | undefined;
  fsrGHz: number | undefined;
  signedMode: number;
}) {
  if (carrierTHz === undefined || fsrGHz === undefined) return null;
  return (
    <span className="block text-xs">
      mode <OpticalFrequency thz={loTHz(carrierTHz, signedMode * fsrGHz)} />
    </span>
  );
}
