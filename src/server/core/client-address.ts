import { isIP } from "node:net";

/**
 * The client address of a request (rate limits, better-auth's session
 * records). The app takes `X-Forwarded-For` into account only as far as a
 * setting says it may: HETEROLANE_TRUSTED_PROXY_HOPS is the number of
 * reverse proxies in front of it that each append the address they received
 * the request from. With 0 (the default) the header is ignored and the
 * address of the TCP peer is the client. With N, the peer and the last N−1
 * entries of the header are those proxies, and the entry before them is the
 * client (anything further left was written by the client and is not
 * believed). This is the rule of RFC 7239 §7.4 ("the proxy chain … can only
 * be trusted as far as the proxies are known") applied to the de-facto
 * X-Forwarded-For header.
 *
 * Next 16 does not hand route handlers or server actions the TCP peer (it
 * only fills X-Forwarded-For with it when the client sent none), so the
 * server process records it in CLIENT_ADDRESS_HEADER on every request before
 * Next sees it (client-address-hook.ts, registered by instrumentation.ts),
 * overwriting whatever the client sent under that name.
 *
 * Kept free of `server-only` on purpose: instrumentation.ts loads it outside
 * the React server layer.
 */

/** The request header that carries the client address as this module decided it. */
export const CLIENT_ADDRESS_HEADER = "x-heterolane-client-address";

/** Written when no address could be determined (a shared bucket for rate limits). */
export const UNKNOWN_ADDRESS = "unknown";

/** An address in its plain form: IPv4-mapped IPv6 (`::ffff:10.0.0.1`) as IPv4, IPv6 lower-case, brackets and zone ids removed. */
export function normalizeAddress(raw: string | undefined | null): string | null {
  if (!raw) return null;
  let a = raw.trim();
  // "[2001:db8::1]:443" and "203.0.113.7:51234" (some proxies append the port).
  const bracketed = a.match(/^\[([^\]]+)\](?::\d+)?$/);
  if (bracketed) a = bracketed[1]!;
  else if (/^\d{1,3}(\.\d{1,3}){3}:\d+$/.test(a)) a = a.slice(0, a.lastIndexOf(":"));
  a = a.replace(/%.*$/, "").toLowerCase();
  const mapped = a.match(/^::ffff:(\d{1,3}(\.\d{1,3}){3})$/);
  if (mapped) a = mapped[1]!;
  return isIP(a) ? a : null;
}

/**
 * The client address from the TCP peer, the X-Forwarded-For header as
 * received (possibly several headers joined by commas) and the number of
 * trusted proxy hops. With fewer entries than hops the left-most entry is
 * taken (every address in the chain was written by a trusted proxy). A
 * malformed entry where the client should be gives UNKNOWN_ADDRESS, not a
 * guess.
 */
export function clientAddressFrom(
  peer: string | undefined | null,
  forwardedFor: string | undefined | null,
  hops: number,
): string {
  if (hops <= 0) return normalizeAddress(peer) ?? UNKNOWN_ADDRESS;
  const chain = (forwardedFor ?? "")
    .split(",")
    .map((s) => s.trim())
    .filter((s) => s !== "");
  // Nearest first: the peer, then the header from right to left.
  const nearestFirst = [peer ?? "", ...chain.reverse()];
  const picked = nearestFirst[Math.min(hops, nearestFirst.length - 1)];
  return normalizeAddress(picked) ?? UNKNOWN_ADDRESS;
}

/** Reads HETEROLANE_TRUSTED_PROXY_HOPS (0 when unset); anything but a whole number 0–9 is a configuration error. */
export function parseTrustedProxyHops(raw: string | undefined): number {
  if (raw === undefined || raw.trim() === "") return 0;
  if (!/^\d$/.test(raw.trim()))
    throw new Error(`HETEROLANE_TRUSTED_PROXY_HOPS must be a whole number from 0 to 9 (got "${raw}"); see README.`);
  return Number(raw.trim());
}

/** The client address recorded on a request (UNKNOWN_ADDRESS when the hook did not run). */
export function clientAddress(h: Headers): string {
  return normalizeAddress(h.get(CLIENT_ADDRESS_HEADER)) ?? UNKNOWN_ADDRESS;
}
