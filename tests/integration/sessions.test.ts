// A signed-out session stays out: signing out records the session's id (db/queries/sessions.ts), and
// the data-access layer refuses that session from then on, whichever instance the request reaches.
// (The browser side, renewal and a replayed cookie, is in tests/e2e/sign-in.test.ts.)
import { count, eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { db, pool } from "@/db";
import { endedSessions } from "@/db/schema";
import { endSession, isSessionEnded } from "@/db/queries/sessions";
import { getCurrentUser } from "@/lib/server/dal";
import * as projectsRoute from "@/app/api/projects/route";
import { makeUser } from "./support/fixtures";
import { actAs } from "./support/session";

vi.mock("@/auth", async () => (await import("./support/session")).mockAuth);
vi.mock("next/cache", async () => (await import("./support/session")).mockCache);

let user: { id: number };
const now = () => Math.floor(Date.now() / 1000);

beforeAll(async () => {
  user = await makeUser("fabricator", "sessions");
});

afterAll(async () => {
  await pool.end();
});

describe("ended sessions", () => {
  it("a session is the user's until it is signed out, then refused; another session of theirs is not", async () => {
    const sid = `test-${crypto.randomUUID()}`;
    const other = `test-${crypto.randomUUID()}`;
    actAs(user.id, now() - 60, sid);
    expect((await getCurrentUser())?.id).toBe(user.id);
    expect(
      (await projectsRoute.GET(new Request("http://t/api/projects"), { params: Promise.resolve({}) })).status,
    ).toBe(200);

    await endSession(sid, user.id);
    expect(await isSessionEnded(sid)).toBe(true);
    actAs(user.id, now() - 60, sid);
    expect(await getCurrentUser()).toBeNull();
    expect(
      (await projectsRoute.GET(new Request("http://t/api/projects"), { params: Promise.resolve({}) })).status,
    ).toBe(401);

    actAs(user.id, now() - 60, other);
    expect((await getCurrentUser())?.id).toBe(user.id);
  });

  it("signing out twice records it once", async () => {
    const sid = `test-${crypto.randomUUID()}`;
    await endSession(sid, user.id);
    await endSession(sid, user.id);
    const [{ n }] = await db.select({ n: count() }).from(endedSessions).where(eq(endedSessions.sessionId, sid));
    expect(n).toBe(1);
  });
});
