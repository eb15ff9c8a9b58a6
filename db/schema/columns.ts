import { customType, datetime } from "drizzle-orm/mysql-core";

/** Fixed-length binary column: MariaDB compares text case-insensitively, hashes must not be text. */
export const binary = customType<{ data: Buffer; driverData: Buffer; config: { length: number } }>({
  dataType(config) {
    return `binary(${config?.length ?? 32})`;
  },
});

/** UTC timestamp with millisecond precision (DATETIME carries no zone; we always write UTC). */
export const utc = (name: string) => datetime(name, { mode: "date", fsp: 3 });

/** Random public ids are 24 lowercase base32 characters (see lib/ids.ts). */
export const ID_LENGTH = 24;

/**
 * JSON column that round-trips on MariaDB: there JSON is an alias of LONGTEXT, so the driver hands
 * back a string that Drizzle's own `json()` would leave unparsed.
 */
export function jsonColumn<T>(name: string) {
  return customType<{ data: T; driverData: string | T }>({
    dataType() {
      return "json";
    },
    toDriver(value: T): string {
      return JSON.stringify(value);
    },
    fromDriver(value: string | T): T {
      return typeof value === "string" ? (JSON.parse(value) as T) : value;
    },
  })(name);
}
