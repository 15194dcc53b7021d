import { dsbOffsetClears, halfBandGHz, isOrdered } from "../fields";
import type { PathSegment } from "./format-path";
import { formatNumber } from "./messages";
import { scheduledChains, scheduleIssues } from "./schedule-rules";

/**
 * The rules of the plan format that relate several fields
 * (docs/plan-format.md §2.8 "Rules between fields"): every `min` below its
 * `max`, `dsbOffsetGHz` above half the bandwidth, unique ids, references
 * that resolve, one chain per laser. They are written against
 * unknown input so that they also run on a document with other faults
 * (`parsePlan` reports them beside the field rules); each rule only fires
 * when the fields it compares are themselves well formed.
 */

/** An issue before its path is formatted. */
export interface RawIssue {
  path: PathSegment[];
  message: string;
}

function isRecord(v: unknown): v is Record<string, unknown> {
  return typeof v === "object" && v !== null && !Array.isArray(v);
}
function isFiniteNumber(v: unknown): v is number {
  return typeof v === "number" && Number.isFinite(v);
}
function isId(v: unknown): v is string {
  return typeof v === "string" && v.length > 0;
}

function minBelowMax(obj: unknown, path: PathSegment[], out: RawIssue[]): void {
  if (!isRecord(obj)) return;
  const lo = obj.minGHz;
  const hi = obj.maxGHz;
  if (isFiniteNumber(lo) && isFiniteNumber(hi) && !isOrdered(lo, hi)) {
    out.push({ path: [...path, "minGHz"], message: `must be below maxGHz (${formatNumber(hi)})` });
  }
}

const LIST_KIND = {
  lasers: "laser",
  resonators: "resonator",
  detectors: "detector",
  chains: "chain",
  channels: "channel",
} as const;
type ListKey = keyof typeof LIST_KIND;

/**
 * Ids of one list: `ids` holds the first index of every valid id; `complete`
 * is false when the list is missing or some entry lacks a valid id (then a
 * reference that does not resolve may be meant for that entry, and is not
 * reported).
 */
function collectIds(doc: Record<string, unknown>, key: ListKey, out: RawIssue[]) {
  const list = doc[key];
  const ids = new Map<string, number>();
  if (!Array.isArray(list)) return { ids, complete: false };
  let complete = true;
  list.forEach((entry, i) => {
    const v = isRecord(entry) ? entry.id : undefined;
    if (!isId(v)) {
      complete = false;
      return;
    }
    const first = ids.get(v);
    if (first === undefined) ids.set(v, i);
    else out.push({ path: [key, i, "id"], message: `duplicates the id "${v}" of ${key}[${first}]` });
  });
  return { ids, complete };
}

/**
 * The rules of the format that relate several fields (§2.8). Works on any
 * value: parts that are malformed are skipped (the field rules report them).
 */
export function crossFieldIssues(input: unknown): RawIssue[] {
  const out: RawIssue[] = [];
  if (!isRecord(input)) return out;
  const lists = {} as Record<ListKey, { ids: Map<string, number>; complete: boolean }>;
  for (const key of Object.keys(LIST_KIND) as ListKey[]) lists[key] = collectIds(input, key, out);

  const lasers = input.lasers;
  if (Array.isArray(lasers)) {
    lasers.forEach((laser, i) => {
      if (!isRecord(laser) || !Array.isArray(laser.reach)) return;
      laser.reach.forEach((r, j) => minBelowMax(r, ["lasers", i, "reach", j], out));
    });
  }
  const detectors = input.detectors;
  if (Array.isArray(detectors)) detectors.forEach((d, i) => minBelowMax(d, ["detectors", i], out));

  const chains = input.chains;
  if (Array.isArray(chains)) {
    const laserServes = new Map<string, string | number>();
    const scheduled = scheduledChains(input);
    const users = new Map<string, number>();
    for (const c of chains) if (isRecord(c) && isId(c.laser)) users.set(c.laser, (users.get(c.laser) ?? 0) + 1);
    chains.forEach((chain, i) => {
      if (!isRecord(chain)) return;
      minBelowMax(chain.rfInput, ["chains", i, "rfInput"], out);
      for (const [field, listKey] of [
        ["laser", "lasers"],
        ["resonator", "resonators"],
        ["detector", "detectors"],
      ] as const) {
        const ref = chain[field];
        const target = lists[listKey];
        if (isId(ref) && target.complete && !target.ids.has(ref)) {
          out.push({
            path: ["chains", i, field],
            message: `refers to ${LIST_KIND[listKey]} "${ref}", which does not exist`,
          });
        }
      }
      const laserRef = chain.laser;
      const listed = isId(laserRef) ? scheduled.get(laserRef) : undefined;
      if (isId(laserRef) && listed) {
        // a laser with a schedule serves the chains its schedule lists; any other chain on it is one too many
        if (!(isId(chain.id) && listed.has(chain.id)) && (users.get(laserRef) ?? 0) >= 2) {
          const names = [...listed].map((c) => `"${c}"`).join(", ");
          out.push({
            path: ["chains", i, "laser"],
            message: `laser "${laserRef}" serves the chains of its schedule (${names}); add ${isId(chain.id) ? `chain "${chain.id}"` : "this chain"} to the schedule or give it a laser of its own`,
          });
        }
      } else if (isId(laserRef)) {
        const earlier = laserServes.get(laserRef);
        if (earlier === undefined) laserServes.set(laserRef, isId(chain.id) ? chain.id : i);
        else {
          const who = typeof earlier === "string" ? `chain "${earlier}"` : `chains[${earlier}]`;
          out.push({
            path: ["chains", i, "laser"],
            message: `laser "${laserRef}" already serves ${who}; a laser serves one chain`,
          });
        }
      }
    });
  }

  const channels = input.channels;
  if (Array.isArray(channels)) {
    channels.forEach((channel, i) => {
      if (!isRecord(channel)) return;
      const ref = channel.chain;
      if (isId(ref) && lists.chains.complete && !lists.chains.ids.has(ref)) {
        out.push({ path: ["channels", i, "chain"], message: `refers to chain "${ref}", which does not exist` });
      }
      const d = channel.dsbOffsetGHz;
      const bw = channel.bandwidthMHz;
      if (isFiniteNumber(d) && d > 0 && isFiniteNumber(bw) && bw > 0 && !dsbOffsetClears(d, bw)) {
        out.push({
          path: ["channels", i, "dsbOffsetGHz"],
          message: `must be greater than half the bandwidth (${formatNumber(halfBandGHz(bw))} GHz)`,
        });
      }
    });
  }
  out.push(...scheduleIssues(input, lists.chains.complete));
  return out;
}
