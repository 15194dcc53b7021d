import "server-only";
import { deleteQuerySchema, entityCreateSchemas, entityUpdateSchemas, type EntityKind } from "@/schemas/workspace";
import { guarded } from "@/server/core/guard";
import { json } from "@/server/core/http";
import { CAN } from "./can";
import { createEntity, deleteEntity, getEntity, listEntities, singularOf, updateEntity } from "./entities";

/** Handlers of `/api/v1/missions/{missionId}/{kind}`: list and create. */
export function collectionRoutes(kind: EntityKind) {
  return {
    GET: guarded(CAN.read, { what: `read ${kind}`, params: ["missionId"] }, async ({ actor, params }) =>
      json({ [kind]: await listEntities(actor, params.missionId, kind) }),
    ),
    POST: guarded(
      CAN.edit,
      { what: `add ${kind}`, params: ["missionId"], body: entityCreateSchemas[kind], input: singularOf(kind) },
      async ({ actor, params, body }) => {
        const { entity, revision } = await createEntity(actor, params.missionId, kind, body);
        return json({ ...entity, revision }, 201);
      },
    ),
  };
}

/** Handlers of `/api/v1/missions/{missionId}/{kind}/{id}`: read, update (with version), delete (with ?version=). */
export function itemRoutes(kind: EntityKind) {
  const params = ["missionId", "id"] as const;
  return {
    GET: guarded(CAN.read, { what: `read ${kind}`, params }, async ({ actor, params }) =>
      json(await getEntity(actor, params.missionId, kind, params.id)),
    ),
    PATCH: guarded(
      CAN.edit,
      { what: `change ${kind}`, params, body: entityUpdateSchemas[kind], input: `${singularOf(kind)} update` },
      async ({ actor, params, body }) => {
        const { entity, revision } = await updateEntity(actor, params.missionId, kind, params.id, body);
        return json({ ...entity, revision });
      },
    ),
    DELETE: guarded(
      CAN.edit,
      { what: `remove ${kind}`, params, query: deleteQuerySchema, input: "query" },
      async ({ actor, params, query }) =>
        json({ deleted: params.id, ...(await deleteEntity(actor, params.missionId, kind, params.id, query.version)) }),
    ),
  };
}
