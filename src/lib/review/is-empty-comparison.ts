import type { RevisionComparison } from "./compare-revisions";
import type { FindingLike } from "./types";

/** True when two revisions have the same plan fields and no new or resolved finding. */
export function isEmptyComparison(c: RevisionComparison<FindingLike>): boolean {
  return c.entities.length === 0 && c.findings.new.length === 0 && c.findings.resolved.length === 0;
}
