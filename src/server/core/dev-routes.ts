import "server-only";
import { notFound } from "next/navigation";

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
