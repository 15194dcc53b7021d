import type { Permission } from "@/lib/permissions";

/** Permissions of the workspace routes (docs/permissions.md). */
export const CAN = {
  read: { mission: ["read"] },
  export: { plan: ["export"] },
  audit: { audit: ["read"] },
  createMission: { mission: ["create"] },
  updateMission: { mission: ["update"] },
  deleteMission: { mission: ["delete"] },
  edit: { plan: ["edit"] },
  import: { plan: ["import"] },
} satisfies Record<string, Permission>;
