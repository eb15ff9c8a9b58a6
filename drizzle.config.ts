import "dotenv/config";
import { defineConfig } from "drizzle-kit";
import { migrationDatabaseUrl } from "./db/config";

export default defineConfig({
  dialect: "mysql",
  schema: "./db/schema/index.ts",
  out: "./db/migrations",
  dbCredentials: { url: migrationDatabaseUrl() },
  strict: true,
  verbose: true,
});
