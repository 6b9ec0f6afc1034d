import "server-only";
// A request body as the exact text that was sent (a signature covers those bytes, so nothing may
// parse or re-encode them first), read with a size cap that holds even without a Content-Length.
import { AppError } from "./errors";

export async function rawTextBody(request: Request, limit: number): Promise<string> {
  const tooLarge = () => new AppError("too_large", `The request body is over ${Math.round(limit / 1024)} KiB.`);
  if (Number(request.headers.get("content-length") ?? "0") > limit) throw tooLarge();
  if (!request.body) return "";
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let size = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    size += value.byteLength;
    if (size > limit) {
      await reader.cancel();
      throw tooLarge();
    }
    chunks.push(value);
  }
  return Buffer.concat(chunks).toString("utf8");
}
