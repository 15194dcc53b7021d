export * from "./service";
export { compareMissionRevisions } from "./compare";
export { listAudit, auditFacets } from "./audit";
export { getPreferences, setPreferences, listTeamMembers } from "./members";
export { onPlanEdited } from "./on-plan-edited";
