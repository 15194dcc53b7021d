import { requireDevRoutes } from "@/server/core/dev-routes";

export const dynamic = "force-dynamic";

/**
 * Development-only routes (the captured-mail page /dev/mail and the lane
 * view lab /lab/…), behind one switch: outside a production build always,
 * in a production build only with HETEROLANE_DEV_ROUTES=1 (README:
 * Environment); 404 otherwise.
 */
export default function DevLayout({ children }: { children: React.ReactNode }) {
  requireDevRoutes();
  return children;
}
