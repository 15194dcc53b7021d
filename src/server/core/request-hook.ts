import { subscribe } from "node:diagnostics_channel";
import type { IncomingMessage } from "node:http";
import type { Socket } from "node:net";
import { CLIENT_ADDRESS_HEADER, clientAddressFrom, parseTrustedProxyHops } from "./client-address";
import { escapeNonUtf8, NOT_UTF8_HEADER } from "./percent-encoding";

let installed = false;

/**
 * Looks at every HTTP request this process receives before Next.js does.
 * Node publishes `http.server.request.start` (node:diagnostics_channel, a
 * built-in channel) synchronously before the server's `request` event,
 * with the request and its socket. The hook
 *
 * - records the client address in CLIENT_ADDRESS_HEADER, from the TCP peer
 *   and the trusted-proxy setting (client-address.ts), overwriting whatever
 *   the client sent under that name;
 * - escapes a request target whose percent-encoding is not UTF-8 and
 *   records where in NOT_UTF8_HEADER (percent-encoding.ts), removing any
 *   client-sent value of that header.
 *
 * Called once from instrumentation.ts `register()` (Node runtime only).
 */
export function installRequestHook(env: Record<string, string | undefined> = process.env): void {
  if (installed) return;
  const hops = parseTrustedProxyHops(env.HETEROLANE_TRUSTED_PROXY_HOPS);
  subscribe("http.server.request.start", (message) => {
    const { request, socket } = message as { request: IncomingMessage; socket: Socket };
    const fwd = request.headers["x-forwarded-for"];
    const forwarded = Array.isArray(fwd) ? fwd.join(",") : fwd;
    request.headers[CLIENT_ADDRESS_HEADER] = clientAddressFrom(socket.remoteAddress, forwarded, hops);
    delete request.headers[NOT_UTF8_HEADER];
    if (request.url && request.url.includes("%")) {
      const { target, places } = escapeNonUtf8(request.url);
      if (places.length) {
        request.url = target;
        request.headers[NOT_UTF8_HEADER] = places.join(",");
      }
    }
  });
  installed = true;
}
