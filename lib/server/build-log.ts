import "server-only";
// People's build-log entries: who may write what, the form read with its size cap, each photo
// checked and cleaned (lib/photos/prepare.ts) before anything is stored. An entry with photos is
// written object-first: every photo (and its thumbnail) goes to the store, then the entry and its
// photo rows go in one transaction; if that fails the objects are removed again. So there is never a
// row without its object, and an object left without a row only if the store itself fails the
// clean-up (logged).
import { randomUUID } from "node:crypto";
import { insertLogEntry, type StoredPhoto } from "@/db/queries/build-log";
import { logEntrySchema } from "@/lib/validation/build-log";
import type { ProjectAccess } from "./dal";
import { AppError } from "./errors";
import { formBody } from "./form-body";
import { PHOTO_EXTENSION, preparePhoto, type PreparedPhoto } from "@/lib/photos/prepare";
import { deleteObject, putObject } from "./storage";
import { LOG_FORM_LIMIT, PHOTO_MAX_COUNT } from "@/lib/validation/limits";

/** The fabricator, the installer and an admin write any kind; the client adds notes (text only). */
export function mayWrite(access: ProjectAccess, kind: string, withPhotos: boolean): void {
  if (access.canManage || access.memberRole === "installer") return;
  if (access.memberRole === "client") {
    if (kind !== "note")
      throw new AppError(
        "forbidden",
        "A client may add notes to the build log; milestones and problems are the shop's and the crew's.",
      );
    if (withPhotos)
      throw new AppError(
        "forbidden",
        "Photos in the build log come from the shop and the crew; a client's note is text.",
      );
    return;
  }
  throw new AppError("forbidden", "Your part in this project does not write to its build log.");
}

export async function addLogEntry(
  access: ProjectAccess,
  request: Request,
): Promise<{ id: number; photos: { id: number }[] }> {
  const form = await formBody(request, LOG_FORM_LIMIT);
  const files = [...form.getAll("photos[]"), ...form.getAll("photos")].filter((f): f is File => typeof f !== "string");
  const kind = String(form.get("kind") ?? "");
  mayWrite(access, kind, files.length > 0);
  const parsed = logEntrySchema.safeParse({ kind, text: form.get("text") ?? "", parts: form.get("parts") ?? "" });
  if (!parsed.success) throw AppError.fromZod(parsed.error);
  if (!parsed.data.text && files.length === 0)
    throw new AppError("bad_request", "Write something, or add a photo.", { text: ["Say what happened."] });
  if (files.length > PHOTO_MAX_COUNT)
    throw new AppError("bad_request", `At most ${PHOTO_MAX_COUNT} photos in one entry.`, {
      photos: [`At most ${PHOTO_MAX_COUNT}.`],
    });
  const photos: PreparedPhoto[] = [];
  for (const file of files) photos.push(await preparePhoto(Buffer.from(await file.arrayBuffer()), file.name));
  return storeWithPhotos(photos, access.projectId, (stored) =>
    insertLogEntry(access.user, access.projectId, parsed.data, stored),
  );
}

/** Puts each photo and its thumbnail in the store, then runs `write` with their keys; on any failure the stored objects are removed. */
async function storeWithPhotos<T>(
  photos: PreparedPhoto[],
  projectId: number,
  write: (stored: StoredPhoto[]) => Promise<T>,
): Promise<T> {
  const stored: StoredPhoto[] = [];
  try {
    for (const photo of photos) {
      const stem = `projects/${projectId}/photos/${randomUUID()}`;
      const item = { photo, key: `${stem}.${PHOTO_EXTENSION[photo.contentType]}`, thumbKey: `${stem}-thumb.webp` };
      stored.push(item);
      await putObject(item.key, photo.data, photo.contentType);
      await putObject(item.thumbKey, photo.thumb, photo.thumbType);
    }
    return await write(stored);
  } catch (error) {
    await Promise.all(stored.flatMap((s) => [deleteObject(s.key), deleteObject(s.thumbKey)]));
    throw error;
  }
}
