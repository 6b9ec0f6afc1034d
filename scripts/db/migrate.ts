// Applies the committed migrations in drizzle/ on a single connection (as Drizzle's docs advise).
import { drizzle } from "drizzle-orm/mysql2";
import { migrate } from "drizzle-orm/mysql2/migrator";
import mysql from "mysql2/promise";

const connection = await mysql.createConnection({ uri: process.env.DATABASE_URL!, multipleStatements: false });
try {
  await migrate(drizzle({ client: connection }), { migrationsFolder: "./drizzle" });
  console.log("[axlewright] database migrated");
} finally {
  await connection.end();
}
