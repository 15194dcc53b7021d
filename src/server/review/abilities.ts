import "server-only";
import { roleCan } from "@/lib/permissions";
import type { Actor } from "@/server/auth/actor";

/** Which review controls to show (a hint only; every request is checked again on the server). */
export function reviewAbilities(actor: Actor | null) {
  const can = (a: "submit" | "decide" | "waive" | "comment") => (actor ? roleCan(actor.role, { review: [a] }) : false);
  return {
    canSubmit: can("submit"),
    canDecide: can("decide"),
    canWaive: can("waive"),
    canComment: can("comment"),
    userId: actor?.userId,
  };
}
