// Security headers of every answer that is not a page (API answers, static
// files); pages get the same ones, with a nonce CSP, from proxy.ts. The
// values are those of src/server/core/security-headers.ts (a unit test,
// security-headers.test.ts, checks that the two agree).
const COMMON_SECURITY_HEADERS = [
  { key: "X-Frame-Options", value: "DENY" },
  { key: "Referrer-Policy", value: "strict-origin-when-cross-origin" },
  { key: "X-Content-Type-Options", value: "nosniff" },
];
const NON_PAGE_CSP = "default-src 'none'; frame-ancestors 'none'";
const HSTS = "max-age=31536000; includeSubDomains";

/** @type {import('next').NextConfig} */
const nextConfig = {
  serverExternalPackages: ["pg", "smtp-server", "nodemailer", "mailparser"],
  poweredByHeader: false,
  // Several local stacks (src/ops/dev-stack.sh) can run side by side, each
  // with its own build folder.
  distDir: process.env.NEXT_DIST_DIR || ".next",
  experimental: {
    // proxy.ts runs before server actions (for the cross-site check), so Next
    // copies their bodies for it; this bounds that copy. Actions take at most
    // 1 MB (Next's serverActions.bodySizeLimit default), API routes are not
    // matched by the proxy.
    proxyClientMaxBodySize: "2mb",
  },
  async headers() {
    return [
      { source: "/:path*", headers: COMMON_SECURITY_HEADERS },
      { source: "/api/:path*", headers: [{ key: "Content-Security-Policy", value: NON_PAGE_CSP }] },
      {
        source: "/:path*",
        has: [{ type: "header", key: "x-forwarded-proto", value: "https" }],
        headers: [{ key: "Strict-Transport-Security", value: HSTS }],
      },
    ];
  },
};

export default nextConfig;
export { COMMON_SECURITY_HEADERS, NON_PAGE_CSP, HSTS };
