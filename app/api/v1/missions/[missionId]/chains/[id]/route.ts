import { itemRoutes } from "@/server/workspace/entity-routes";

const routes = itemRoutes("chains");
export const GET = routes.GET;
export const PATCH = routes.PATCH;
export const DELETE = routes.DELETE;
