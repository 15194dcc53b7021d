import { json, RETRY_AFTER_SECONDS } from "@/server/core/http";
import { checkDatabase } from "@/server/health";

export const dynamic = "force-dynamic";

/** Load balancer probe: 200 with the database up, 503 with Retry-After while it is unreachable. No sign-in (and no auth import). */
export async function GET() {
  const up = await checkDatabase();
  if (up) return json({ ok: true, db: "up" }, 200, { "cache-control": "no-store" });
  return json({ ok: false, db: "down" }, 503, {
    "cache-control": "no-store",
    "retry-after": String(RETRY_AFTER_SECONDS),
  });
}
