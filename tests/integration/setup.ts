// Integration tests talk to the real MariaDB test database (scripts/test.sh migrates it first).
// Refuse to run against anything that is not a test database, so a stray run never touches data.
const url = process.env.DATABASE_URL ?? "";
if (!/\/presswright_test(\?|$)/.test(url)) {
  throw new Error("Integration tests need DATABASE_URL pointing at presswright_test; run them through `npm test`.");
}

import { afterAll } from "vitest";
import { pool } from "@/db/client";

afterAll(async () => {
  await pool.end();
});
