export { submitReview, decideReview } from "./transitions";
export { listWaivers, createWaiver, updateWaiver, withdrawWaiver } from "./waivers";
export { listComments, createComment, commentsQuerySchema, type CommentsQuery } from "./comments";
export { getReviewOverview, getApproval } from "./overview";
export { compareMissionRevisions } from "./compare";
export { listAudit, auditFacets } from "./audit";
export { getPreferences, setPreferences, listTeamMembers } from "./members";
