"use client";

import { useWaivers } from "@/components/waivers";
import Link from "next/link";
import { useMissionQuery, useMissionDataQueries } from "@/queries/missions";
import { usePlanDocumentQuery } from "@/queries/plan-document";
import { buildChannelRows } from "./channel-rows";
import { countBySeverity } from "./findings";
import { formatNumber } from "./format";
import { ChainsSection } from "./report/chains-section";
import { ChannelsSection } from "./report/channels-section";
import { EnvelopePlotsSection } from "./report/envelope-plots-section";
import { EnvelopeSection } from "./report/envelope-section";
import { NoiseBudgetSection } from "./report/noise-budget-section";
import { FindingsSection } from "./report/findings-section";
import { HardwareSection } from "./report/hardware-section";
import { Section } from "./report/section";
import { SchedulesSection } from "./report/schedules-section";
import { SourcesSection } from "./report/sources-section";
import { buttonClass, LASER_SAFETY_TEXT, SENSITIVITY_TEXT, Spinner } from "./ui";

/** What the model leaves out (docs/plan-format.md §10 "What version 1 does not model", as version 2 narrows it in §12–§14). */
export const MODEL_V1_LIMITS = [
  "The detector is assumed to be a balanced pair of photodiodes.",
  "Laser noise beating with the carrier or the LO counts only where the plan gives the lasers' noise figures (the noise budget).",
  "Parasitic mode families of the resonator (other radial/polar orders, polarisations) are not modelled.",
  "LO modulation or side modes are not modelled.",
  "The antenna response is an ideal box (the RF input band), not a shaped response.",
  "The carrier power at the detector is an upper bound unless the resonator's intrinsic Q is given.",
  "Image noise is not added to NEΔT (the image rule covers it).",
  "Guard bands are fixed; they do not scale with filter skirts.",
];

export function MissionReport({ missionId }: { missionId: string }) {
  const mission = useMissionQuery(missionId);
  const { lasers, resonators, detectors, chains, channels, settings, result, revisions } =
    useMissionDataQueries(missionId);
  const waivers = useWaivers(missionId);
  const plan = usePlanDocumentQuery(missionId);
  const queries = [mission, lasers, resonators, detectors, chains, channels, settings, result, revisions, plan];
  if (queries.some((q) => q.isLoading)) return <Spinner label="Preparing the report…" />;
  const failed = queries.find((q) => q.error);
  if (failed?.error) return <p className="text-sev-error">The report could not be prepared: {failed.error.message}</p>;

  const ch = chains.data ?? [];
  const rows = buildChannelRows(channels.data ?? [], ch, result.data);
  const findings = result.data?.findings ?? [];
  const counts = countBySeverity(findings);
  const latest = [...(revisions.data ?? [])].sort((a, b) => b.number - a.number)[0];

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
          <strong>What the model leaves out.</strong> {MODEL_V1_LIMITS.join(" ")}
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

      <HardwareSection lasers={lasers.data ?? []} resonators={resonators.data ?? []} detectors={detectors.data ?? []} />

      <ChainsSection
        chains={ch}
        lasers={lasers.data}
        resonators={resonators.data}
        detectors={detectors.data}
        result={result.data}
      />

      <ChannelsSection rows={rows} />

      <EnvelopeSection rows={rows} />

      <SchedulesSection result={result.data} />
      <NoiseBudgetSection rows={rows} />

      <FindingsSection findings={findings} channelCount={channels.data?.length} waivers={waivers} />

      <EnvelopePlotsSection plan={plan.data} result={result.data ?? null} />

      <SourcesSection />
    </article>
  );
}
