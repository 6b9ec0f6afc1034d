import "server-only";
// Every JSON route handler goes through `route`: it turns any failure into the one error shape
// (status + plain message), parses bodies with a size limit, and validates them with zod.
import { NextResponse } from "next/server";
import { z } from "zod";
import { AppError, toAppError } from "./errors";
import { DEFAULT_BODY_LIMIT } from "@/lib/validation/limits";
import { rawTextBody } from "./raw-body";

type Params = Record<string, string | string[] | undefined>;
type Handler<P extends Params> = (request: Request, params: P) => Promise<Response | unknown>;

export function route<P extends Params = Params>(handler: Handler<P>) {
  return async (request: Request, context: { params: Promise<P> }): Promise<Response> => {
    try {
      const result = await handler(request, await context.params);
      if (result instanceof Response) return result;
      return NextResponse.json(result ?? null);
    } catch (error) {
      const appError = toAppError(error);
      return NextResponse.json(appError.toBody(), { status: appError.status, headers: appError.headers });
    }
  };
}

/** Reads and validates a JSON body; refuses anything over `limit` bytes (counted as it arrives) before parsing it. */
export async function jsonBody<T extends z.ZodType>(
  request: Request,
  schema: T,
  limit = DEFAULT_BODY_LIMIT,
): Promise<z.infer<T>> {
  const text = await rawTextBody(request, limit);
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch {
    throw new AppError("bad_request", "The request body is not valid JSON.");
  }
  const parsed = schema.safeParse(data);
  if (!parsed.success) throw AppError.fromZod(parsed.error);
  return parsed.data;
}

/** A positive integer id from a path segment; anything else is a 404 (no such record). */
export function idParam(value: string | string[] | undefined, what = "record"): number {
  const id = typeof value === "string" && /^\d{1,10}$/.test(value) ? Number(value) : NaN;
  if (!Number.isSafeInteger(id) || id <= 0) throw new AppError("not_found", `No such ${what}.`);
  return id;
}

export function created(body: unknown): Response {
  return NextResponse.json(body, { status: 201 });
}
