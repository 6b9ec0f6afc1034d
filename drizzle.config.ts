import { defineConfig } from "drizzle-kit";

// Only `drizzle-kit generate` uses this (it reads the schema, not the database).
// Migrations are applied by scripts/db/migrate.ts on a single connection.
export default defineConfig({
  dialect: "mysql",
  schema: "./db/schema.ts",
  out: "./drizzle",
  dbCredentials: { url: process.env.DATABASE_URL ?? "mysql://app@127.0.0.1:3307/axlewright" },
});
