/**
 * Runs once when a server process starts (Next.js instrumentation hook).
 * In the Node runtime it installs the hook that sees each request first:
 * it records the client address from the TCP peer and the trusted-proxy
 * setting, and escapes a request target that is not UTF-8
 * (src/server/core/request-hook.ts; docs/decisions/023-hardening.md).
 */
export async function register() {
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  const { installRequestHook } = await import("./src/server/core/request-hook");
  installRequestHook();
}
