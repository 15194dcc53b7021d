import { z } from "zod";
import { TEAM_ROLES } from "@/schemas/auth";

/** What a token's metadata holds: the team it acts in and its role there (written by our service only). */
export const tokenMetadataSchema = z.object({
  teamId: z.string().min(1),
  role: z.enum(TEAM_ROLES),
});
export type TokenMetadata = z.infer<typeof tokenMetadataSchema>;
