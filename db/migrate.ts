import { drizzle } from "drizzle-orm/node-postgres";
import { migrate } from "drizzle-orm/node-postgres/migrator";
import { Pool } from "pg";

// Applies the committed migrations in drizzle/ (idempotent).
async function main() {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error("DATABASE_URL is not set");
  const pool = new Pool({ connectionString: url });
  try {
    await migrate(drizzle(pool), { migrationsFolder: new URL("../drizzle", import.meta.url).pathname });
    console.log("[db] migrations applied");
  } finally {
    await pool.end();
  }
}

main().catch((err) => {
  console.error("[db] migration failed:", err);
  process.exit(1);
});
