import "server-only";
import { desc } from "drizzle-orm";
import { db } from "@db/client";
import { capturedMail } from "@db/schema";

/** The newest messages caught by the local mail catcher (development only). */
export async function listCapturedMail(limit = 50) {
  return db.select().from(capturedMail).orderBy(desc(capturedMail.receivedAt)).limit(limit);
}
