import { bigint, integer, pgTable, text } from "drizzle-orm/pg-core";

/**
 * Attempt counters of Heterolane's own rate limits (the sign-in and other
 * auth forms per client address, sign-in per account), one fixed window per
 * key. Kept apart from better-auth's `rate_limit` table, whose rows the
 * library prunes by its own (shorter) windows. In PostgreSQL, so every app
 * process counts the same attempts.
 */
export const attemptLimits = pgTable("attempt_limits", {
  key: text("key").primaryKey(),
  count: integer("count").notNull(),
  /** Start of the current window, ms since the epoch. */
  windowStart: bigint("window_start", { mode: "number" }).notNull(),
});
