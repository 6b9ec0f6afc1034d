import "server-only";
import { db } from "@/db";
import { auditLog } from "@/db/schema";

type Executor = Pick<typeof db, "insert">;

/** Records who did what to which record. Pass the transaction so the entry lands with the change. */
export async function audit(
  tx: Executor,
  entry: {
    actorId: number | null;
    action: string;
    entity: string;
    entityId: number | string;
    projectId?: number | null;
    detail?: Record<string, unknown>;
  },
): Promise<void> {
  await tx.insert(auditLog).values({
    actorId: entry.actorId,
    action: entry.action,
    entity: entry.entity,
    entityId: String(entry.entityId),
    projectId: entry.projectId ?? null,
    detail: entry.detail ?? null,
  });
}
