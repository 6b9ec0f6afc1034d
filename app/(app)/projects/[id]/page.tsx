import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { formatWhen, STATUS_LABEL } from "@/components/format";
import { MODE_LABELS } from "@/components/studio/spec-form/defaults";
import { AddMemberForm, RemoveMemberButton } from "@/components/member-forms";
import { ProjectSiteFacts, ProjectSiteForm } from "@/components/project-site-form";
import { Badge, Panel } from "@/components/ui/panel";
import { Table } from "@/components/ui/table";
import { ReviewList } from "@/components/review/review-list";
import { depositText } from "@/components/review/review-status";
import { SendReviewForm, type SendableRevision } from "@/components/review/send-review-form";
import { LogList } from "@/components/build-log/log-list";
import { listLog } from "@/db/queries/build-log";
import { latestCutPlan, listProjectCutPlans } from "@/db/queries/cut-plans";
import { listDesigns, listProjectRevisions } from "@/db/queries/designs";
import { clientMembers, listProjectReviews, projectDeposit } from "@/db/queries/reviews";
import { reviewStatus, showsRun } from "@/lib/review/review-state";
import { listMembers } from "@/db/queries/members";
import { getProjectSite, getProjectSummary } from "@/db/queries/projects";
import { listShopLibrary } from "@/db/queries/shop";
import { listAssignableUsers } from "@/db/queries/users";
import { requirePageUser, requireProjectAccess } from "@/lib/server/dal";
import { AppError } from "@/lib/server/errors";
import { roleLabel } from "@/lib/labels";
import { cutPlanName } from "@/lib/cut-plan/name";

export const metadata: Metadata = { title: "Project" };

/** The "Cut plan" column: the latest revision's saved plan by its name, or the way to make one. */
function latestPlanName(
  plans: { designId: number; number: number; revisionNumber: number }[],
  designId: number,
  latestRevision: number,
): string {
  const plan = plans.find((p) => p.designId === designId && p.revisionNumber === latestRevision);
  return plan ? cutPlanName(plan.number, plan.revisionNumber) : `Make a cut plan of R${latestRevision}`;
}

/** What the send form offers: each saved revision, the run its mock-up would show, and why it cannot go now. */
async function sendable(
  projectId: number,
  reviews: Awaited<ReturnType<typeof listProjectReviews>>,
): Promise<SendableRevision[]> {
  const revisions = await listProjectRevisions(projectId);
  return Promise.all(
    revisions.map(async (r) => {
      const mine = reviews.filter((x) => x.revisionId === r.id);
      const blocked = mine.some((x) => x.decision?.decision === "approve")
        ? "approved already"
        : mine.some((x) => !x.decision)
          ? "waiting for the client"
          : null;
      const plan = (await latestCutPlan(r.id))?.settings as
        { composed?: { runLength: number; endTreatment: "flat" | "half" | "scale" } } | undefined;
      const earlier = reviews.find((x) => x.designId === r.designId && x.runLengthMm !== null);
      const run = plan?.composed
        ? { lengthMm: plan.composed.runLength, endTreatment: plan.composed.endTreatment }
        : earlier
          ? { lengthMm: earlier.runLengthMm!, endTreatment: earlier.endTreatment ?? "flat" }
          : null;
      return { id: r.id, label: `${r.designName} R${r.number}`, showsRun: showsRun(r.mode), run, blocked };
    }),
  );
}

export default async function ProjectPage({
  params,
  searchParams,
}: {
  params: Promise<{ id: string }>;
  searchParams: Promise<{ review?: string }>;
}) {
  await requirePageUser();
  const { id } = await params;
  const { review: askedRevision } = await searchParams;
  const access = await requireProjectAccess(/^\d{1,10}$/.test(id) ? Number(id) : -1).catch((e) => {
    if (e instanceof AppError && e.kind === "not_found") notFound();
    throw e;
  });
  const [project, site, members, designs, reviews, deposit, log, plans] = await Promise.all([
    getProjectSummary(access.projectId),
    getProjectSite(access.projectId),
    listMembers(access.projectId),
    listDesigns(access.projectId),
    listProjectReviews(access.projectId),
    projectDeposit(access.projectId),
    listLog(access.projectId, { limit: 5 }),
    listProjectCutPlans(access.projectId),
  ]);
  if (!project || !site) notFound();
  const [toSend, clients] = access.canManage
    ? await Promise.all([sendable(access.projectId, reviews), clientMembers(access.projectId)])
    : [[], []];
  const memberIds = new Set(members.map((m) => m.userId));
  const people = access.canManage ? (await listAssignableUsers()).filter((u) => !memberIds.has(u.id)) : [];
  // The form offers what the shop library offers now (a sheet whose material is retired is not offered).
  const library = access.canManage ? await listShopLibrary({ activeOnly: true }) : null;

  return (
    <>
      <div className="flex flex-wrap items-baseline gap-3">
        <h1 className="text-2xl font-semibold tracking-tight">{project.name}</h1>
        <Badge>{STATUS_LABEL[project.status]}</Badge>
      </div>
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
        <dt className="text-ink-soft">Client</dt>
        <dd>{project.clientOrganisation ?? "—"}</dd>
        <dt className="text-ink-soft">Site</dt>
        <dd>{project.site || "—"}</dd>
        <dt className="text-ink-soft">Last change</dt>
        <dd className="font-mono text-xs">{formatWhen(project.updatedAt)}</dd>
        <dt className="text-ink-soft">Your role</dt>
        <dd>{access.memberRole ? roleLabel(access.memberRole) : `${roleLabel("admin")} (not a member)`}</dd>
        <dt className="text-ink-soft">Deposit</dt>
        <dd data-testid="project-deposit">{depositText(deposit)}</dd>
      </dl>

      <Panel title="Members">
        <Table head={access.canManage ? ["Name", "E-mail", "Role", ""] : ["Name", "E-mail", "Role"]} caption="Members">
          {members.map((m) => (
            <tr key={m.id}>
              <td>
                {m.name}
                {m.active ? null : <span className="ml-2 text-xs text-caution-ink">(deactivated)</span>}
              </td>
              <td className="font-mono text-xs">{m.email}</td>
              <td>{roleLabel(m.role)}</td>
              {access.canManage ? (
                <td className="text-right">
                  <RemoveMemberButton projectId={access.projectId} memberId={m.id} name={m.name} />
                </td>
              ) : null}
            </tr>
          ))}
        </Table>
        {access.canManage ? (
          <div className="mt-4 border-t border-paper-edge pt-4">
            <AddMemberForm projectId={access.projectId} people={people} />
          </div>
        ) : null}
      </Panel>

      <Panel title="Site and stock">
        {library ? (
          <ProjectSiteForm
            projectId={access.projectId}
            site={site}
            sheets={library.stockSheets
              .filter((s) => library.materials.some((m) => m.id === s.materialId))
              .map((s) => ({ id: s.id, name: s.name }))}
            machines={library.machines.map((m) => ({ id: m.id, name: m.name }))}
          />
        ) : (
          <ProjectSiteFacts site={site} />
        )}
      </Panel>

      <Panel
        title="Designs"
        actions={
          access.canManage ? (
            <Link href={`/projects/${access.projectId}/designs/new`} className="text-sm font-medium underline">
              New design
            </Link>
          ) : null
        }
      >
        {designs.length === 0 ? (
          <p className="text-sm text-ink-soft">
            No designs yet.{access.canManage ? " Start one from a preset or from scratch." : ""}
          </p>
        ) : (
          <Table
            head={
              access.canManage
                ? ["Design", "Mode", "Latest revision", "Last change", "Cut plan"]
                : ["Design", "Mode", "Latest revision", "Last change"]
            }
            caption="Designs"
          >
            {designs.map((d) => (
              <tr key={d.id}>
                <td>
                  <Link
                    href={`/projects/${access.projectId}/designs/${d.id}`}
                    className="font-medium underline decoration-ink-line underline-offset-2"
                  >
                    {d.name}
                  </Link>
                </td>
                <td>{MODE_LABELS[d.mode]}</td>
                <td className="font-mono text-xs">{d.latestRevision ? `R${d.latestRevision}` : "none yet"}</td>
                <td className="font-mono text-xs">{formatWhen(d.updatedAt)}</td>
                {access.canManage ? (
                  <td>
                    {d.latestRevision ? (
                      <Link
                        href={`/projects/${access.projectId}/designs/${d.id}/cut`}
                        className="text-sm underline decoration-ink-line underline-offset-2"
                      >
                        {latestPlanName(plans, d.id, d.latestRevision)}
                      </Link>
                    ) : (
                      <span className="text-xs text-ink-soft">save a revision first</span>
                    )}
                  </td>
                ) : null}
              </tr>
            ))}
          </Table>
        )}
      </Panel>

      <Panel title="Client review">
        <div className="flex flex-col gap-4">
          <ReviewList
            reviews={reviews.map((r) => ({
              id: r.id,
              projectId: r.projectId,
              designName: r.designName,
              revisionNumber: r.revisionNumber,
              createdAt: r.createdAt,
              requestedBy: r.requestedBy,
              status: reviewStatus(r),
              decision: r.decision,
              deposit: r.deposit,
            }))}
          />
          {access.canManage ? (
            <div id="send-review" className="border-t border-paper-edge pt-4">
              <h3 className="mb-2 text-sm font-semibold">Send a revision for the client&apos;s review</h3>
              <SendReviewForm
                revisions={toSend}
                clients={clients.map((c) => c.name)}
                initialRevisionId={
                  askedRevision && /^\d{1,10}$/.test(askedRevision) ? Number(askedRevision) : undefined
                }
              />
            </div>
          ) : null}
        </div>
      </Panel>

      <Panel title="Assembly sheets">
        {plans.length === 0 ? (
          <p className="text-sm text-ink-soft">
            No cut plan is saved yet: the assembly sheet comes from a saved cut plan.
          </p>
        ) : (
          <ul className="flex flex-col gap-1 text-sm" data-testid="assembly-sheets">
            {plans.map((p) => (
              <li key={p.id}>
                <Link
                  href={`/projects/${access.projectId}/cut-plans/${p.id}/assembly`}
                  className="font-medium underline decoration-ink-line underline-offset-2"
                >
                  Assembly sheet: {p.designName} R{p.revisionNumber}
                </Link>{" "}
                <span className="text-xs text-ink-soft">
                  ({cutPlanName(p.number, p.revisionNumber, { midSentence: true })},{" "}
                  {String((p.summary as { purpose?: string }).purpose ?? "review")})
                </span>
              </li>
            ))}
          </ul>
        )}
      </Panel>

      <Panel
        title="Build log"
        actions={
          <Link href={`/projects/${access.projectId}/log`} className="text-sm font-medium underline">
            {access.canManage || access.memberRole === "installer" ? "Whole log, add an entry" : "Whole log"}
          </Link>
        }
      >
        <LogList entries={log} />
      </Panel>
    </>
  );
}
