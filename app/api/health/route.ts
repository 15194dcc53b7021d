import { checkDatabase } from "@/server/health";

export const dynamic = "force-dynamic";

export async function GET() {
  const up = await checkDatabase();
  return Response.json(up ? { ok: true, db: "up" } : { ok: false, db: "down" }, {
    status: up ? 200 : 503,
    headers: { "cache-control": "no-store" },
  });
}
