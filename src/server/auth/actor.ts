import "server-only";
import type { RoleName } from "@/lib/permissions";

/**
 * The signed-in person acting in their active team, as every Heterolane route
 * guard sees them. Built from the better-auth session (the active
 * organisation) and the member row (the role in that team).
 */
export interface Actor {
  userId: string;
  email: string;
  name: string;
  teamId: string;
  role: RoleName;
}
