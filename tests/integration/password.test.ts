// Changing one's own password: the current one must match, wrong ones count against the sign-in
// limit, the new one is an Argon2id hash (RFC 9106; "$argon2id$" in the PHC string format), and
// every session issued before the change ends.
import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { db, pool } from "@/db";
import { users } from "@/db/schema";
import { getCurrentUser } from "@/lib/server/dal";
import { AppError } from "@/lib/server/errors";
import { verifyPassword } from "@/lib/server/passwords";
import { changePassword, checkCredentials, MAX_FAILURES_PER_ACCOUNT } from "@/lib/server/sign-in";
import { passwordChangeSchema } from "@/lib/validation/auth";
import { makeUser } from "./support/fixtures";
import { actAs } from "./support/session";

vi.mock("@/auth", async () => (await import("./support/session")).mockAuth);

const OLD = "integration-password-1"; // tests/integration/support/fixtures.ts
const NEW = "a-new-password-for-the-shop";
let user: { id: number; email: string };

const refusal = (p: Promise<unknown>) =>
  p.then(
    () => null,
    (e: unknown) => (e instanceof AppError ? e.kind : String(e)),
  );

beforeAll(async () => {
  user = await makeUser("fabricator", "password-change");
});

afterAll(async () => {
  await pool.end();
});

describe("changing one's password", () => {
  it("asks for the new one twice, different from the current one", () => {
    expect(
      passwordChangeSchema.safeParse({ currentPassword: OLD, newPassword: NEW, newPasswordAgain: NEW }).success,
    ).toBe(true);
    const mismatch = passwordChangeSchema.safeParse({
      currentPassword: OLD,
      newPassword: NEW,
      newPasswordAgain: `${NEW}x`,
    });
    expect(mismatch.error?.issues[0]).toMatchObject({
      path: ["newPasswordAgain"],
      message: "The two new passwords are not the same.",
    });
    expect(
      passwordChangeSchema.safeParse({ currentPassword: OLD, newPassword: OLD, newPasswordAgain: OLD }).success,
    ).toBe(false);
    expect(
      passwordChangeSchema.safeParse({ currentPassword: OLD, newPassword: "short", newPasswordAgain: "short" }).success,
    ).toBe(false);
  });

  it("refuses a wrong current password and changes nothing", async () => {
    expect(await refusal(changePassword(user, "not-the-password", NEW, "127.0.0.9"))).toBe("bad_request");
    const [row] = await db.select().from(users).where(eq(users.id, user.id));
    expect(await verifyPassword(row.passwordHash, OLD)).toBe(true);
    expect(row.sessionsFrom).toBeNull();
  });

  it("stores an Argon2id hash of the new one and ends every earlier session", async () => {
    actAs(user.id);
    expect((await getCurrentUser())?.id).toBe(user.id);
    await changePassword(user, OLD, NEW, "127.0.0.9");
    const [row] = await db.select().from(users).where(eq(users.id, user.id));
    expect(row.passwordHash.startsWith("$argon2id$")).toBe(true);
    expect(await verifyPassword(row.passwordHash, NEW)).toBe(true);
    expect(await verifyPassword(row.passwordHash, OLD)).toBe(false);
    // The session from before the change is over; one issued since (a new sign-in) is good.
    actAs(user.id, Math.floor(Date.now() / 1000) - 5);
    expect(await getCurrentUser()).toBeNull();
    actAs(user.id, Math.floor(Date.now() / 1000) + 1);
    expect((await getCurrentUser())?.id).toBe(user.id);
    expect(await checkCredentials(user.email, NEW, "127.0.0.9")).toMatchObject({ id: user.id });
  });

  it("is rate-limited with the sign-in: after too many wrong passwords even the right one waits", async () => {
    const other = await makeUser("client", "password-limit");
    for (let i = 0; i < MAX_FAILURES_PER_ACCOUNT; i++)
      expect(await refusal(changePassword(other, `wrong-${i}`, NEW, "127.0.0.10"))).toBe("bad_request");
    expect(await refusal(changePassword(other, OLD, NEW, "127.0.0.10"))).toBe("too_many");
    const [row] = await db.select().from(users).where(eq(users.id, other.id));
    expect(await verifyPassword(row.passwordHash, OLD)).toBe(true);
  });
});
