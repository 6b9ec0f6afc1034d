// Command line: `npm run backup [-- --out DIR] [--database NAME] [--bucket NAME]` writes a backup of
// the app's database and object store into DIR/<UTC date-time>/ (DIR defaults to backups/):
//   database.sql   a consistent dump (Debian's mariadb-dump --single-transaction, with the
//                  routines, the triggers that keep revisions and sign-offs unchangeable, and events)
//   objects/<key>  every object of the bucket, byte for byte
//   manifest.json  each object's key, size, SHA-256 and type, the dump's size and SHA-256, the
//                  database's name, tables and triggers, the last migration, the time
// The database is dumped before the objects are listed: the app stores a photo before the row that
// names it, so every object the dump refers to is in the store when it is copied. The settings are
// the app's (scripts/lib/backup-common.ts); an unreachable database or store is one line, exit 1.
import { mkdirSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import path from "node:path";
import { parseArgs } from "node:util";
import { GetObjectCommand, ListObjectsV2Command, type S3Client } from "@aws-sdk/client-s3";
import type mysql from "mysql2/promise";
import {
  bucketExists,
  clientProgram,
  connect,
  DUMP,
  Failure,
  MANIFEST,
  objectFile,
  objectStore,
  reason,
  root,
  runClient,
  runMain,
  say,
  sha256,
  shown,
  tableNames,
  targetSettings,
  triggerNames,
  type Manifest,
  type Target,
} from "./lib/backup-common";

const USAGE =
  "usage: npm run backup [-- --out DIR] [--database NAME] [--bucket NAME]\n" +
  "  writes DIR/<UTC date-time>/ (DIR defaults to backups/) with database.sql, objects/ and manifest.json;\n" +
  "  the database and the bucket are the app's (DATABASE_URL and S3_*, else the demo stack's .env.local)\n";

const tell = (message: string) => say("backup", message);

/** 2026-12-03T06:45:00.123Z → 2026-12-03T064500Z */
const folderName = (at: Date) =>
  at
    .toISOString()
    .replace(/\.\d+Z$/, "Z")
    .replace(/:/g, "");

async function migrationState(conn: mysql.Connection): Promise<Manifest["database"]["migrations"]> {
  const journal = JSON.parse(readFileSync(path.join(root, "drizzle/meta/_journal.json"), "utf8")) as {
    entries: { idx: number; tag: string; when: number }[];
  };
  const last = journal.entries.at(-1);
  let applied = 0;
  let appliedLastTag: string | null = null;
  try {
    const [rows] = await conn.query<mysql.RowDataPacket[]>(
      "SELECT created_at AS at FROM `__drizzle_migrations` ORDER BY created_at",
    );
    applied = rows.length;
    const at = rows.length ? Number(rows[rows.length - 1].at) : NaN;
    // drizzle records a migration's journal time ("when") as created_at.
    appliedLastTag = journal.entries.find((e) => e.when === at)?.tag ?? null;
  } catch {
    // No migrations table: a database that was never migrated.
  }
  return {
    journalLast: last ? { idx: last.idx, tag: last.tag, when: last.when } : null,
    applied,
    appliedLastTag,
  };
}

function dumpDatabase(t: Target, file: string, triggers: string[]): { bytes: number; sha256: string } {
  runClient(clientProgram("mariadb-dump"), t, [
    "--single-transaction",
    "--routines",
    "--triggers",
    "--events",
    "--hex-blob",
    "--tz-utc",
    `--result-file=${file}`,
    // The database as a plain argument (not --databases): the dump holds no CREATE DATABASE or USE,
    // so it can be loaded into a database of another name.
    t.db.database,
  ]);
  const data = readFileSync(file);
  const text = data.toString("utf8");
  if (!/-- Dump completed/.test(text.slice(-500))) throw new Failure("mariadb-dump stopped before the end of the dump");
  const missing = triggers.filter((name) => !text.includes(`TRIGGER \`${name}\``));
  if (missing.length) throw new Failure(`the dump lacks the trigger(s) ${missing.join(", ")}`);
  return { bytes: data.length, sha256: sha256(data) };
}

async function copyObjects(s3: S3Client, t: Target, folder: string): Promise<Manifest["objects"]["items"]> {
  const items: Manifest["objects"]["items"] = [];
  let token: string | undefined;
  do {
    let page;
    try {
      page = await s3.send(new ListObjectsV2Command({ Bucket: t.store.bucket, ContinuationToken: token }));
    } catch (error) {
      throw new Failure(`cannot list the bucket ${t.store.bucket} at ${t.store.endpoint} (${reason(error)})`);
    }
    for (const entry of page.Contents ?? []) {
      const key = entry.Key!;
      const file = objectFile(folder, key);
      let body: Uint8Array;
      let contentType: string | undefined;
      try {
        const out = await s3.send(new GetObjectCommand({ Bucket: t.store.bucket, Key: key }));
        body = await out.Body!.transformToByteArray();
        contentType = out.ContentType;
      } catch (error) {
        throw new Failure(`cannot read the object ${key} from ${t.store.endpoint} (${reason(error)})`);
      }
      mkdirSync(path.dirname(file), { recursive: true });
      writeFileSync(file, body);
      items.push({ key, size: body.length, sha256: sha256(body), ...(contentType ? { contentType } : {}) });
      if (items.length % 100 === 0) tell(`${items.length} objects copied…`);
    }
    token = page.IsTruncated ? page.NextContinuationToken : undefined;
  } while (token);
  return items;
}

async function main() {
  let values;
  try {
    ({ values } = parseArgs({
      options: {
        out: { type: "string" },
        database: { type: "string" },
        bucket: { type: "string" },
        help: { type: "boolean", short: "h" },
      },
      allowPositionals: false,
    }));
  } catch (error) {
    throw new Failure(`${reason(error)}; ${USAGE.split("\n")[0]}`);
  }
  if (values.help) {
    process.stdout.write(USAGE);
    return;
  }
  const t = targetSettings({ database: values.database, bucket: values.bucket });
  clientProgram("mariadb-dump");

  // Both ends answer before anything is written.
  const conn = await connect(t, t.db.database);
  let tables: string[];
  let triggers: string[];
  let migrations: Manifest["database"]["migrations"];
  try {
    tables = await tableNames(conn, t.db.database);
    triggers = await triggerNames(conn, t.db.database);
    migrations = await migrationState(conn);
  } finally {
    await conn.end();
  }
  const s3 = objectStore(t);
  if (!(await bucketExists(s3, t)))
    throw new Failure(`the bucket ${t.store.bucket} does not exist at ${t.store.endpoint}`);

  const createdAt = new Date();
  const parent = path.resolve(values.out ?? path.join(root, "backups"));
  const folder = path.join(parent, folderName(createdAt));
  mkdirSync(parent, { recursive: true });
  try {
    mkdirSync(folder);
  } catch {
    throw new Failure(`${shown(folder)} already exists: run the backup again in a second`);
  }
  try {
    tell(`database ${t.db.database} at ${t.db.host}:${t.db.port} → ${shown(path.join(folder, DUMP))}`);
    const dump = dumpDatabase(t, path.join(folder, DUMP), triggers);
    tell(`dumped ${tables.length} tables and ${triggers.length} triggers (${dump.bytes} bytes)`);
    tell(`bucket ${t.store.bucket} at ${t.store.endpoint} → ${shown(path.join(folder, "objects"))}`);
    const items = await copyObjects(s3, t, folder);
    const bytes = items.reduce((sum, i) => sum + i.size, 0);
    tell(`copied ${items.length} objects (${bytes} bytes)`);
    const manifest: Manifest = {
      format: 1,
      app: "axlewright",
      createdAt: createdAt.toISOString(),
      database: { name: t.db.database, file: DUMP, ...dump, tables, triggers, migrations },
      objects: { bucket: t.store.bucket, count: items.length, bytes, items },
    };
    writeFileSync(path.join(folder, MANIFEST), `${JSON.stringify(manifest, null, 2)}\n`);
  } catch (error) {
    // A half-written folder would look like a backup: remove it.
    rmSync(folder, { recursive: true, force: true });
    throw error;
  }
  tell(`backup written to ${shown(folder)}`);
}

runMain("backup", main);
