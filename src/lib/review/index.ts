/**
 * The review workflow: the plan state machine, waivers against open error
 * findings, revision comparison, @mentions and the audit CSV. Pure code;
 * src/server/review stores and mails. Readings: docs/decisions/016-review-readings.md.
 */
export * from "./types";
export { nextReviewState } from "./next-review-state";
export { reviewStateLabel } from "./review-state-label";
export { findingKey } from "./finding-key";
export { findingKeyText } from "./finding-key-text";
export { unwaivedErrors } from "./unwaived-errors";
export {
  compareRevisions,
  PLAN_SECTIONS,
  type PlanSection,
  type FieldChange,
  type EntityChange,
  type FindingsChange,
  type RevisionComparison,
  type ComparedRevision,
} from "./compare-revisions";
export { isEmptyComparison } from "./is-empty-comparison";
export { findMentions, type Mentionable } from "./find-mentions";
export { resolveMentions, type ResolvedMentions, type UnresolvedMention } from "./resolve-mentions";
export { unresolvedMentionsMessage } from "./unresolved-mentions-message";
export { auditCsv, AUDIT_CSV_HEADER, type AuditCsvRow } from "./audit-csv";
export type { Json } from "./internals/flatten";
