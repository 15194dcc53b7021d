import { json } from "@/server/core/http";
import { checkDatabase } from "@/server/health";

export const dynamic = "force-dynamic";

/** Load balancer probe: 200 with the database up, 503 while it is unreachable. No sign-in (and no auth import). */
export async function GET() {
  const up = await checkDatabase();
  return json(up ? { ok: true, db: "up" } : { ok: false, db: "down" }, up ? 200 : 503, { "cache-control": "no-store" });
}
