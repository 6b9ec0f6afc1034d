import "server-only";
// Deposits and the payment-service events acted on. A payment is one transaction: the event's id
// (unique, so a replay loses on the key), the deposit marked paid, and the audit entry.
import { and, eq } from "drizzle-orm";
import { db } from "@/db";
import { deposits, paymentEvents, type Deposit } from "@/db/schema";
import { formatMoney } from "@/lib/money/currency";
import { audit } from "./audit";
import { writeLogEntry } from "./build-log";

export async function findDeposit(id: number): Promise<Deposit | null> {
  const [row] = await db.select().from(deposits).where(eq(deposits.id, id)).limit(1);
  return row ?? null;
}

export async function depositOfReview(reviewId: number): Promise<Deposit | null> {
  const [row] = await db.select().from(deposits).where(eq(deposits.reviewId, reviewId)).limit(1);
  return row ?? null;
}

export async function setCheckoutSession(depositId: number, sessionId: string): Promise<void> {
  await db.update(deposits).set({ checkoutSessionId: sessionId }).where(eq(deposits.id, depositId));
}

export async function eventSeen(eventId: string): Promise<boolean> {
  return (
    (await db.select({ id: paymentEvents.id }).from(paymentEvents).where(eq(paymentEvents.eventId, eventId)).limit(1))
      .length > 0
  );
}

/** An event that changes nothing, recorded so that it is not acted on twice. */
export async function recordEvent(eventId: string, type: string): Promise<void> {
  await db.insert(paymentEvents).values({ eventId, type });
}

/** Marks a due deposit paid. False when it was not due any more (another event won): nothing is written then. */
class NotDue extends Error {}

export async function markDepositPaid(
  deposit: Deposit,
  event: { id: string; type: string; sessionId: string },
): Promise<boolean> {
  return db
    .transaction(async (tx) => {
      await tx.insert(paymentEvents).values({ eventId: event.id, type: event.type, depositId: deposit.id });
      const [res] = await tx
        .update(deposits)
        .set({ status: "paid", paidAt: new Date(), checkoutSessionId: event.sessionId })
        .where(and(eq(deposits.id, deposit.id), eq(deposits.status, "due")));
      // Throwing undoes the event row too, so a lost race leaves nothing behind.
      if (res.affectedRows !== 1) throw new NotDue();
      await writeLogEntry(tx, null, deposit.projectId, {
        kind: "review",
        text: `Deposit of ${formatMoney(deposit.amountMinor, deposit.currency)} paid.`,
        detail: { reviewId: deposit.reviewId, depositId: deposit.id },
      });
      await audit(tx, {
        actorId: null,
        action: "deposit-paid",
        entity: "deposits",
        entityId: deposit.id,
        projectId: deposit.projectId,
        detail: {
          reviewId: deposit.reviewId,
          amountMinor: deposit.amountMinor,
          currency: deposit.currency,
          eventId: event.id,
          sessionId: event.sessionId,
        },
      });
      return true;
    })
    .catch((error: unknown) => {
      if (error instanceof NotDue) return false;
      throw error;
    });
}
