"use client";
import { createAuthClient } from "better-auth/react";
import { organizationClient } from "better-auth/client/plugins";
import { ac, roles } from "@/lib/permissions";

/**
 * The browser side of better-auth, with the same access-control statements
 * and roles as the server (src/lib/permissions). Same origin as the app, so
 * no baseURL is needed.
 */
export const authClient = createAuthClient({
  plugins: [organizationClient({ ac, roles })],
});
