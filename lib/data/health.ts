import "server-only";
import { sql } from "drizzle-orm";
import { db } from "@/db/client";

/** True when a trivial query succeeds. Authorization: none (reveals nothing). */
export async function pingDatabase(): Promise<boolean> {
  try {
    await db.execute(sql`SELECT 1`);
    return true;
  } catch {
    return false;
  }
}
