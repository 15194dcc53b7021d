/**
 * The server core: what every area (workspace, review, team) and every route
 * handler and server action builds on. Route guard and action guards,
 * response helpers and the error body, input parsing, transactions, the
 * team scope of missions, the activity log, the plan-events contract and the
 * switch of the development routes.
 */
export { guarded, checkOrigin, queryOf, ANY_MEMBER, type Access, type RouteSpec, type RouteContext } from "./guard";
export { formAction, stateAction, plainAction, type ActionAccess, type ActionState } from "./action";
export {
  HttpError,
  unauthorized,
  noTeam,
  forbidden,
  notFound,
  invalidInput,
  staleVersion,
  json,
  errorBody,
  errorResponse,
  httpErrorResponse,
  crossOrigin,
  unavailable,
  type Issue,
} from "./http";
export { readJsonBody, readJsonText, parseJsonText, readBodyBytes, assertJsonContentType } from "./body";
export { isDatabaseUnreachable } from "./unavailable";
export { needsOriginCheck, isBearerOnly, crossSiteReason } from "./request-origin";
export { clientAddress, CLIENT_ADDRESS_HEADER } from "./client-address";
export { parseOr400, isUuid, UUID } from "./input";
export { afterCommit, inTransaction, mapDbError, type Tx, type Queryable } from "./db";
export { getMissionRow, lockMission } from "./mission-scope";
export { writeActivity, type ActivityEntry, type ActivityActor } from "./activity";
export type { PlanEvents, PlanEditedEvent } from "./plan-events";
export { devRoutesEnabled, requireDevRoutes } from "./dev-routes";
