/**
 * Runs once when a server process starts (Next.js instrumentation hook).
 * In the Node runtime it installs the hook that records each request's
 * client address from the TCP peer and the trusted-proxy setting
 * (src/server/core/client-address.ts; docs/decisions/023-hardening.md).
 */
export async function register() {
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  const { installClientAddressHook } = await import("./src/server/core/client-address-hook");
  installClientAddressHook();
}
