// Words for a review's state and a deposit's, the same on the project page and the review page.
import type { DepositStatus } from "@/db/schema";
import { formatMoney } from "@/lib/money/currency";

export type ReviewStatus = "open" | "approved" | "changes-requested";

export const REVIEW_STATUS_LABEL: Record<ReviewStatus, string> = {
  open: "Waiting for the client",
  approved: "Approved",
  "changes-requested": "Changes requested",
};

export const DEPOSIT_LABEL: Record<DepositStatus, string> = {
  "on-approval": "due on approval",
  due: "due",
  paid: "paid",
};

export function depositText(d: { amountMinor: number; currency: string; status: DepositStatus } | null): string {
  return d ? `${formatMoney(d.amountMinor, d.currency)}, ${DEPOSIT_LABEL[d.status]}` : "none";
}
