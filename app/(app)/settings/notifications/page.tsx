import type { Metadata } from "next";
import { NotificationForm } from "@/components/review/notification-form";
import { requirePageActor } from "@/server/auth/page-guard";
import { getPreferences } from "@/server/review";
import { savePreferencesAction } from "./actions";

export const metadata: Metadata = { title: "Notifications" };

export default async function NotificationsPage() {
  const actor = await requirePageActor("/settings/notifications");
  const prefs = await getPreferences(actor.userId);
  return (
    <main className="mx-auto max-w-2xl px-6 py-6">
      <h1 className="text-2xl font-semibold text-slate-900">Notifications</h1>
      <p className="mt-1 text-sm text-slate-700">Choose which review e-mails Heterolane sends to {actor.email}.</p>
      <NotificationForm initial={prefs} action={savePreferencesAction} />
    </main>
  );
}
