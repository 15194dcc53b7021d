import { describe, expect, it } from "vitest";
import { COMMON_SECURITY_HEADERS, HSTS, NON_PAGE_CSP, newNonce, pageCsp, servedOverHttps } from "./security-headers";

type Header = { key: string; value: string };
type NextConfigModule = {
  default: { headers(): Promise<{ source: string; headers: Header[] }[]> };
  COMMON_SECURITY_HEADERS: Header[];
  NON_PAGE_CSP: string;
  HSTS: string;
};
// A plain ES module without types: read it as Next does.
const configPath: string = "../../../next.config.mjs";
const config = (await import(configPath)) as NextConfigModule;

describe("security headers", () => {
  it("next.config.mjs sends the same common headers, non-page CSP and HSTS as proxy.ts", async () => {
    expect(Object.fromEntries(config.COMMON_SECURITY_HEADERS.map((h) => [h.key.toLowerCase(), h.value]))).toEqual(
      COMMON_SECURITY_HEADERS,
    );
    expect(config.NON_PAGE_CSP).toBe(NON_PAGE_CSP);
    expect(config.HSTS).toBe(HSTS);
    const rules = await config.default.headers();
    expect(rules.map((r) => r.source)).toEqual(["/:path*", "/api/:path*", "/:path*"]);
  });

  it("the page CSP allows scripts only with the nonce, never inline, and forbids framing", () => {
    const csp = pageCsp("abc123");
    const script = csp.split("; ").find((d) => d.startsWith("script-src"))!;
    expect(script).toBe("script-src 'self' 'nonce-abc123' 'strict-dynamic'");
    expect(script).not.toContain("unsafe-inline");
    expect(script).not.toContain("unsafe-eval");
    expect(csp).toContain("frame-ancestors 'none'");
    expect(csp).toContain("object-src 'none'");
    expect(pageCsp("n", { dev: true })).toContain("'unsafe-eval'");
  });

  it("nonces are fresh, base64 and 128 bits", () => {
    const seen = new Set(Array.from({ length: 200 }, () => newNonce()));
    expect(seen.size).toBe(200);
    for (const n of seen) expect(atob(n)).toHaveLength(16);
  });

  it("https is taken from X-Forwarded-Proto when a proxy sends it, else from the URL", () => {
    expect(servedOverHttps("http://localhost:3000/", "https")).toBe(true);
    expect(servedOverHttps("http://localhost:3000/", "http")).toBe(false);
    expect(servedOverHttps("https://plans.example.org/", null)).toBe(true);
    expect(servedOverHttps("http://localhost:3000/", null)).toBe(false);
    expect(servedOverHttps("http://x/", "https, http")).toBe(true);
  });
});
