"use server";
import { revalidatePath } from "next/cache";
import { notificationPreferencesSchema } from "@/schemas/review";
import { ANY_MEMBER, formAction } from "@/server/core";
import { setPreferences } from "@/server/review";

/** Saves the signed-in person's review e-mail preferences (their own only). */
export const savePreferencesAction = formAction(
  { access: ANY_MEMBER, what: "change notification settings", schema: notificationPreferencesSchema },
  async ({ actor, value, reply }) => {
    await setPreferences(actor.userId, value);
    revalidatePath("/settings/notifications");
    return { ...reply(), saved: true };
  },
);
