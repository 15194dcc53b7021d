import { dwellSwitch } from "../schedule-fields";
import type { RawIssue } from "./cross-field";
import { formatNumber } from "./messages";

/**
 * The rules of the plan format that relate a laser pair's observation
 * schedule to the rest of the plan (docs/plan-format.md, "Observation
 * schedules", rules between fields): every dwell names an existing chain of
 * that laser pair, a chain is in one schedule and dwells once per cycle,
 * and every dwell is longer than the switch into it from the dwell before.
 * Like the other rules between fields they work on unknown input and each
 * fires only when the fields it compares are themselves well formed.
 */

type Obj = Record<string, unknown>;

function isRecord(v: unknown): v is Obj {
  return typeof v === "object" && v !== null && !Array.isArray(v);
}
function isId(v: unknown): v is string {
  return typeof v === "string" && v.length > 0;
}
function isFiniteNumber(v: unknown): v is number {
  return typeof v === "number" && Number.isFinite(v);
}
const isNonNegative = (v: unknown): v is number => isFiniteNumber(v) && v >= 0;

/** The dwells of a laser's schedule, or null when the laser has no schedule (or it is malformed). */
function dwellsOf(laser: unknown): unknown[] | null {
  if (!isRecord(laser) || !isRecord(laser.schedule) || !Array.isArray(laser.schedule.dwells)) return null;
  return laser.schedule.dwells;
}

/** The chain ids each laser's schedule lists (lasers with a valid id and a schedule that lists at least one chain). */
export function scheduledChains(doc: Obj): Map<string, Set<string>> {
  const out = new Map<string, Set<string>>();
  if (!Array.isArray(doc.lasers)) return out;
  for (const laser of doc.lasers) {
    const dwells = dwellsOf(laser);
    if (!dwells || !isRecord(laser) || !isId(laser.id) || out.has(laser.id)) continue;
    const ids = new Set<string>();
    for (const d of dwells) if (isRecord(d) && isId(d.chain)) ids.add(d.chain);
    if (ids.size) out.set(laser.id, ids);
  }
  return out;
}

/** The first chain of each valid id. */
function chainsById(doc: Obj): Map<string, Obj> {
  const out = new Map<string, Obj>();
  if (!Array.isArray(doc.chains)) return out;
  for (const c of doc.chains) if (isRecord(c) && isId(c.id) && !out.has(c.id)) out.set(c.id, c);
  return out;
}

/** A chain's LO setting and resonator, when both are well formed. */
function settingOf(chain: Obj | undefined): { loOffsetGHz: number; resonator: string } | null {
  if (!chain || !isFiniteNumber(chain.loOffsetGHz) || !isId(chain.resonator)) return null;
  return { loOffsetGHz: chain.loOffsetGHz, resonator: chain.resonator };
}

/**
 * The schedule rules of a document. `chainsComplete` is false when some
 * chain lacks a valid id (a reference that does not resolve may then be
 * meant for it, and is not reported).
 */
export function scheduleIssues(doc: Obj, chainsComplete: boolean): RawIssue[] {
  const out: RawIssue[] = [];
  if (!Array.isArray(doc.lasers)) return out;
  const chains = chainsById(doc);
  const listed = scheduledChains(doc);
  const inOwnSchedule = (chainId: string, own: string) => listed.get(own)?.has(chainId) === true;
  // where each chain was first listed in a schedule of a laser other than its own
  const foreignAt = new Map<string, string>();

  doc.lasers.forEach((laser, i) => {
    const dwells = dwellsOf(laser);
    if (!dwells || !isRecord(laser)) return;
    const laserId = isId(laser.id) ? laser.id : null;
    const here = new Map<string, number>();
    dwells.forEach((dwell, j) => {
      if (!isRecord(dwell) || !isId(dwell.chain)) return;
      const ref = dwell.chain;
      const path = ["lasers", i, "schedule", "dwells", j, "chain"];
      const chain = chains.get(ref);
      if (!chain) {
        if (chainsComplete) out.push({ path, message: `refers to chain "${ref}", which does not exist` });
        return;
      }
      const earlier = here.get(ref);
      if (earlier !== undefined) {
        out.push({
          path,
          message: `chain "${ref}" already has dwells[${earlier}] in this schedule; a chain dwells once per cycle`,
        });
        return;
      }
      here.set(ref, j);
      const own = chain.laser;
      if (!isId(own) || laserId === null || own === laserId) return;
      const elsewhere = foreignAt.get(ref);
      if (inOwnSchedule(ref, own))
        out.push({
          path,
          message: `chain "${ref}" is already in the schedule of its own laser "${own}"; a chain is in one schedule`,
        });
      else if (elsewhere !== undefined)
        out.push({
          path,
          message: `chain "${ref}" is already in the schedule of laser "${elsewhere}"; a chain is in one schedule`,
        });
      else
        out.push({
          path,
          message: `chain "${ref}" uses laser "${own}", not "${laserId}"; a schedule holds only the chains of its own laser pair`,
        });
      if (elsewhere === undefined) foreignAt.set(ref, laserId);
    });
    switchIssues(laser.schedule as Obj, dwells, chains, i, out);
  });
  return out;
}

/** Every dwell must be longer than the switch into it from the dwell before it (the last one's before the first). */
function switchIssues(schedule: Obj, dwells: unknown[], chains: Map<string, Obj>, i: number, out: RawIssue[]): void {
  const { retuneMs, retuneMsPerGHz, relockMs } = schedule;
  if (!isNonNegative(retuneMs) || !isNonNegative(retuneMsPerGHz) || !isNonNegative(relockMs)) return;
  const n = dwells.length;
  dwells.forEach((dwell, j) => {
    const prev = dwells[(j - 1 + n) % n];
    if (!isRecord(dwell) || !isRecord(prev) || !isId(dwell.chain) || !isId(prev.chain)) return;
    if (prev.chain === dwell.chain || !isFiniteNumber(dwell.dwellMs) || !(dwell.dwellMs > 0)) return;
    const to = settingOf(chains.get(dwell.chain));
    const from = settingOf(chains.get(prev.chain));
    if (!to || !from) return;
    const sw = dwellSwitch({ retuneMs, retuneMsPerGHz, relockMs }, from, to);
    if (dwell.dwellMs > sw.switchMs) return;
    const parts = [
      `retune ${formatNumber(sw.retuneMs)} ms for ${formatNumber(sw.loStepGHz)} GHz of LO change`,
      ...(sw.relockMs > 0 ? [`relock ${formatNumber(sw.relockMs)} ms`] : []),
    ];
    out.push({
      path: ["lasers", i, "schedule", "dwells", j, "dwellMs"],
      message: `must be longer than the switch into it from chain "${prev.chain}" (${formatNumber(sw.switchMs)} ms: ${parts.join(", ")})`,
    });
  });
}
