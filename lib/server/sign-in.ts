import "server-only";
// Password check with a rate limit per account and per address. Attempts are kept in the database
// so the limit holds across several app instances. Passwords never reach a log.
import { and, count, eq, gt } from "drizzle-orm";
import { db } from "@/db";
import { signInAttempts, users } from "@/db/schema";
import { verifyPassword } from "./passwords";

export const SIGN_IN_WINDOW_MINUTES = 15;
export const MAX_FAILURES_PER_ACCOUNT = 5;
export const MAX_FAILURES_PER_ADDRESS = 20;

async function recentFailures(column: typeof signInAttempts.email | typeof signInAttempts.address, value: string): Promise<number> {
  const since = new Date(Date.now() - SIGN_IN_WINDOW_MINUTES * 60_000);
  const [row] = await db
    .select({ n: count() })
    .from(signInAttempts)
    .where(and(eq(column, value), eq(signInAttempts.succeeded, false), gt(signInAttempts.createdAt, since)));
  return row?.n ?? 0;
}

export async function checkCredentials(
  email: string,
  password: string,
  address: string,
): Promise<{ id: number; email: string; name: string } | null | "rate_limited"> {
  if (
    (await recentFailures(signInAttempts.email, email)) >= MAX_FAILURES_PER_ACCOUNT ||
    (address !== "unknown" && (await recentFailures(signInAttempts.address, address)) >= MAX_FAILURES_PER_ADDRESS)
  ) {
    return "rate_limited";
  }
  const [user] = await db.select().from(users).where(eq(users.email, email)).limit(1);
  const passwordOk = await verifyPassword(user?.passwordHash ?? null, password);
  const ok = !!user && user.active && passwordOk;
  await db.insert(signInAttempts).values({ email, address, succeeded: ok });
  return ok ? { id: user.id, email: user.email, name: user.name } : null;
}
