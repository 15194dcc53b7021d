import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { clientAddressFrom, normalizeAddress, parseTrustedProxyHops, UNKNOWN_ADDRESS } from "./client-address";

// Addresses from the documentation ranges (RFC 5737, RFC 3849).
const CLIENT = "203.0.113.7";
const PROXY_1 = "198.51.100.1";
const PROXY_2 = "198.51.100.2";

describe("clientAddressFrom", () => {
  it("without trusted proxies it is the TCP peer, whatever X-Forwarded-For says", () => {
    expect(clientAddressFrom("::ffff:127.0.0.1", "1.2.3.4", 0)).toBe("127.0.0.1");
    expect(clientAddressFrom(CLIENT, undefined, 0)).toBe(CLIENT);
  });

  it("with N trusted proxies it is the N-th address counted from the nearest (RFC 7239 §7.4)", () => {
    // Client → proxy 1 → app: proxy 1 appends the client; the peer is proxy 1.
    expect(clientAddressFrom(PROXY_1, CLIENT, 1)).toBe(CLIENT);
    // The client forged an entry in front: only the entry proxy 1 wrote counts.
    expect(clientAddressFrom(PROXY_1, `6.6.6.6, ${CLIENT}`, 1)).toBe(CLIENT);
    // Client → proxy 2 → proxy 1 → app.
    expect(clientAddressFrom(PROXY_1, `6.6.6.6, ${CLIENT}, ${PROXY_2}`, 2)).toBe(CLIENT);
    // Two headers arrive joined by a comma.
    expect(clientAddressFrom(PROXY_1, `${CLIENT},${PROXY_2}`, 2)).toBe(CLIENT);
  });

  it("with fewer entries than hops the left-most address is taken; a malformed one is unknown", () => {
    expect(clientAddressFrom(PROXY_1, undefined, 1)).toBe(PROXY_1);
    expect(clientAddressFrom(PROXY_1, CLIENT, 3)).toBe(CLIENT);
    expect(clientAddressFrom(PROXY_1, "not-an-ip", 1)).toBe(UNKNOWN_ADDRESS);
    expect(clientAddressFrom(undefined, undefined, 0)).toBe(UNKNOWN_ADDRESS);
  });

  it("a client cannot choose its address: any X-Forwarded-For it sends leaves the answer to the trusted part (property)", () => {
    const ipv4 = fc.tuple(fc.nat(255), fc.nat(255), fc.nat(255), fc.nat(255)).map((p) => p.join("."));
    fc.assert(
      fc.property(fc.array(ipv4, { maxLength: 5 }), ipv4, ipv4, fc.nat(3), (forged, client, peer, hops) => {
        // What trusted proxies wrote: the client, then hops−1 proxy addresses.
        const trusted = hops === 0 ? [] : [client, ...Array.from({ length: hops - 1 }, (_, i) => `10.0.0.${i + 1}`)];
        const header = [...forged, ...trusted].join(", ");
        const want = hops === 0 ? peer : client;
        expect(clientAddressFrom(peer, header, hops)).toBe(normalizeAddress(want));
      }),
    );
  });
});

describe("normalizeAddress", () => {
  it.each([
    ["::ffff:10.1.2.3", "10.1.2.3"],
    ["[2001:DB8::1]:443", "2001:db8::1"],
    ["203.0.113.9:51234", "203.0.113.9"],
    ["fe80::1%eth0", "fe80::1"],
    [" 192.0.2.1 ", "192.0.2.1"],
    ["999.1.1.1", null],
    ["", null],
  ])("%s → %s", (raw, want) => {
    expect(normalizeAddress(raw)).toBe(want);
  });
});

describe("parseTrustedProxyHops", () => {
  it("reads 0–9 and refuses anything else", () => {
    expect(parseTrustedProxyHops(undefined)).toBe(0);
    expect(parseTrustedProxyHops("")).toBe(0);
    expect(parseTrustedProxyHops("2")).toBe(2);
    expect(() => parseTrustedProxyHops("-1")).toThrow(/HETEROLANE_TRUSTED_PROXY_HOPS/);
    expect(() => parseTrustedProxyHops("yes")).toThrow(/HETEROLANE_TRUSTED_PROXY_HOPS/);
  });
});
