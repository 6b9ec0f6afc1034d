// `npm run backup` and `npm run restore` (scripts/backup.ts, scripts/restore.ts) round-trip the
// seeded demo data of the test stack: the backup of the test database and bucket is restored into a
// second, empty database and bucket on the same servers, and every table (row count, CHECKSUM TABLE,
// definition), every trigger (and that it still refuses) and every object (bytes, type) is compared
// with the original. Restore refuses a target that is not empty, a damaged backup and a missing
// folder, changing nothing; backup is one line and exit 1 when the database or the store is away.
// The test stack's user may make databases named <test database>_scratch_* (scripts/test.mjs).
import { spawnSync } from "node:child_process";
import { createHash } from "node:crypto";
import { cpSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import net from "node:net";
import { tmpdir } from "node:os";
import { join, resolve } from "node:path";
import {
  CreateBucketCommand,
  DeleteBucketCommand,
  DeleteObjectCommand,
  GetObjectCommand,
  HeadBucketCommand,
  ListObjectsV2Command,
  PutObjectCommand,
} from "@aws-sdk/client-s3";
import { objectStoreClient } from "@/lib/storage/object-store-client";
import type { RowDataPacket } from "mysql2/promise";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { pool } from "@/db";

const tag = `${Date.now().toString(36)}${Math.floor(Math.random() * 1e6).toString(36)}`;
const SOURCE_DB = new URL(process.env.DATABASE_URL!).pathname.slice(1);
const SOURCE_BUCKET = process.env.S3_BUCKET ?? "axlewright";
const scratchDb = (name: string) => `${SOURCE_DB}_scratch_${tag}_${name}`;
const scratchBucket = (name: string) => `axlewright-${tag}-${name}`;
const TARGET_DB = scratchDb("restored");
const TARGET_BUCKET = scratchBucket("restored");
// The four triggers of drizzle/0001_designs_revisions.sql and drizzle/0003_reviews_sign_offs.sql.
const TRIGGERS = ["revisions_no_delete", "revisions_no_update", "sign_offs_no_delete", "sign_offs_no_update"];

const s3 = objectStoreClient();

const temps: string[] = [];
const temp = () => {
  const dir = mkdtempSync(join(tmpdir(), "axlewright-backup-"));
  temps.push(dir);
  return dir;
};
const madeDbs = new Set<string>();
const madeBuckets = new Set<string>();

function script(name: "backup" | "restore", args: string[], env: Record<string, string> = {}) {
  const out = spawnSync(resolve("node_modules/.bin/tsx"), [`scripts/${name}.ts`, ...args], {
    encoding: "utf8",
    env: { ...process.env, ...env },
  });
  return { status: out.status, stdout: out.stdout, stderr: out.stderr };
}

/** The failure is one line on stderr. */
const oneLine = (stderr: string) => {
  const lines = stderr.trim().split("\n");
  expect(lines).toHaveLength(1);
  return lines[0];
};

const rows = async (sql: string, params: unknown[] = []) => (await pool.query<RowDataPacket[]>(sql, params))[0];
const q = (db: string, table: string) => `\`${db}\`.\`${table}\``;

async function tables(db: string): Promise<string[]> {
  return (
    await rows(
      "SELECT TABLE_NAME AS name FROM information_schema.TABLES WHERE TABLE_SCHEMA = ? AND TABLE_TYPE = 'BASE TABLE' ORDER BY TABLE_NAME",
      [db],
    )
  ).map((r) => String(r.name));
}

async function databaseExists(db: string): Promise<boolean> {
  return (await rows("SELECT 1 FROM information_schema.SCHEMATA WHERE SCHEMA_NAME = ?", [db])).length === 1;
}

async function bucketExists(bucket: string): Promise<boolean> {
  try {
    await s3.send(new HeadBucketCommand({ Bucket: bucket }));
    return true;
  } catch {
    return false;
  }
}

async function keys(bucket: string): Promise<{ key: string; size: number }[]> {
  const all: { key: string; size: number }[] = [];
  let token: string | undefined;
  do {
    const page = await s3.send(new ListObjectsV2Command({ Bucket: bucket, ContinuationToken: token }));
    for (const o of page.Contents ?? []) all.push({ key: o.Key!, size: o.Size ?? -1 });
    token = page.IsTruncated ? page.NextContinuationToken : undefined;
  } while (token);
  return all.sort((a, b) => a.key.localeCompare(b.key));
}

async function object(bucket: string, key: string) {
  const out = await s3.send(new GetObjectCommand({ Bucket: bucket, Key: key }));
  return { body: Buffer.from(await out.Body!.transformToByteArray()), type: out.ContentType };
}

/** Every table of `copy` against `original`: the same tables, definitions, row counts and checksums. */
async function expectSameDatabase(original: string, copy: string) {
  const names = await tables(original);
  expect(names.length).toBeGreaterThan(10);
  expect(await tables(copy)).toEqual(names);
  for (const table of names) {
    const [a] = await rows(`SELECT COUNT(*) AS n FROM ${q(original, table)}`);
    const [b] = await rows(`SELECT COUNT(*) AS n FROM ${q(copy, table)}`);
    expect(Number(b.n), table).toBe(Number(a.n));
    const sums = await rows(`CHECKSUM TABLE ${q(original, table)}, ${q(copy, table)}`);
    expect(sums).toHaveLength(2);
    expect(sums[0].Checksum, table).not.toBeNull();
    expect(String(sums[1].Checksum), table).toBe(String(sums[0].Checksum));
    const [defA] = await rows(`SHOW CREATE TABLE ${q(original, table)}`);
    const [defB] = await rows(`SHOW CREATE TABLE ${q(copy, table)}`);
    expect(defB["Create Table"], table).toBe(defA["Create Table"]);
  }
}

async function triggers(db: string) {
  return rows(
    `SELECT TRIGGER_NAME AS name, EVENT_OBJECT_TABLE AS tbl, ACTION_TIMING AS timing,
            EVENT_MANIPULATION AS event, ACTION_STATEMENT AS statement
       FROM information_schema.TRIGGERS WHERE TRIGGER_SCHEMA = ? ORDER BY TRIGGER_NAME`,
    [db],
  );
}

function freePort(): Promise<number> {
  return new Promise((r) => {
    const s = net.createServer().listen(0, "127.0.0.1", () => {
      const p = (s.address() as net.AddressInfo).port;
      s.close(() => r(p));
    });
  });
}

const sha = (data: Buffer) => createHash("sha256").update(data).digest("hex");

let folder = "";
let backupOut = { status: null as number | null, stdout: "", stderr: "" };
let restoreOut = { status: null as number | null, stdout: "", stderr: "" };

beforeAll(async () => {
  const out = temp();
  backupOut = script("backup", ["--out", out]);
  expect(backupOut.stderr).toBe("");
  expect(backupOut.status).toBe(0);
  const made = readdirSync(out);
  expect(made).toHaveLength(1);
  folder = join(out, made[0]);
  // A second, empty database and bucket on the same servers.
  await pool.query(`CREATE DATABASE \`${TARGET_DB}\``);
  madeDbs.add(TARGET_DB);
  await s3.send(new CreateBucketCommand({ Bucket: TARGET_BUCKET }));
  madeBuckets.add(TARGET_BUCKET);
  restoreOut = script("restore", [folder, "--database", TARGET_DB, "--bucket", TARGET_BUCKET]);
  expect(restoreOut.stderr).toBe("");
  expect(restoreOut.status).toBe(0);
});

afterAll(async () => {
  for (const db of madeDbs) await pool.query(`DROP DATABASE IF EXISTS \`${db}\``);
  for (const bucket of madeBuckets) {
    if (!(await bucketExists(bucket))) continue;
    for (const { key } of await keys(bucket)) await s3.send(new DeleteObjectCommand({ Bucket: bucket, Key: key }));
    await s3.send(new DeleteBucketCommand({ Bucket: bucket }));
  }
  for (const dir of temps) rmSync(dir, { recursive: true, force: true });
  await pool.end();
});

describe("npm run backup", () => {
  it("writes a dated folder with the dump, the objects and a manifest that matches them", async () => {
    expect(folder).toMatch(/[/\\]\d{4}-\d{2}-\d{2}T\d{6}Z$/);
    expect(backupOut.stdout).toContain(`backup written to ${folder}`);
    const manifest = JSON.parse(readFileSync(join(folder, "manifest.json"), "utf8"));
    expect(manifest.database.name).toBe(SOURCE_DB);
    expect(manifest.database.triggers).toEqual(TRIGGERS);
    expect(manifest.database.tables).toEqual(await tables(SOURCE_DB));
    const journal = JSON.parse(readFileSync("drizzle/meta/_journal.json", "utf8")).entries;
    expect(manifest.database.migrations.journalLast.tag).toBe(journal.at(-1).tag);
    expect(manifest.database.migrations.applied).toBe(journal.length);
    expect(manifest.database.migrations.appliedLastTag).toBe(journal.at(-1).tag);
    expect(Date.parse(manifest.createdAt)).not.toBeNaN();

    const dump = readFileSync(join(folder, "database.sql"));
    expect(manifest.database.sha256).toBe(sha(dump));
    const text = dump.toString("utf8");
    for (const name of TRIGGERS) expect(text).toContain(`TRIGGER \`${name}\``);
    // Loadable into a database of another name: no CREATE DATABASE, no USE.
    expect(text).not.toMatch(/^CREATE DATABASE|^USE /m);

    // The seed's site photos are there, each copied with its bytes (read from the store here).
    const stored = await keys(SOURCE_BUCKET);
    expect(stored.length).toBeGreaterThan(0);
    expect(manifest.objects.count).toBe(stored.length);
    expect(manifest.objects.items.map((i: { key: string }) => i.key).sort()).toEqual(stored.map((o) => o.key));
    for (const item of manifest.objects.items) {
      const original = await object(SOURCE_BUCKET, item.key);
      const copy = readFileSync(join(folder, "objects", item.key));
      expect(copy.equals(original.body), item.key).toBe(true);
      expect(item.size).toBe(original.body.length);
      expect(item.sha256).toBe(sha(original.body));
      expect(item.contentType).toBe(original.type);
    }
  });

  it("copies a bucket longer than one page of ListObjectsV2", async () => {
    const bucket = scratchBucket("paged");
    await s3.send(new CreateBucketCommand({ Bucket: bucket }));
    madeBuckets.add(bucket);
    // One more than a page: S3 and s3rver list at most 1000 keys per request.
    const written = Array.from({ length: 1001 }, (_, i) => `paged/${String(i).padStart(4, "0")}.txt`);
    for (let i = 0; i < written.length; i += 50)
      await Promise.all(
        written
          .slice(i, i + 50)
          .map((key) => s3.send(new PutObjectCommand({ Bucket: bucket, Key: key, Body: `object ${key}` }))),
      );
    const out = temp();
    const run = script("backup", ["--out", out, "--bucket", bucket]);
    expect(run.stderr).toBe("");
    expect(run.status).toBe(0);
    expect(run.stdout).toContain("1000 objects copied…");
    const manifest = JSON.parse(readFileSync(join(out, readdirSync(out)[0], "manifest.json"), "utf8"));
    expect(manifest.objects.bucket).toBe(bucket);
    expect(manifest.objects.items.map((i: { key: string }) => i.key).sort()).toEqual(written);
    const last = written.at(-1)!;
    expect(readFileSync(join(out, readdirSync(out)[0], "objects", last), "utf8")).toBe(`object ${last}`);
  });

  it("stops with one line, exit 1 and nothing written when the database or the store is away", async () => {
    const out = temp();
    const closed = await freePort();
    const url = new URL(process.env.DATABASE_URL!);
    url.port = String(closed);
    const noDb = script("backup", ["--out", out], { DATABASE_URL: url.toString() });
    expect(noDb.status).toBe(1);
    expect(oneLine(noDb.stderr)).toMatch(/cannot reach the database at 127\.0\.0\.1:\d+/);
    const noStore = script("backup", ["--out", out], { S3_ENDPOINT: `http://127.0.0.1:${closed}` });
    expect(noStore.status).toBe(1);
    expect(oneLine(noStore.stderr)).toMatch(/cannot reach the object store at http:\/\/127\.0\.0\.1:\d+/);
    expect(readdirSync(out)).toEqual([]);
  });
});

describe("npm run restore into an empty database and bucket", () => {
  it("brings back every table with the same rows", async () => {
    expect(restoreOut.stdout).toContain(`restored ${folder} into ${TARGET_DB} and ${TARGET_BUCKET}`);
    // The demo seed is there to compare: people, revisions, a sign-off, site photos.
    for (const table of ["users", "projects", "revisions", "sign_offs", "build_log_photos"]) {
      const [r] = await rows(`SELECT COUNT(*) AS n FROM ${q(SOURCE_DB, table)}`);
      expect(Number(r.n), table).toBeGreaterThan(0);
    }
    await expectSameDatabase(SOURCE_DB, TARGET_DB);
  });

  it("brings back the triggers, and they still refuse changes to revisions and sign-offs", async () => {
    const original = await triggers(SOURCE_DB);
    expect(original.map((t) => t.name)).toEqual(TRIGGERS);
    expect(await triggers(TARGET_DB)).toEqual(original);
    await expect(pool.query(`UPDATE ${q(TARGET_DB, "revisions")} SET id = id`)).rejects.toThrow(/immutable/);
    await expect(pool.query(`DELETE FROM ${q(TARGET_DB, "revisions")}`)).rejects.toThrow(/immutable/);
    await expect(pool.query(`UPDATE ${q(TARGET_DB, "sign_offs")} SET id = id`)).rejects.toThrow(/permanent/);
    await expect(pool.query(`DELETE FROM ${q(TARGET_DB, "sign_offs")}`)).rejects.toThrow(/permanent/);
  });

  it("brings back every object byte for byte, with its type", async () => {
    const original = await keys(SOURCE_BUCKET);
    expect(original.length).toBeGreaterThan(0);
    expect(await keys(TARGET_BUCKET)).toEqual(original);
    for (const { key } of original) {
      const a = await object(SOURCE_BUCKET, key);
      const b = await object(TARGET_BUCKET, key);
      expect(b.body.equals(a.body), key).toBe(true);
      expect(b.type, key).toBe(a.type);
    }
  });

  it("replaces an empty schema (migrated, no rows) and makes a missing bucket", async () => {
    const db = scratchDb("migrated");
    const bucket = scratchBucket("made");
    await pool.query(`CREATE DATABASE \`${db}\``);
    madeDbs.add(db);
    madeBuckets.add(bucket);
    const url = new URL(process.env.DATABASE_URL!);
    url.pathname = `/${db}`;
    const migrate = spawnSync(resolve("node_modules/.bin/tsx"), ["scripts/db/migrate.ts"], {
      encoding: "utf8",
      env: { ...process.env, DATABASE_URL: url.toString() },
    });
    expect(migrate.status, migrate.stderr).toBe(0);
    expect(await tables(db)).toEqual(await tables(SOURCE_DB));
    expect(await bucketExists(bucket)).toBe(false);

    const out = script("restore", [folder, "--database", db, "--bucket", bucket]);
    expect(out.stderr).toBe("");
    expect(out.status).toBe(0);
    expect(out.stdout).toMatch(/replaced the \d+ empty tables/);
    await expectSameDatabase(SOURCE_DB, db);
    expect(await keys(bucket)).toEqual(await keys(SOURCE_BUCKET));
  });
});

describe("npm run restore refuses, changing nothing", () => {
  it("a database that holds rows", async () => {
    const bucket = scratchBucket("unused-a");
    madeBuckets.add(bucket);
    const [before] = await rows(`SELECT COUNT(*) AS n FROM ${q(TARGET_DB, "users")}`);
    const out = script("restore", [folder, "--database", TARGET_DB, "--bucket", bucket]);
    expect(out.status).toBe(1);
    expect(oneLine(out.stderr)).toMatch(
      new RegExp(`the database ${TARGET_DB} at .* is not empty .*restore only goes into an empty stack`),
    );
    expect(await bucketExists(bucket)).toBe(false);
    const [after] = await rows(`SELECT COUNT(*) AS n FROM ${q(TARGET_DB, "users")}`);
    expect(after.n).toBe(before.n);
  });

  it("a bucket that holds objects", async () => {
    const db = scratchDb("unused_b");
    madeDbs.add(db);
    const out = script("restore", [folder, "--database", db, "--bucket", TARGET_BUCKET]);
    expect(out.status).toBe(1);
    expect(oneLine(out.stderr)).toMatch(
      new RegExp(`the bucket ${TARGET_BUCKET} at .* is not empty: restore only goes into an empty stack`),
    );
    expect(await databaseExists(db)).toBe(false);
  });

  it("a backup whose object differs from its manifest", async () => {
    const damaged = join(temp(), "damaged");
    cpSync(folder, damaged, { recursive: true });
    const manifest = JSON.parse(readFileSync(join(damaged, "manifest.json"), "utf8"));
    const victim = manifest.objects.items[0].key as string;
    const file = join(damaged, "objects", victim);
    const bytes = readFileSync(file);
    bytes[bytes.length >> 1] ^= 0xff;
    writeFileSync(file, bytes);
    const db = scratchDb("unused_c");
    const bucket = scratchBucket("unused-c");
    madeDbs.add(db);
    madeBuckets.add(bucket);
    const out = script("restore", [damaged, "--database", db, "--bucket", bucket]);
    expect(out.status).toBe(1);
    expect(oneLine(out.stderr)).toContain(`objects/${victim} does not match the manifest`);
    expect(await databaseExists(db)).toBe(false);
    expect(await bucketExists(bucket)).toBe(false);
  });

  it("a missing folder, a folder that is no backup, and no folder at all", () => {
    const missing = join(temp(), "no-such-backup");
    const gone = script("restore", [missing]);
    expect(gone.status).toBe(1);
    expect(oneLine(gone.stderr)).toBe(`[axlewright] restore: there is no folder ${missing}`);
    const empty = temp();
    const notBackup = script("restore", [empty]);
    expect(notBackup.status).toBe(1);
    expect(oneLine(notBackup.stderr)).toContain("is not a backup: it has no manifest.json");
    const none = script("restore", []);
    expect(none.status).toBe(1);
    expect(none.stderr).toContain("usage: npm run restore -- FOLDER [--database NAME] [--bucket NAME]");
  });
});
