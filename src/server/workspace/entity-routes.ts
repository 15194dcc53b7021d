import "server-only";
import { deleteQuerySchema, type EntityKind } from "@/schemas/workspace";
import { createEntity, deleteEntity, getEntity, listEntities, updateEntity } from "./entities";
import { parseOr400 } from "./errors";
import { CAN, guarded, json, readJsonBody } from "./route";

/** Handlers of `/api/v1/missions/{missionId}/{kind}`: list and create. */
export function collectionRoutes(kind: EntityKind) {
  return {
    GET: guarded<"missionId">(CAN.read, `read ${kind}`, async ({ actor, params }) =>
      json({ [kind]: await listEntities(actor, params.missionId, kind) }),
    ),
    POST: guarded<"missionId">(CAN.edit, `add ${kind}`, async ({ request, actor, params }) => {
      const { entity, revision } = await createEntity(actor, params.missionId, kind, await readJsonBody(request));
      return json({ ...entity, revision }, 201);
    }),
  };
}

/** Handlers of `/api/v1/missions/{missionId}/{kind}/{id}`: read, update (with version), delete (with ?version=). */
export function itemRoutes(kind: EntityKind) {
  type P = "missionId" | "id";
  return {
    GET: guarded<P>(CAN.read, `read ${kind}`, async ({ actor, params }) =>
      json(await getEntity(actor, params.missionId, kind, params.id)),
    ),
    PATCH: guarded<P>(CAN.edit, `change ${kind}`, async ({ request, actor, params }) => {
      const { entity, revision } = await updateEntity(
        actor,
        params.missionId,
        kind,
        params.id,
        await readJsonBody(request),
      );
      return json({ ...entity, revision });
    }),
    DELETE: guarded<P>(CAN.edit, `remove ${kind}`, async ({ actor, params, query }) => {
      const { version } = parseOr400(deleteQuerySchema, query, "query");
      return json({ deleted: params.id, ...(await deleteEntity(actor, params.missionId, kind, params.id, version)) });
    }),
  };
}
