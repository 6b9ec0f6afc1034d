import "server-only";
// A multipart/form-data body (RFC 7578), read with a size cap that holds as the bytes arrive, then
// parsed by the platform's own FormData reader.
import { AppError } from "./errors";
import { cappedBytes } from "./raw-body";

export async function formBody(request: Request, limit: number): Promise<FormData> {
  const type = request.headers.get("content-type") ?? "";
  if (!/^multipart\/form-data/i.test(type))
    throw new AppError("unsupported", "Send the entry as multipart/form-data (a form with files).");
  const bytes = await cappedBytes(request, limit);
  try {
    return await new Request("http://local/form", {
      method: "POST",
      headers: { "content-type": type },
      body: new Uint8Array(bytes),
    }).formData();
  } catch {
    throw new AppError("bad_request", "The form could not be read: it is not well-formed multipart data.");
  }
}
