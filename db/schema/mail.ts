import { pgTable, text, timestamp, uuid } from "drizzle-orm/pg-core";

/**
 * Messages caught by the local mail catcher (src/ops/fake-smtp.ts) in
 * development and tests. Empty in production, where SMTP_URL points to a real
 * provider.
 */
export const capturedMail = pgTable("captured_mail", {
  id: uuid("id").primaryKey().defaultRandom(),
  recipients: text("recipients").array().notNull(),
  sender: text("sender").notNull(),
  subject: text("subject").notNull(),
  text: text("text").notNull(),
  html: text("html").notNull(),
  receivedAt: timestamp("received_at", { withTimezone: true }).notNull().defaultNow(),
});

export type CapturedMail = typeof capturedMail.$inferSelect;
