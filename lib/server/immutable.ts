import "server-only";
import { NextResponse } from "next/server";
import { AppError } from "./errors";
import { route } from "./route";

/**
 * PUT, PATCH and DELETE on a record that never changes: the caller's access is checked first (so an
 * outsider still gets 401 or 404), then 405 with the methods that do exist (RFC 9110 §15.5.6).
 */
export function refuseChanges(check: (params: { id: string }) => Promise<unknown>, allow: string, message: string) {
  const handler = route<{ id: string }>(async (_request, params) => {
    await check(params);
    const e = new AppError("method_not_allowed", message);
    return NextResponse.json(e.toBody(), { status: e.status, headers: { allow } });
  });
  return { PUT: handler, PATCH: handler, DELETE: handler };
}
