import "server-only";
// Object storage through @aws-sdk/client-s3: the local fake (scripts/fakes/object-store.mjs) in
// development and tests, a hosted S3-compatible store in production (same variables). The bucket is
// private: objects are only ever served through routes that check who is asking.
import { DeleteObjectCommand, GetObjectCommand, PutObjectCommand, type S3Client } from "@aws-sdk/client-s3";
import { objectStoreClient } from "@/lib/storage/object-store-client";
import { AppError } from "./errors";

let client: S3Client | undefined;

function s3(): S3Client {
  client ??= objectStoreClient();
  return client;
}

const bucket = () => process.env.S3_BUCKET ?? "axlewright";

const unavailable = () =>
  new AppError("unavailable", "The photo store did not answer; nothing was saved. Try again in a moment.");

export async function putObject(key: string, body: Buffer, contentType: string): Promise<void> {
  try {
    await s3().send(
      new PutObjectCommand({
        Bucket: bucket(),
        Key: key,
        Body: body,
        ContentType: contentType,
        ContentLength: body.length,
      }),
    );
  } catch (error) {
    console.error("[axlewright] object not stored:", error instanceof Error ? error.message : error);
    throw unavailable();
  }
}

export async function getObject(key: string): Promise<{ body: Buffer; contentType: string }> {
  try {
    const out = await s3().send(new GetObjectCommand({ Bucket: bucket(), Key: key }));
    return {
      body: Buffer.from(await out.Body!.transformToByteArray()),
      contentType: out.ContentType ?? "application/octet-stream",
    };
  } catch (error) {
    if ((error as { name?: string }).name === "NoSuchKey")
      throw new AppError("not_found", "That photo is no longer in the store.");
    console.error("[axlewright] object not read:", error instanceof Error ? error.message : error);
    throw unavailable();
  }
}

/** Removes an object; a failure is logged and not raised (it is only ever a clean-up). */
export async function deleteObject(key: string): Promise<boolean> {
  try {
    await s3().send(new DeleteObjectCommand({ Bucket: bucket(), Key: key }));
    return true;
  } catch (error) {
    console.error("[axlewright] object not removed:", key, error instanceof Error ? error.message : error);
    return false;
  }
}
