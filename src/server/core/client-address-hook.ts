import { subscribe } from "node:diagnostics_channel";
import type { IncomingMessage } from "node:http";
import type { Socket } from "node:net";
import { CLIENT_ADDRESS_HEADER, clientAddressFrom, parseTrustedProxyHops } from "./client-address";

let installed = false;

/**
 * Records the client address of every HTTP request this process receives
 * in CLIENT_ADDRESS_HEADER, before Next.js handles the request. Node
 * publishes `http.server.request.start` (node:diagnostics_channel, a stable
 * built-in channel) synchronously before the server's `request` event, with
 * the request and its socket, so the header is set before any Next code
 * reads it; a value the client sent under the same name is overwritten.
 * Called once from instrumentation.ts `register()` (Node runtime only).
 */
export function installClientAddressHook(env: Record<string, string | undefined> = process.env): void {
  if (installed) return;
  const hops = parseTrustedProxyHops(env.HETEROLANE_TRUSTED_PROXY_HOPS);
  subscribe("http.server.request.start", (message) => {
    const { request, socket } = message as { request: IncomingMessage; socket: Socket };
    const fwd = request.headers["x-forwarded-for"];
    const forwarded = Array.isArray(fwd) ? fwd.join(",") : fwd;
    request.headers[CLIENT_ADDRESS_HEADER] = clientAddressFrom(socket.remoteAddress, forwarded, hops);
  });
  installed = true;
}
