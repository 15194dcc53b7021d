import { toNextJsHandler } from "better-auth/next-js";
import { auth } from "@/server/auth/auth";
import { authRoute } from "@/server/auth/http-route";

const handler = toNextJsHandler(auth);

/** better-auth's HTTP API, inside the server core's origin, body-size, per-account and outage rules. */
export const GET = authRoute(handler.GET);
export const POST = authRoute(handler.POST);
