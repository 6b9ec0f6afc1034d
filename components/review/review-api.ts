// The review page's and the project page's calls to the review routes. Every failure arrives as
// { status, message, fields? }; the forms show the message and put field messages by their fields.
export interface ApiFailure {
  status: number;
  message: string;
  fields?: Record<string, string[]>;
}

export type ApiAnswer<T> = { ok: true; body: T } | ({ ok: false } & ApiFailure);

export async function postJson<T>(url: string, body: unknown): Promise<ApiAnswer<T>> {
  let res: Response;
  try {
    res = await fetch(url, { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(body) });
  } catch {
    return { ok: false, status: 0, message: "The server could not be reached. Check the connection; nothing was sent." };
  }
  const data = await res.json().catch(() => null);
  if (res.ok) return { ok: true, body: data as T };
  return { ok: false, status: res.status, message: data?.message ?? `The server answered ${res.status}.`, fields: data?.fields };
}
