// Password checks and the sign-in rate limit, against the real database.
import { and, eq } from "drizzle-orm";
import { afterAll, describe, expect, it } from "vitest";
import { db, pool } from "@/db";
import { signInAttempts, users } from "@/db/schema";
import { checkCredentials, MAX_FAILURES_PER_ACCOUNT, MAX_FAILURES_PER_ADDRESS } from "@/lib/server/sign-in";
import { makeUser } from "./support/fixtures";

afterAll(async () => {
  await pool.end();
});

const PASSWORD = "integration-password-1"; // the fixtures' password

describe("checkCredentials", () => {
  it("accepts the right password and refuses a wrong one", async () => {
    const u = await makeUser("client", "signin");
    expect(await checkCredentials(u.email, PASSWORD, "10.0.0.1")).toMatchObject({ id: u.id, email: u.email });
    expect(await checkCredentials(u.email, "wrong-password", "10.0.0.1")).toBeNull();
    expect(await checkCredentials(`nobody.${u.id}@example.test`, PASSWORD, "10.0.0.1")).toBeNull();
  });

  it("refuses a deactivated account even with the right password", async () => {
    const u = await makeUser("installer", "inactive");
    await db.update(users).set({ active: false }).where(eq(users.id, u.id));
    expect(await checkCredentials(u.email, PASSWORD, "10.0.0.2")).toBeNull();
  });

  it(`locks an account after ${MAX_FAILURES_PER_ACCOUNT} failures, even for the right password`, async () => {
    const u = await makeUser("client", "locked");
    for (let i = 0; i < MAX_FAILURES_PER_ACCOUNT; i++) {
      expect(await checkCredentials(u.email, `wrong-${i}`, `10.1.0.${i}`)).toBeNull();
    }
    expect(await checkCredentials(u.email, PASSWORD, "10.1.0.99")).toBe("rate_limited");
  });

  it(`limits one address to ${MAX_FAILURES_PER_ADDRESS} failures across accounts`, async () => {
    const address = `10.2.${Math.floor(Math.random() * 250)}.${Math.floor(Math.random() * 250)}`;
    for (let i = 0; i < MAX_FAILURES_PER_ADDRESS; i++) {
      await checkCredentials(`spray.${i}.${address}@example.test`, "guess", address);
    }
    const u = await makeUser("client", "sprayed");
    expect(await checkCredentials(u.email, PASSWORD, address)).toBe("rate_limited");
    expect(await checkCredentials(u.email, PASSWORD, "10.3.0.1"), "another address still gets in").toMatchObject({
      id: u.id,
    });
  });

  it("records attempts without the password", async () => {
    const u = await makeUser("client", "recorded");
    await checkCredentials(u.email, "a-secret-guess", "10.4.0.1");
    const rows = await db
      .select()
      .from(signInAttempts)
      .where(and(eq(signInAttempts.email, u.email), eq(signInAttempts.address, "10.4.0.1")));
    expect(rows).toHaveLength(1);
    expect(rows[0].succeeded).toBe(false);
    expect(JSON.stringify(rows)).not.toContain("a-secret-guess");
  });
});
