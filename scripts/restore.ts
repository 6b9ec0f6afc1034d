// Command line: `npm run restore -- FOLDER [--database NAME] [--bucket NAME]` brings a backup made by
// `npm run backup` (scripts/backup.ts) back into an empty stack: it loads FOLDER/database.sql with
// Debian's mariadb client and puts every object of FOLDER/objects back in the bucket.
// Before anything is changed it checks the whole folder against its manifest.json (the dump's and
// every object's size and SHA-256) and that the target is empty: a database with no tables, or only
// empty ones (a migrated, unseeded schema, which is replaced), and an empty bucket. A missing database
// or bucket is created. Afterwards every object is read back and checked again. Any mismatch or
// refusal is one line and exit 1. The target is the app's (scripts/lib/backup-common.ts) unless
// --database / --bucket name another.
import { closeSync, existsSync, openSync, readFileSync, statSync } from "node:fs";
import path from "node:path";
import { parseArgs } from "node:util";
import {
  CreateBucketCommand,
  GetObjectCommand,
  ListObjectsV2Command,
  PutObjectCommand,
  type S3Client,
} from "@aws-sdk/client-s3";
import type mysql from "mysql2/promise";
import {
  bucketExists,
  clientProgram,
  connect,
  DUMP,
  Failure,
  MANIFEST,
  manifestSchema,
  objectFile,
  objectStore,
  reason,
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
  "usage: npm run restore -- FOLDER [--database NAME] [--bucket NAME]\n" +
  "  FOLDER is one made by npm run backup (database.sql, objects/, manifest.json); the target database and bucket\n" +
  "  are the app's (DATABASE_URL and S3_*, else the demo stack's .env.local) unless named; both must be empty\n";

const tell = (message: string) => say("restore", message);

/** drizzle's own table: a migrated schema carries its rows and is still empty of data. */
const MIGRATIONS_TABLE = "__drizzle_migrations";

function readManifest(folder: string): Manifest {
  const file = path.join(folder, MANIFEST);
  if (!existsSync(folder) || !statSync(folder).isDirectory()) throw new Failure(`there is no folder ${folder}`);
  if (!existsSync(file)) throw new Failure(`${shown(folder)} is not a backup: it has no ${MANIFEST}`);
  let raw: unknown;
  try {
    raw = JSON.parse(readFileSync(file, "utf8"));
  } catch (error) {
    throw new Failure(`${shown(file)} is not JSON (${reason(error)})`);
  }
  const parsed = manifestSchema.safeParse(raw);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    throw new Failure(`${shown(file)} is not a backup manifest (${issue.path.join(".") || "top"}: ${issue.message})`);
  }
  return parsed.data;
}

function checkedBytes(file: string, size: number, hash: string, what: string): Buffer {
  if (!existsSync(file)) throw new Failure(`${what} is missing from the backup; nothing was restored`);
  const data = readFileSync(file);
  if (data.length !== size || sha256(data) !== hash)
    throw new Failure(
      `${what} does not match the manifest (size or SHA-256): the backup is damaged; nothing was restored`,
    );
  return data;
}

/** The whole folder against its manifest, before the target is touched. */
function checkFolder(folder: string, manifest: Manifest): void {
  checkedBytes(path.join(folder, DUMP), manifest.database.bytes, manifest.database.sha256, DUMP);
  for (const item of manifest.objects.items)
    checkedBytes(objectFile(folder, item.key), item.size, item.sha256, `objects/${item.key}`);
}

/** Whether the database exists, and its tables (an empty schema is only tables without rows). */
async function databaseState(
  conn: mysql.Connection,
  t: Target,
): Promise<{ exists: boolean; tables: string[]; withRows: string[] }> {
  const [schemas] = await conn.query<mysql.RowDataPacket[]>(
    "SELECT SCHEMA_NAME FROM information_schema.SCHEMATA WHERE SCHEMA_NAME = ?",
    [t.db.database],
  );
  if (schemas.length === 0) return { exists: false, tables: [], withRows: [] };
  const tables = await tableNames(conn, t.db.database);
  const withRows: string[] = [];
  for (const table of tables) {
    if (table === MIGRATIONS_TABLE) continue;
    const [rows] = await conn.query<mysql.RowDataPacket[]>(
      `SELECT 1 FROM \`${t.db.database}\`.\`${table.replace(/`/g, "``")}\` LIMIT 1`,
    );
    if (rows.length) withRows.push(table);
  }
  return { exists: true, tables, withRows };
}

async function bucketIsEmpty(s3: S3Client, t: Target): Promise<boolean> {
  try {
    const page = await s3.send(new ListObjectsV2Command({ Bucket: t.store.bucket, MaxKeys: 1 }));
    return (page.KeyCount ?? page.Contents?.length ?? 0) === 0;
  } catch (error) {
    throw new Failure(`cannot list the bucket ${t.store.bucket} at ${t.store.endpoint} (${reason(error)})`);
  }
}

async function putObjects(s3: S3Client, t: Target, folder: string, manifest: Manifest): Promise<void> {
  let done = 0;
  for (const item of manifest.objects.items) {
    const body = checkedBytes(objectFile(folder, item.key), item.size, item.sha256, `objects/${item.key}`);
    let back: Uint8Array;
    try {
      await s3.send(
        new PutObjectCommand({
          Bucket: t.store.bucket,
          Key: item.key,
          Body: body,
          ContentLength: body.length,
          ContentType: item.contentType,
        }),
      );
      const out = await s3.send(new GetObjectCommand({ Bucket: t.store.bucket, Key: item.key }));
      back = await out.Body!.transformToByteArray();
    } catch (error) {
      throw new Failure(`cannot store the object ${item.key} at ${t.store.endpoint} (${reason(error)})`);
    }
    if (back.length !== item.size || sha256(back) !== item.sha256)
      throw new Failure(`the object ${item.key} read back from the store does not match the manifest's SHA-256`);
    if (++done % 100 === 0) tell(`${done} objects put back…`);
  }
}

async function main() {
  let parsed;
  try {
    parsed = parseArgs({
      options: {
        database: { type: "string" },
        bucket: { type: "string" },
        help: { type: "boolean", short: "h" },
      },
      allowPositionals: true,
    });
  } catch (error) {
    throw new Failure(`${reason(error)}; ${USAGE.split("\n")[0]}`);
  }
  const { values, positionals } = parsed;
  if (values.help) {
    process.stdout.write(USAGE);
    return;
  }
  if (positionals.length !== 1) throw new Failure(`name one backup folder; ${USAGE.split("\n")[0]}`);
  const folder = path.resolve(positionals[0]);
  const manifest = readManifest(folder);
  const t = targetSettings({ database: values.database, bucket: values.bucket });
  const mariadb = clientProgram("mariadb");
  checkFolder(folder, manifest);
  tell(
    `${shown(folder)}: database ${manifest.database.name} (${manifest.database.tables.length} tables, ` +
      `migration ${manifest.database.migrations.appliedLastTag ?? "unknown"}), ${manifest.objects.count} objects, ` +
      `made ${manifest.createdAt}; checked against its manifest`,
  );

  // The target must be empty, both halves, before either is changed.
  const conn = await connect(t);
  try {
    const db = await databaseState(conn, t);
    if (db.withRows.length)
      throw new Failure(
        `the database ${t.db.database} at ${t.db.host}:${t.db.port} is not empty (${db.withRows.slice(0, 5).join(", ")}` +
          `${db.withRows.length > 5 ? ", …" : ""} hold rows): restore only goes into an empty stack; nothing was changed`,
      );
    const s3 = objectStore(t);
    const hasBucket = await bucketExists(s3, t);
    if (hasBucket && !(await bucketIsEmpty(s3, t)))
      throw new Failure(
        `the bucket ${t.store.bucket} at ${t.store.endpoint} is not empty: restore only goes into an empty stack; nothing was changed`,
      );

    if (!db.exists) {
      try {
        await conn.query(`CREATE DATABASE \`${t.db.database}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`);
      } catch (error) {
        throw new Failure(`the database ${t.db.database} does not exist and cannot be made (${reason(error)})`);
      }
      tell(`made the database ${t.db.database}`);
    } else if (db.tables.length) {
      // An empty schema: its tables hold no rows, and the dump brings its own.
      await conn.query("SET FOREIGN_KEY_CHECKS = 0");
      for (const table of db.tables)
        await conn.query(`DROP TABLE \`${t.db.database}\`.\`${table.replace(/`/g, "``")}\``);
      await conn.query("SET FOREIGN_KEY_CHECKS = 1");
      tell(`replaced the ${db.tables.length} empty tables of ${t.db.database}`);
    }
    if (!hasBucket) {
      try {
        await s3.send(new CreateBucketCommand({ Bucket: t.store.bucket }));
      } catch (error) {
        throw new Failure(`the bucket ${t.store.bucket} does not exist and cannot be made (${reason(error)})`);
      }
      tell(`made the bucket ${t.store.bucket}`);
    }

    tell(`loading ${DUMP} into ${t.db.database} at ${t.db.host}:${t.db.port}…`);
    const fd = openSync(path.join(folder, DUMP), "r");
    try {
      runClient(mariadb, t, [`--database=${t.db.database}`], fd);
    } catch (error) {
      throw new Failure(`${(error as Error).message} (the database ${t.db.database} is partly restored)`);
    } finally {
      closeSync(fd);
    }
    const tables = await tableNames(conn, t.db.database);
    const triggers = await triggerNames(conn, t.db.database);
    const lacking = [
      ...manifest.database.tables.filter((n) => !tables.includes(n)),
      ...manifest.database.triggers.filter((n) => !triggers.includes(n)),
    ];
    if (lacking.length) throw new Failure(`after loading, ${t.db.database} lacks ${lacking.join(", ")}`);
    tell(`loaded ${tables.length} tables and ${triggers.length} triggers`);

    tell(`putting ${manifest.objects.count} objects into ${t.store.bucket} at ${t.store.endpoint}…`);
    await putObjects(s3, t, folder, manifest);
    tell(`put back ${manifest.objects.count} objects (${manifest.objects.bytes} bytes), each read back and checked`);
  } finally {
    await conn.end();
  }
  tell(`restored ${shown(folder)} into ${t.db.database} and ${t.store.bucket}`);
}

runMain("restore", main);
