import { z } from "zod";
import { REVIEW_DECISIONS } from "@/lib/review";
import { INT4_MAX, paramTextSchema, withTextRule } from "./fields";

/** Request bodies and queries of the review API and the notification settings form. */

const revisionNumber = z
  .number({ error: "must be a revision number" })
  .int("must be a whole number")
  .min(1, "must be 1 or more")
  .max(INT4_MAX, `must be ${INT4_MAX} or less`);
const note = withTextRule(z.string({ error: "must be text" }).trim().max(2000, "must be at most 2000 characters"), {
  multiLine: true,
});

export const submitReviewSchema = z.strictObject({
  /** The revision the caller saw; refused with 409 when the plan has moved on since. */
  revision: revisionNumber.optional(),
  note: note.optional(),
});

export const decideReviewSchema = z
  .strictObject({
    decision: z.enum(REVIEW_DECISIONS, { error: 'must be "baseline" or "request-changes"' }),
    revision: revisionNumber.optional(),
    note: note.optional(),
  })
  .superRefine((v, ctx) => {
    if (v.decision === "request-changes" && !v.note)
      ctx.addIssue({ code: "custom", path: ["note"], message: "say which changes are needed" });
  });

const reason = withTextRule(
  z
    .string({ error: "must be text" })
    .trim()
    .min(3, "give the reason for accepting this finding (3 characters or more)")
    .max(2000, "must be at most 2000 characters"),
  { multiLine: true },
);

export const createWaiverSchema = z.strictObject({
  findingId: z.uuid({ error: "must be the id of a finding" }),
  reason,
});

export const updateWaiverSchema = z.strictObject({
  reason,
  version: z.number({ error: "must be the waiver's version" }).int().min(1).max(INT4_MAX),
});

export const createCommentSchema = z.strictObject({
  body: withTextRule(
    z.string({ error: "must be text" }).trim().min(1, "write something").max(5000, "must be at most 5000 characters"),
    { multiLine: true },
  ),
  /** Defaults to the newest revision. */
  revision: revisionNumber.optional(),
  channelKey: withTextRule(z.string().trim().min(1, "must not be empty").max(200)).optional(),
  findingId: z.uuid({ error: "must be the id of a finding" }).optional(),
});

const positiveInt = (label: string) =>
  z
    .string({ error: `${label} is required` })
    .regex(/^[1-9]\d{0,8}$/, `${label} must be a revision number (1 or more)`)
    .transform(Number);

export const compareQuerySchema = z.object({ from: positiveInt("from"), to: positiveInt("to") });

const day = z
  .string()
  .regex(/^\d{4}-\d{2}-\d{2}$/, "must be a date as YYYY-MM-DD")
  .refine((s) => !Number.isNaN(Date.parse(`${s}T00:00:00Z`)), "is not a real date");

export const auditQuerySchema = z
  .object({
    mission: z.uuid({ error: "must be a mission id" }).optional(),
    person: paramTextSchema(200).trim().min(1).optional(),
    action: paramTextSchema(100).trim().min(1).optional(),
    from: day.optional(),
    to: day.optional(),
  })
  .superRefine((v, ctx) => {
    if (v.from && v.to && v.from > v.to)
      ctx.addIssue({ code: "custom", path: ["to"], message: "must not be before from" });
  });
export type AuditQuery = z.infer<typeof auditQuerySchema>;

export const notificationPreferencesSchema = z.object({
  reviewRequested: z.boolean().default(false),
  reviewDecided: z.boolean().default(false),
  mentioned: z.boolean().default(false),
});
