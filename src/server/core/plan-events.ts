import "server-only";
import type { Actor } from "@/server/auth/actor";
import type { Tx } from "./db";

/**
 * Plan events: how the workspace tells other areas that a plan changed,
 * without importing their internals (and without them importing the
 * workspace's).
 *
 * Contract: the workspace's save path (`saveAndCheck`) calls `planEdited`
 * of every listener once per stored change, inside the change's transaction
 * (`tx`), while it holds the mission row lock, after the new plan has been
 * validated and before the new revision is stored. A listener may write in
 * `tx`; if it throws, the whole change rolls back.
 *
 * Listeners: review (`src/server/review/plan-events.ts`): an edit during a
 * review withdraws that review.
 */
export interface PlanEditedEvent {
  tx: Tx;
  missionId: string;
  /** Who made the change. */
  actor: Actor;
}

export interface PlanEvents {
  planEdited(event: PlanEditedEvent): Promise<void>;
}
