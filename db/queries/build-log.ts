import "server-only";
// The build log's rows. An entry's photos are already in the object store when its rows are written
// (lib/server/build-log.ts puts them there first, and removes them again if this fails).
import { and, desc, eq, inArray, lt } from "drizzle-orm";
import { db } from "@/db";
import { buildLogEntries, buildLogPhotos, projectMembers, users, type LogKind } from "@/db/schema";
import { audit } from "./audit";
import type { CurrentUser } from "./current-user";
import type { PreparedPhoto } from "@/lib/photos/prepare";

type Executor = Pick<typeof db, "insert">;

export interface LogPhotoRow {
  id: number;
  width: number;
  height: number;
  contentType: string;
  name: string;
}

export interface LogEntryRow {
  id: number;
  kind: LogKind;
  text: string;
  parts: string[];
  cutPlanId: number | null;
  detail: Record<string, unknown> | null;
  author: string | null;
  authorRole: string | null;
  createdAt: string;
  photos: LogPhotoRow[];
}

export interface NewLogEntry {
  kind: LogKind;
  text: string;
  parts?: string[];
  cutPlanId?: number | null;
  detail?: Record<string, unknown> | null;
}

/** An entry the app writes itself, inside the transaction of the change it records. */
export async function writeLogEntry(
  tx: Executor,
  actorId: number | null,
  projectId: number,
  e: NewLogEntry,
): Promise<number> {
  const [res] = await tx.insert(buildLogEntries).values({
    projectId,
    kind: e.kind,
    text: e.text.slice(0, 4000),
    parts: e.parts ?? [],
    cutPlanId: e.cutPlanId ?? null,
    detail: e.detail ?? null,
    authorId: actorId,
  });
  return res.insertId;
}

/** A photo already in the object store, with the keys of the picture and its thumbnail. */
export interface StoredPhoto {
  photo: PreparedPhoto;
  key: string;
  thumbKey: string;
}

/** A person's entry and the rows of its stored photos, in one transaction. */
export async function insertLogEntry(
  actor: CurrentUser,
  projectId: number,
  e: NewLogEntry,
  stored: StoredPhoto[],
): Promise<{ id: number; photos: { id: number }[] }> {
  return db.transaction(async (tx) => {
    const id = await writeLogEntry(tx, actor.id, projectId, e);
    const photoIds: { id: number }[] = [];
    for (const s of stored) {
      const [res] = await tx.insert(buildLogPhotos).values({
        entryId: id,
        projectId,
        objectKey: s.key,
        thumbKey: s.thumbKey,
        contentType: s.photo.contentType,
        bytes: s.photo.data.length,
        thumbBytes: s.photo.thumb.length,
        width: s.photo.width,
        height: s.photo.height,
        originalName: s.photo.name,
        uploadedById: actor.id,
      });
      photoIds.push({ id: res.insertId });
    }
    await audit(tx, {
      actorId: actor.id,
      action: "log",
      entity: "build_log_entries",
      entityId: id,
      projectId,
      detail: { kind: e.kind, parts: e.parts ?? [], photos: photoIds.map((p) => p.id) },
    });
    return { id, photos: photoIds };
  });
}

/** The project's log, newest first, with each entry's photos; `before` pages back by entry id. */
export async function listLog(
  projectId: number,
  opts: { limit?: number; before?: number; cutPlanId?: number } = {},
): Promise<LogEntryRow[]> {
  const conditions = [eq(buildLogEntries.projectId, projectId)];
  if (opts.before) conditions.push(lt(buildLogEntries.id, opts.before));
  if (opts.cutPlanId) conditions.push(eq(buildLogEntries.cutPlanId, opts.cutPlanId));
  const rows = await db
    .select({
      id: buildLogEntries.id,
      kind: buildLogEntries.kind,
      text: buildLogEntries.text,
      parts: buildLogEntries.parts,
      cutPlanId: buildLogEntries.cutPlanId,
      detail: buildLogEntries.detail,
      author: users.name,
      userRole: users.role,
      memberRole: projectMembers.role,
      createdAt: buildLogEntries.createdAt,
    })
    .from(buildLogEntries)
    .leftJoin(users, eq(users.id, buildLogEntries.authorId))
    .leftJoin(projectMembers, and(eq(projectMembers.userId, users.id), eq(projectMembers.projectId, projectId)))
    .where(and(...conditions))
    .orderBy(desc(buildLogEntries.createdAt), desc(buildLogEntries.id))
    .limit(Math.min(500, opts.limit ?? 100));
  const ids = rows.map((r) => r.id);
  const photos = ids.length
    ? await db
        .select({
          id: buildLogPhotos.id,
          entryId: buildLogPhotos.entryId,
          width: buildLogPhotos.width,
          height: buildLogPhotos.height,
          contentType: buildLogPhotos.contentType,
          name: buildLogPhotos.originalName,
        })
        .from(buildLogPhotos)
        .where(inArray(buildLogPhotos.entryId, ids))
        .orderBy(buildLogPhotos.id)
    : [];
  return rows.map((r) => ({
    id: r.id,
    kind: r.kind,
    text: r.text,
    parts: r.parts ?? [],
    cutPlanId: r.cutPlanId,
    detail: r.detail ?? null,
    author: r.author,
    authorRole: r.memberRole ?? (r.userRole === "admin" ? "admin" : null),
    createdAt: r.createdAt.toISOString(),
    photos: photos
      .filter((p) => p.entryId === r.id)
      .map((p) => ({ id: p.id, width: p.width, height: p.height, contentType: p.contentType, name: p.name })),
  }));
}

export async function findPhoto(id: number) {
  const [row] = await db.select().from(buildLogPhotos).where(eq(buildLogPhotos.id, id)).limit(1);
  return row ?? null;
}

export interface TickState {
  item: string;
  done: boolean;
  by: string | null;
  at: string;
}

/** Each ticked item of a cut plan's assembly sheet as it stands now: the latest tick or untick wins. */
export async function installState(projectId: number, cutPlanId: number): Promise<TickState[]> {
  const entries = await listLog(projectId, { cutPlanId, limit: 500 });
  const state = new Map<string, TickState>();
  // Newest first: the first seen for an item is its current state.
  for (const e of entries) {
    const item = e.detail?.item;
    if (e.kind !== "installed" || typeof item !== "string" || state.has(item)) continue;
    state.set(item, { item, done: e.detail?.done !== false, by: e.author, at: e.createdAt });
  }
  return [...state.values()];
}

/** An installation tick (or untick) from the assembly sheet, as a log entry naming the part. */
export async function insertTick(
  actor: CurrentUser,
  projectId: number,
  cutPlanId: number,
  tick: { item: string; done: boolean; what: string },
): Promise<number> {
  return db.transaction(async (tx) => {
    const id = await writeLogEntry(tx, actor.id, projectId, {
      kind: "installed",
      text: tick.done ? `Installed ${tick.what}.` : `Unticked ${tick.what}: not installed after all.`,
      parts: tick.item.split("/"),
      cutPlanId,
      detail: { item: tick.item, done: tick.done },
    });
    await audit(tx, {
      actorId: actor.id,
      action: tick.done ? "tick" : "untick",
      entity: "build_log_entries",
      entityId: id,
      projectId,
      detail: { cutPlanId, item: tick.item },
    });
    return id;
  });
}
