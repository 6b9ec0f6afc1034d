// The one way the browser calls the app's JSON routes. Every route answers a failure as
// { status, message, fields? } (lib/server/route.ts); here any failure — that answer, a body that is
// not JSON, or no answer at all — becomes an ApiError with the same three parts, which
// react-query hands to the component as its `error`.

/** A failed call: the HTTP status (0: the server was not reached), a plain message, and field messages. */
export interface ApiFailure {
  status: number;
  message: string;
  fields?: Record<string, string[]>;
}

export class ApiError extends Error implements ApiFailure {
  constructor(
    readonly status: number,
    message: string,
    readonly fields?: Record<string, string[]>,
  ) {
    super(message);
  }
}

export const NOT_REACHED = "The server could not be reached. Check the connection; nothing was sent.";

/** The body of a failed answer as an ApiError (its own message, else the status in words). */
export function failureFrom(status: number, body: unknown): ApiError {
  const b = (body ?? {}) as { message?: unknown; fields?: Record<string, string[]> };
  return new ApiError(
    status,
    typeof b.message === "string" && b.message ? b.message : `The server answered ${status}.`,
    b.fields,
  );
}

export async function requestJson<T>(url: string, init: { method?: string; body?: unknown } = {}): Promise<T> {
  let res: Response;
  try {
    res = await fetch(url, {
      method: init.method ?? (init.body === undefined ? "GET" : "POST"),
      headers: { "content-type": "application/json" },
      body: init.body === undefined ? undefined : JSON.stringify(init.body),
    });
  } catch {
    throw new ApiError(0, NOT_REACHED);
  }
  const data = await res.json().catch(() => null);
  if (!res.ok) throw failureFrom(res.status, data);
  return data as T;
}

export const postJson = <T>(url: string, body: unknown) => requestJson<T>(url, { method: "POST", body });

/** What a component shows for a mutation's or query's error (null: none). */
export function failureOf(error: unknown): ApiFailure | null {
  if (!error) return null;
  if (error instanceof ApiError) return { status: error.status, message: error.message, fields: error.fields };
  return {
    status: 0,
    message: error instanceof Error && error.message ? error.message : "Something went wrong; nothing was saved.",
  };
}
