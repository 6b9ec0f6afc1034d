// A multipart upload with progress (a phone on site may be slow): fetch cannot report upload
// progress, so this one call uses XMLHttpRequest, and fails the same way as requestJson.
import { ApiError, failureFrom } from "./request-json";

export function uploadForm<T>(url: string, data: FormData, onProgress: (fraction: number) => void): Promise<T> {
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open("POST", url);
    xhr.upload.onprogress = (ev) => ev.lengthComputable && onProgress(ev.loaded / ev.total);
    xhr.onerror = () =>
      reject(new ApiError(0, "The upload did not get through. Check the connection and try again; nothing was saved."));
    xhr.onload = () => {
      let body: unknown = null;
      try {
        body = JSON.parse(xhr.responseText);
      } catch {
        body = null;
      }
      if (xhr.status >= 200 && xhr.status < 300) resolve(body as T);
      else
        reject(failureFrom(xhr.status, body ?? { message: `The server answered ${xhr.status}; nothing was saved.` }));
    };
    xhr.send(data);
  });
}
