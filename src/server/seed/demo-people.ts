/**
 * The invented demo team and its four people, one per role (demo data,
 * marked as such in every name). Plain constants, without the database, so
 * that the API benchmark (src/bench/api.ts) can sign them in.
 */
export const DEMO_PASSWORD = "demo-password-2026";
export const DEMO_TEAM = { name: "Demo: Aurora sounder team", slug: "demo-aurora" } as const;
export const DEMO_PEOPLE = [
  { email: "olga.owner@demo.heterolane.local", name: "Olga Owner (demo)", role: "owner" },
  { email: "liam.lead@demo.heterolane.local", name: "Liam Lead (demo)", role: "lead" },
  { email: "erin.engineer@demo.heterolane.local", name: "Erin Engineer (demo)", role: "engineer" },
  { email: "victor.viewer@demo.heterolane.local", name: "Victor Viewer (demo)", role: "viewer" },
] as const;
