/**
 * EXPLAIN of the statements the measured pages ran (collected with PRESSWRIGHT_QUERY_COUNT=sql),
 * on the scale database, summarised per table access: which index, how many rows MariaDB expects
 * to read, and a flag on a full scan or a filesort over many rows.
 */
import mysql from "mysql2/promise";
import type { Statement } from "./queries";

export type Access = { table: string; type: string; key: string | null; rows: number; extra: string };
export type Explained = { sql: string; pages: string[]; accesses: Access[]; flag: string | null };

/** Rows a full scan or filesort may read before it counts as a problem at scale. */
const SCAN_ROWS = 1_000;

function revive(value: unknown): unknown {
  if (value && typeof value === "object" && (value as { type?: string }).type === "Buffer") return Buffer.from((value as { data: number[] }).data);
  return value;
}

export async function explainAll(migrateUrl: string, byPage: Map<string, Statement[]>): Promise<Explained[]> {
  const unique = new Map<string, { statement: Statement; pages: Set<string> }>();
  for (const [page, statements] of byPage) {
    for (const statement of statements) {
      if (!/^\s*(select|update|delete)\b/i.test(statement.sql)) continue;
      const entry = unique.get(statement.sql) ?? { statement, pages: new Set<string>() };
      entry.pages.add(page);
      unique.set(statement.sql, entry);
    }
  }
  const connection = await mysql.createConnection({ uri: migrateUrl, timezone: "Z" });
  const out: Explained[] = [];
  try {
    for (const { statement, pages } of unique.values()) {
      const sql = mysql.format(statement.sql, statement.params.map(revive) as never[]);
      const [plan] = await connection.query<mysql.RowDataPacket[]>(`EXPLAIN ${sql}`);
      const accesses: Access[] = plan.map((row) => ({ table: String(row.table ?? ""), type: String(row.type ?? ""), key: (row.key as string | null) ?? null, rows: Number(row.rows ?? 0), extra: String(row.Extra ?? "") }));
      const scan = accesses.find((a) => (a.type === "ALL" || a.type === "index") && a.rows > SCAN_ROWS);
      const sort = accesses.find((a) => /filesort/i.test(a.extra) && a.rows > SCAN_ROWS);
      out.push({ sql: statement.sql, pages: [...pages], accesses, flag: scan ? `full scan of ${scan.table} (${scan.rows} rows)` : sort ? `filesort over ${sort.rows} rows of ${sort.table}` : null });
    }
  } finally {
    await connection.end();
  }
  return out;
}
