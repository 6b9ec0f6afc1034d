import "server-only";
// A request body as the exact bytes that were sent (a signature covers them, so nothing may parse or
// re-encode them first), read with a size cap that holds as they arrive, even without a Content-Length.
import { AppError } from "./errors";

const tooLargeFor = (limit: number) =>
  new AppError(
    "too_large",
    limit >= 1048576
      ? `The upload is over ${Math.round(limit / 1048576)} MB in all.`
      : `The request body is over ${Math.round(limit / 1024)} KiB.`,
  );

export async function cappedBytes(request: Request, limit: number): Promise<Buffer> {
  if (Number(request.headers.get("content-length") ?? "0") > limit) throw tooLargeFor(limit);
  if (!request.body) return Buffer.alloc(0);
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let size = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    size += value.byteLength;
    if (size > limit) {
      await reader.cancel();
      throw tooLargeFor(limit);
    }
    chunks.push(value);
  }
  return Buffer.concat(chunks);
}

export async function rawTextBody(request: Request, limit: number): Promise<string> {
  return (await cappedBytes(request, limit)).toString("utf8");
}
