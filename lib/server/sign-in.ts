import "server-only";
// Password check with a rate limit per account and per address. Attempts are kept in the database
// so the limit holds across several app instances. Passwords never reach a log.
import { and, count, eq, gt } from "drizzle-orm";
import { db } from "@/db";
import { signInAttempts, users } from "@/db/schema";
import { audit } from "@/db/queries/audit";
import { AppError } from "./errors";
import { hashPassword, verifyPassword } from "./passwords";

export const SIGN_IN_WINDOW_MINUTES = 15;
export const MAX_FAILURES_PER_ACCOUNT = 5;
export const MAX_FAILURES_PER_ADDRESS = 20;

async function recentFailures(
  column: typeof signInAttempts.email | typeof signInAttempts.address,
  value: string,
): Promise<number> {
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

/**
 * Changes a signed-in user's password: the current one must match (a wrong one counts against the
 * same limit as a failed sign-in), the new one is stored as an Argon2id hash, and every session
 * issued before now ends, this one included (lib/server/dal.ts reads users.sessionsFrom).
 */
export async function changePassword(
  user: { id: number; email: string },
  current: string,
  next: string,
  address: string,
): Promise<void> {
  if ((await recentFailures(signInAttempts.email, user.email)) >= MAX_FAILURES_PER_ACCOUNT)
    throw new AppError("too_many", `Too many wrong passwords. Wait ${SIGN_IN_WINDOW_MINUTES} minutes and try again.`);
  const [row] = await db.select({ passwordHash: users.passwordHash }).from(users).where(eq(users.id, user.id)).limit(1);
  const ok = await verifyPassword(row?.passwordHash ?? null, current);
  await db.insert(signInAttempts).values({ email: user.email, address, succeeded: ok });
  if (!ok)
    throw new AppError("bad_request", "That is not your current password.", {
      currentPassword: ["That is not your current password."],
    });
  const passwordHash = await hashPassword(next);
  // Whole seconds, as the token's "iat": a sign-in later in this same second still counts.
  const sessionsFrom = new Date(Math.floor(Date.now() / 1000) * 1000);
  await db.transaction(async (tx) => {
    await tx.update(users).set({ passwordHash, sessionsFrom }).where(eq(users.id, user.id));
    await audit(tx, {
      actorId: user.id,
      action: "update",
      entity: "users",
      entityId: user.id,
      detail: { password: "changed", sessionsEnded: true },
    });
  });
}
