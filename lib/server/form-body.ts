import "server-only";
// A multipart/form-data body (RFC 7578), read with a size cap that holds as the bytes arrive, then
// parsed by the platform's own FormData reader.
import { AppError } from "./errors";

export async function formBody(request: Request, limit: number): Promise<FormData> {
  const tooLarge = () => new AppError("too_large", `The upload is over ${Math.round(limit / 1048576)} MB in all.`);
  if (Number(request.headers.get("content-length") ?? "0") > limit) throw tooLarge();
  const type = request.headers.get("content-type") ?? "";
  if (!/^multipart\/form-data/i.test(type)) throw new AppError("unsupported", "Send the entry as multipart/form-data (a form with files).");
  const chunks: Uint8Array[] = [];
  let size = 0;
  if (request.body) {
    const reader = request.body.getReader();
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
  }
  try {
    return await new Request("http://local/form", { method: "POST", headers: { "content-type": type }, body: Buffer.concat(chunks) }).formData();
  } catch {
    throw new AppError("bad_request", "The form could not be read: it is not well-formed multipart data.");
  }
}
