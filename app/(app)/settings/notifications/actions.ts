"use server";
import { parseWithZod } from "@conform-to/zod/v4";
import { revalidatePath } from "next/cache";
import { notificationPreferencesSchema } from "@/schemas/review";
import { requireActor } from "@/server/auth/guard";
import { HttpError } from "@/server/http";
import { setPreferences } from "@/server/review";

/** Saves the signed-in person's review e-mail preferences (their own only). */
export async function savePreferencesAction(_prev: unknown, formData: FormData) {
  const submission = parseWithZod(formData, { schema: notificationPreferencesSchema });
  if (submission.status !== "success") return submission.reply();
  try {
    const actor = await requireActor();
    await setPreferences(actor.userId, submission.value);
  } catch (err) {
    if (err instanceof HttpError) return submission.reply({ formErrors: [err.message] });
    throw err;
  }
  revalidatePath("/settings/notifications");
  return { ...submission.reply(), saved: true };
}
