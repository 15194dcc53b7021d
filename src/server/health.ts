import "server-only";
import { pool } from "@db/client";

/** True when PostgreSQL answers a trivial query within two seconds. */
export async function checkDatabase(): Promise<boolean> {
  try {
    const result = await Promise.race([
      pool.query("select 1 as up"),
      new Promise<never>((_, reject) => setTimeout(() => reject(new Error("timeout")), 2_000)),
    ]);
    return result.rows[0]?.up === 1;
  } catch {
    return false;
  }
}
