import { findingKeyOf } from "./internals/finding-key";
import { flatten, sameLeaf, type Json } from "./internals/flatten";
import type { FindingLike } from "./types";

export type PlanSection = "plan" | "settings" | "lasers" | "resonators" | "detectors" | "chains" | "channels";
export const PLAN_SECTIONS: readonly PlanSection[] = [
  "plan",
  "settings",
  "lasers",
  "resonators",
  "detectors",
  "chains",
  "channels",
];
const LISTS: readonly PlanSection[] = ["lasers", "resonators", "detectors", "chains", "channels"];

/** One field that differs; `before` is absent for an added field, `after` for a removed one. */
export interface FieldChange {
  path: string;
  before?: Json;
  after?: Json;
}

/** One entity (a laser, a chain, a channel…, or the plan's own fields and settings) that differs. */
export interface EntityChange {
  section: PlanSection;
  /** The entity's `id` in the plan document; "" for `plan` and `settings`. */
  id: string;
  kind: "added" | "removed" | "changed";
  fields: FieldChange[];
}

export interface FindingsChange<F extends FindingLike> {
  /** In the later revision only. */
  new: F[];
  /** In the earlier revision only. */
  resolved: F[];
  /** In both (same rule, chain and channel), paired; the message may have moved. */
  unchanged: { before: F; after: F }[];
}

export interface RevisionComparison<F extends FindingLike> {
  entities: EntityChange[];
  findings: FindingsChange<F>;
}

export interface ComparedRevision<F extends FindingLike> {
  /** The plan document (heterolane.plan/1). */
  plan: unknown;
  findings: readonly F[];
}

function fieldChanges(a: unknown, b: unknown): FieldChange[] {
  const fa = a === undefined ? new Map<string, Json>() : flatten(a);
  const fb = b === undefined ? new Map<string, Json>() : flatten(b);
  const paths = [...new Set([...fa.keys(), ...fb.keys()])].sort();
  const out: FieldChange[] = [];
  for (const p of paths) {
    const has = fa.has(p);
    const hasB = fb.has(p);
    if (has && hasB && sameLeaf(fa.get(p)!, fb.get(p)!)) continue;
    const c: FieldChange = { path: p };
    if (has) c.before = fa.get(p)!;
    if (hasB) c.after = fb.get(p)!;
    out.push(c);
  }
  return out;
}

function asRecord(v: unknown): Record<string, unknown> {
  return v !== null && typeof v === "object" && !Array.isArray(v) ? (v as Record<string, unknown>) : {};
}

/** A list section as id → entity (the first entity of a duplicated id wins; valid plans have none). */
function byId(list: unknown): Map<string, unknown> {
  const m = new Map<string, unknown>();
  if (!Array.isArray(list)) return m;
  list.forEach((e, i) => {
    const id = typeof asRecord(e).id === "string" ? String(asRecord(e).id) : `#${i}`;
    if (!m.has(id)) m.set(id, e);
  });
  return m;
}

function entityChange(section: PlanSection, id: string, a: unknown, b: unknown): EntityChange | null {
  const fields = fieldChanges(a, b);
  if (a === undefined && b === undefined) return null;
  if (a === undefined) return { section, id, kind: "added", fields };
  if (b === undefined) return { section, id, kind: "removed", fields };
  return fields.length ? { section, id, kind: "changed", fields } : null;
}

/**
 * Compares two revisions of a plan, field by field and finding by finding.
 * Entities of the list sections are matched by `id`; the plan's own fields
 * (name, format) and settings form one entity each. Findings are matched by
 * rule code, chain and channel, paired in document order; unmatched ones are
 * `resolved` (only in `a`) or `new` (only in `b`).
 *
 * compare(a, a) has no entity change and no new or resolved finding, and
 * compare(b, a) mirrors compare(a, b) (added ↔ removed, before ↔ after,
 * new ↔ resolved).
 */
export function compareRevisions<F extends FindingLike>(
  a: ComparedRevision<F>,
  b: ComparedRevision<F>,
): RevisionComparison<F> {
  const pa = asRecord(a.plan);
  const pb = asRecord(b.plan);
  const entities: EntityChange[] = [];
  const top = (p: Record<string, unknown>) =>
    Object.fromEntries(Object.entries(p).filter(([k]) => k !== "settings" && !LISTS.includes(k as PlanSection)));
  const planLevel = entityChange("plan", "", top(pa), top(pb));
  if (planLevel) entities.push({ ...planLevel, kind: "changed" });
  const settings = entityChange("settings", "", pa.settings ?? {}, pb.settings ?? {});
  if (settings) entities.push({ ...settings, kind: "changed" });
  for (const section of LISTS) {
    const ma = byId(pa[section]);
    const mb = byId(pb[section]);
    const ids = [...new Set([...ma.keys(), ...mb.keys()])].sort();
    for (const id of ids) {
      const c = entityChange(section, id, ma.get(id), mb.get(id));
      if (c) entities.push(c);
    }
  }

  const groups = (list: readonly F[]) => {
    const g = new Map<string, F[]>();
    for (const f of list) {
      const k = findingKeyOf(f);
      const arr = g.get(k);
      if (arr) arr.push(f);
      else g.set(k, [f]);
    }
    return g;
  };
  const ga = groups(a.findings);
  const gb = groups(b.findings);
  const findings: FindingsChange<F> = { new: [], resolved: [], unchanged: [] };
  const keys = [...new Set([...ga.keys(), ...gb.keys()])].sort();
  for (const k of keys) {
    const la = ga.get(k) ?? [];
    const lb = gb.get(k) ?? [];
    const n = Math.min(la.length, lb.length);
    for (let i = 0; i < n; i++) findings.unchanged.push({ before: la[i]!, after: lb[i]! });
    findings.resolved.push(...la.slice(n));
    findings.new.push(...lb.slice(n));
  }
  return { entities, findings };
}
