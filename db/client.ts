import { drizzle } from "drizzle-orm/node-postgres";
import { Pool } from "pg";
import * as schema from "./schema";

// One pool per process. The app keeps no other state in memory: sessions,
// teams and plans all live in PostgreSQL, so any number of app processes can
// run behind a load balancer against the same database.
const globalForDb = globalThis as unknown as { heterolanePool?: Pool };

function databaseUrl(): string {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error("DATABASE_URL is not set (see README: Environment)");
  return url;
}

export const pool: Pool =
  globalForDb.heterolanePool ??
  new Pool({
    connectionString: databaseUrl(),
    max: Number(process.env.DATABASE_POOL_MAX ?? 10),
    connectionTimeoutMillis: 3_000,
    idleTimeoutMillis: 30_000,
  });

// A dropped connection must not crash the process: the pool reconnects on the
// next query, and /api/health reports the outage meanwhile.
pool.on("error", (err) => {
  console.error("[db] idle client error:", err.message);
});

globalForDb.heterolanePool = pool;

export const db = drizzle(pool, { schema });
export type Db = typeof db;
