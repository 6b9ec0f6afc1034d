// The pool and the Drizzle client. One pool per process, cached on globalThis so dev reloads
// do not open a new pool each time.
import { drizzle } from "drizzle-orm/mysql2";
import mysql from "mysql2/promise";
import * as schema from "./schema";

const globalForDb = globalThis as unknown as { axlewrightPool?: mysql.Pool };

// mysql2 connects on first query, not here, so a build without DATABASE_URL still works; a query
// without it fails against this unreachable address and the server log says why.
function databaseUrl(): string {
  const url = process.env.DATABASE_URL;
  if (url) return url;
  if (process.env.NEXT_PHASE !== "phase-production-build") {
    console.error("DATABASE_URL is not set: start the app with `npm start` (or `npm test`).");
  }
  return "mysql://unset@127.0.0.1:9/unset";
}

export const pool =
  globalForDb.axlewrightPool ?? mysql.createPool({ uri: databaseUrl(), connectionLimit: 10, timezone: "Z" });
if (process.env.NODE_ENV !== "production") globalForDb.axlewrightPool = pool;

export const db = drizzle({ client: pool, schema, mode: "default" });
export { schema };
