import { collectionRoutes } from "@/server/workspace/entity-routes";

const routes = collectionRoutes("channels");
export const GET = routes.GET;
export const POST = routes.POST;
