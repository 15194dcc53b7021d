/**
 * The workspace's schedule editor (docs/plan-format.md §13): `PUT
 * /api/v1/missions/{missionId}/lasers/{id}/schedule` sends a laser pair's
 * whole observation schedule (or null to remove it) with the laser's
 * `version` last read. Field rules are those of the plan document
 * (`schedule-fields.ts`); dwells name their chain by row id (`chainId`),
 * like the other workspace forms.
 */
import { z } from "zod";
import { formRules as r, rowIdSchema } from "./fields";
import { dwellShape, MAX_DWELLS, scheduleShape } from "./schedule-fields";
import { versionSchema } from "./workspace";

export const scheduleDwellInputSchema = z
  .object({ chainId: rowIdSchema, ...dwellShape(r) }, { error: "is required" })
  .strict();

export const scheduleInputSchema = z
  .object(
    {
      ...scheduleShape(r),
      dwells: z
        .array(scheduleDwellInputSchema)
        .min(1, { error: "must list at least one dwell" })
        .max(MAX_DWELLS, { error: `may list at most ${MAX_DWELLS} dwells` }),
    },
    { error: "is required" },
  )
  .strict();
export type ScheduleInput = z.infer<typeof scheduleInputSchema>;

export const scheduleUpdateSchema = z
  .object({ version: versionSchema, schedule: scheduleInputSchema.nullable() }, { error: "is required" })
  .strict();
export type ScheduleUpdateInput = z.infer<typeof scheduleUpdateSchema>;
