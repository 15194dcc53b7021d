/**
 * The plan document, versions `heterolane.plan/1` and `heterolane.plan/2`
 * (docs/plan-format.md §2 "The plan document" and §12 "Version 2"):
 * its schema, its validation and its reading from JSON text. The parts live
 * in `./plan/`:
 *
 * - `document.ts`: the zod schema (field rules from `./fields.ts`) and the plan types;
 * - `cross-field.ts`: the rules that relate several fields (min below max,
 *   DSB offset, unique ids, references, one chain per laser);
 * - `versions.ts`: the accepted versions, which fields version 2 adds and
 *   their defaults, and the refusal of a version 2 field in a version 1 document;
 * - `messages.ts`: the wording and reading order of the issues;
 * - `format-path.ts`: JSON paths such as `channels[2].bandwidthMHz`;
 * - `json-text.ts`: JSON text with the position of a syntax error;
 * - `parse.ts`: `parsePlan` and `parsePlanText`, which report every issue.
 */
export {
  PLAN_FORMAT,
  PLAN_FORMAT_V1,
  PLAN_FORMATS,
  PLAN_LIMITS,
  planSchema,
  planDocumentSchema,
  type Plan,
  type PlanInput,
  type PlanSettings,
  type PlanLaser,
  type PlanReach,
  type PlanLock,
  type PlanSchedule,
  type PlanDwell,
  type PlanResonator,
  type PlanDetector,
  type PlanChain,
  type PlanChannel,
} from "./plan/document";
export { crossFieldIssues } from "./plan/cross-field";
export { VERSION_2_FIELDS, VERSION_2_NOISE_FIELDS, versionIssues, type PlanFormat } from "./plan/versions";
export { formatPath } from "./plan/format-path";
export type { PlanIssue } from "./plan/messages";
export { jsonErrorOffset } from "./plan/json-text";
export { parsePlan, parsePlanText, type ParsePlanResult } from "./plan/parse";
export { PLAN_BOUNDS, planBoundIssues, type Bound } from "./plan/bounds";
