import "server-only";
// Sessions ended by signing out (db/schema.ts endedSessions): written once, read on every request.
import { eq } from "drizzle-orm";
import { db } from "@/db";
import { endedSessions } from "@/db/schema";

/** Records that the session has ended; signing out twice is harmless. */
export async function endSession(sessionId: string, userId: number): Promise<void> {
  await db.insert(endedSessions).values({ sessionId, userId }).onDuplicateKeyUpdate({ set: { sessionId } });
}

export async function isSessionEnded(sessionId: string): Promise<boolean> {
  const [row] = await db
    .select({ id: endedSessions.sessionId })
    .from(endedSessions)
    .where(eq(endedSessions.sessionId, sessionId))
    .limit(1);
  return !!row;
}
