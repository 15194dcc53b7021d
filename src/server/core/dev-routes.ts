import "server-only";
import { headers } from "next/headers";
import { notFound } from "next/navigation";
import { clientAddress } from "./client-address";

/**
 * Whether the development-only routes are served: the `(dev)` route group
 * (the captured-mail page /dev/mail and the lane view lab /lab/…). Always
 * outside a production build; in a production build only with
 * HETEROLANE_DEV_ROUTES=1. The older name HETEROLANE_DEV_MAIL is still read
 * when HETEROLANE_DEV_ROUTES is unset. Read at request time.
 */
export function devRoutesEnabled(env: Record<string, string | undefined> = process.env): boolean {
  if (env.NODE_ENV !== "production") return true;
  return (env.HETEROLANE_DEV_ROUTES ?? env.HETEROLANE_DEV_MAIL) === "1";
}

/** 404 unless the development routes are served (called by the `(dev)` group's layout). */
export function requireDevRoutes(): void {
  if (!devRoutesEnabled()) notFound();
}

/** True for an address of this machine (127.0.0.0/8 or ::1). */
export function isLoopback(address: string): boolean {
  return address === "::1" || /^127\.\d{1,3}\.\d{1,3}\.\d{1,3}$/.test(address);
}

/**
 * 404 unless the client is on this machine (the client address as the
 * server core decided it, src/server/core/client-address.ts): the
 * captured-mail page shows sign-in and password-reset links, so it is never
 * served to another machine, whatever the development switch says.
 */
export async function requireLoopbackClient(): Promise<void> {
  if (!isLoopback(clientAddress(await headers()))) notFound();
}
