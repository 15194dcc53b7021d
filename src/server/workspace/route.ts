import "server-only";
import type { Permission } from "@/lib/permissions";
import { requireActor } from "@/server/auth/guard";
import { errorResponse, readJsonBody } from "@/server/http";
import type { Actor } from "@/server/auth/actor";

/** Permissions of the workspace routes (docs/permissions.md). */
export const CAN = {
  read: { mission: ["read"] },
  export: { plan: ["export"] },
  audit: { audit: ["read"] },
  createMission: { mission: ["create"] },
  updateMission: { mission: ["update"] },
  deleteMission: { mission: ["delete"] },
  edit: { plan: ["edit"] },
  import: { plan: ["import"] },
} satisfies Record<string, Permission>;

export type Params<K extends string> = { params: Promise<Record<K, string>> };

/**
 * A thin route handler: loads the actor and checks the permission first
 * (401 signed out, 403 role may not act), then runs the service; every
 * thrown error becomes its JSON answer.
 */
export function guarded<K extends string>(
  permission: Permission,
  what: string,
  fn: (ctx: {
    request: Request;
    actor: Actor;
    params: Record<K, string>;
    query: Record<string, string>;
  }) => Promise<Response>,
) {
  return async (request: Request, context: Params<K>): Promise<Response> => {
    try {
      const actor = await requireActor(request.headers, permission, what);
      const params = context?.params ? await context.params : ({} as Record<K, string>);
      const query = Object.fromEntries(new URL(request.url).searchParams);
      return await fn({ request, actor, params, query });
    } catch (err) {
      return errorResponse(err);
    }
  };
}

export const json = (body: unknown, status = 200) => Response.json(body, { status });
export { readJsonBody };
