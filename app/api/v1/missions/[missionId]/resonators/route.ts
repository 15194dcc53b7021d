import { collectionRoutes } from "@/server/workspace/entity-routes";

const routes = collectionRoutes("resonators");
export const GET = routes.GET;
export const POST = routes.POST;
