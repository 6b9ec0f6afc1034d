import Link from "next/link";
import { formatWhen } from "@/components/format";
import { Badge } from "@/components/ui/panel";
import { Table } from "@/components/ui/table";
import { approvalReference } from "@/lib/review/reference";
import { REVIEW_STATUS_LABEL, depositText, type ReviewStatus } from "./review-status";

export interface ReviewListRow {
  id: number;
  projectId: number;
  designName: string;
  revisionNumber: number;
  createdAt: string;
  requestedBy: string | null;
  status: ReviewStatus;
  decision: { specHash: string; signedAt: string; typedName: string } | null;
  deposit: Parameters<typeof depositText>[0];
}

/** The project's reviews, newest first, each with its outcome and a link to it. */
export function ReviewList({ reviews }: { reviews: ReviewListRow[] }) {
  if (reviews.length === 0) return <p className="text-sm text-ink-soft">No revision has been sent for review yet.</p>;
  return (
    <Table head={["Revision", "Sent", "State", "Deposit", ""]} caption="Reviews">
      {reviews.map((r) => (
        <tr key={r.id} data-testid={`review-row-${r.id}`}>
          <td>
            {r.designName} <span className="font-mono text-xs">R{r.revisionNumber}</span>
          </td>
          <td className="font-mono text-xs">
            {formatWhen(r.createdAt)}
            {r.requestedBy ? <span className="font-sans"> by {r.requestedBy}</span> : null}
          </td>
          <td>
            <Badge tone={r.status === "approved" ? "pass" : r.status === "changes-requested" ? "caution" : "ink"}>
              {REVIEW_STATUS_LABEL[r.status]}
            </Badge>
            {r.status === "approved" && r.decision ? (
              <div className="mt-1 font-mono text-xs">{approvalReference(r.decision)}</div>
            ) : null}
          </td>
          <td className="text-xs">{depositText(r.deposit)}</td>
          <td className="text-right">
            <Link
              href={`/projects/${r.projectId}/reviews/${r.id}`}
              className="text-sm font-medium underline decoration-ink-line underline-offset-2"
            >
              Open the review
            </Link>
          </td>
        </tr>
      ))}
    </Table>
  );
}
