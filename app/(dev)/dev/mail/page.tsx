import type { Metadata } from "next";
import { requireDevRoutes, requireLoopbackClient } from "@/server/core/dev-routes";
import { listCapturedMail } from "@/server/mail/captured";

export const metadata: Metadata = { title: "Captured e-mail (development)" };
export const dynamic = "force-dynamic";

/**
 * Messages caught by the local mail catcher, newest first. A development
 * route (see the `(dev)` layout), answered only to clients on this machine.
 */
export default async function DevMailPage() {
  requireDevRoutes();
  await requireLoopbackClient();
  const mails = await listCapturedMail(50);
  return (
    <main className="mx-auto max-w-4xl px-4 py-8">
      <h1 className="text-2xl font-semibold tracking-tight">Captured e-mail</h1>
      <p className="mb-6 text-sm text-ink-soft">
        Development only: messages the app sent to the local mail catcher, newest first (last 50). Nothing here leaves
        this machine.
      </p>
      {mails.length === 0 ? <p className="text-sm">No mail captured yet.</p> : null}
      <ol className="flex flex-col gap-4">
        {mails.map((m) => (
          <li key={m.id} className="rounded-md border border-ink/15 bg-white" data-mail-to={m.recipients.join(",")}>
            <header className="border-b border-ink/10 px-4 py-2 text-sm">
              <p className="font-semibold">{m.subject}</p>
              <p className="text-xs text-ink-soft">
                to {m.recipients.join(", ")} · from {m.sender} ·{" "}
                {m.receivedAt.toISOString().replace("T", " ").slice(0, 19)} UTC
              </p>
            </header>
            <div className="whitespace-pre-wrap break-words px-4 py-3 font-mono text-xs leading-relaxed">
              <Linkified text={m.text} />
            </div>
          </li>
        ))}
      </ol>
    </main>
  );
}

/** The text part with its http(s) addresses as links (no HTML from the message is rendered). */
function Linkified({ text }: { text: string }) {
  const parts = text.split(/(https?:\/\/[^\s<>"]+)/g);
  return (
    <>
      {parts.map((p, i) =>
        /^https?:\/\//.test(p) ? (
          <a key={i} href={p} className="text-lane-rf underline">
            {p}
          </a>
        ) : (
          <span key={i}>{p}</span>
        ),
      )}
    </>
  );
}
