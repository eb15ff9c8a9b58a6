/**
 * Writes generated rows with multi-row INSERTs (thousands of rows per statement).
 * Foreign-key checks are off for the session only so answers can go in before their signed
 * inspection: the read-only triggers of migration 0013 refuse answers to an inspection that is
 * already signed, and updating 20,000 rows one by one to sign them would be slow.
 */
import type mysql from "mysql2/promise";
import { TABLE_ORDER, type Row, type ShopRows, type TableName } from "./generate";

const ROWS_PER_STATEMENT = 2_000;

export async function prepareSession(connection: mysql.Connection): Promise<void> {
  await connection.query("SET SESSION foreign_key_checks = 0");
}

async function insertRows(connection: mysql.Connection, table: TableName, rows: Row[]): Promise<void> {
  if (rows.length === 0) return;
  const columns = Object.keys(rows[0]!);
  const list = columns.map((c) => `\`${c}\``).join(", ");
  for (let i = 0; i < rows.length; i += ROWS_PER_STATEMENT) {
    const chunk = rows.slice(i, i + ROWS_PER_STATEMENT).map((row) => columns.map((c) => row[c]));
    await connection.query(`INSERT INTO \`${table}\` (${list}) VALUES ?`, [chunk]);
  }
}

/** Inserts shops' rows table by table, in TABLE_ORDER, inside one transaction. */
export async function insertShops(connection: mysql.Connection, shops: ShopRows[]): Promise<void> {
  await connection.beginTransaction();
  try {
    for (const table of TABLE_ORDER) await insertRows(connection, table, shops.flatMap((s) => s[table]));
    await connection.commit();
  } catch (error) {
    await connection.rollback();
    throw error;
  }
}
