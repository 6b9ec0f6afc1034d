import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { CutPlanner } from "@/components/cut/cut-planner";
import type { SavedPlanView } from "@/components/cut/saved-plan";
import { NoAccess } from "@/components/no-access";
import { Notice } from "@/components/ui/notice";
import { latestCutPlan } from "@/db/queries/cut-plans";
import { findRevision, listRevisions } from "@/db/queries/designs";
import { approvalStamp, listRevisionReviews } from "@/db/queries/reviews";
import { approvalLine } from "@/lib/review/reference";
import { getProjectSite, getProjectSummary } from "@/db/queries/projects";
import { listShopLibrary } from "@/db/queries/shop";
import { CautionList } from "@/components/review/caution-list";
import { Panel } from "@/components/ui/panel";
import { cautionParts } from "@/lib/loads";
import { loadsForRevision } from "@/lib/server/loads";
import type { CutSettings } from "@/lib/cut/settings";
import type { PlanChoice } from "@/lib/cut-plan/compose";
import { formFromSettings, startingChoice } from "@/lib/cut-plan/form";
import { jobContext, planPageFacts, type CutPlanSummary } from "@/lib/server/cut-plans";
import { requireDesignAccess, requirePageUser } from "@/lib/server/dal";
import { AppError } from "@/lib/server/errors";

export const metadata: Metadata = { title: "Cut plan" };

export default async function CutPlanPage({
  params,
  searchParams,
}: {
  params: Promise<{ id: string; designId: string }>;
  searchParams: Promise<{ revision?: string }>;
}) {
  await requirePageUser();
  const { id, designId } = await params;
  const { revision: asked } = await searchParams;
  const access = await requireDesignAccess(/^\d{1,10}$/.test(designId) ? Number(designId) : -1).catch((e) => {
    if (e instanceof AppError && e.kind === "not_found") notFound();
    throw e;
  });
  if (String(access.projectId) !== id) notFound();
  if (!access.canManage)
    return <NoAccess what="Cut plans and cut files are for the shop: the project's fabricator or an admin." />;

  const revisions = await listRevisions(access.design.id);
  const back = (
    <Link
      href={`/projects/${access.projectId}/designs/${access.design.id}`}
      className="no-print text-sm text-ink-soft hover:underline"
    >
      ← Studio
    </Link>
  );
  if (revisions.length === 0) {
    return (
      <>
        {back}
        <h1 className="text-2xl font-semibold tracking-tight">Cut plan: {access.design.name}</h1>
        <Notice>Save a revision in the studio first: cut plans are made from a frozen revision.</Notice>
      </>
    );
  }
  const row = asked && /^\d{1,6}$/.test(asked) ? revisions.find((r) => r.number === Number(asked)) : revisions[0];
  if (!row) notFound();
  const found = await findRevision(row.id);
  if (!found) notFound();
  const revision = found.revision;

  const [library, plan, project, site, approval, reviews] = await Promise.all([
    listShopLibrary({ activeOnly: true }),
    latestCutPlan(revision.id),
    getProjectSummary(access.projectId),
    getProjectSite(access.projectId),
    approvalStamp(revision),
    listRevisionReviews(revision.id),
  ]);
  const storedChoice = plan?.settings as (PlanChoice & { composed?: CutSettings }) | undefined;
  // A saved plan reopens as it was saved. With no plan yet, start from the project's site and stock,
  // then the run the client reviewed, then the defaults (lib/cut-plan/form.ts startingChoice).
  const reviewed = reviews.find((r) => r.runLengthMm !== null);
  const start = storedChoice
    ? {
        settings: storedChoice.settings as Partial<CutSettings>,
        ids: {
          materialId: storedChoice.materialId,
          stockSheetId: storedChoice.stockSheetId,
          machineId: storedChoice.machineId,
        },
      }
    : startingChoice(
        { materials: library.materials, sheets: library.stockSheets, machines: library.machines },
        site && {
          runLengthMm: site.runLengthMm,
          trackLines: site.trackLines,
          stockSheetId: site.stockSheet?.id ?? null,
          machineId: site.machine?.id ?? null,
        },
        reviewed ? { runLength: reviewed.runLengthMm!, endTreatment: reviewed.endTreatment ?? "flat" } : {},
      );
  let saved: SavedPlanView | null = null;
  // The load-path cautions as the files will state them: the saved plan's board and spans, else the revision's settings.
  let loads = plan ? null : await loadsForRevision(revision);
  if (plan) {
    const facts = await planPageFacts(await jobContext(plan, revision, found.designName));
    loads = facts.loads;
    saved = {
      id: plan.id,
      number: plan.number,
      createdAt: plan.createdAt,
      createdBy: plan.createdBy,
      summary: plan.summary as unknown as CutPlanSummary,
      files: facts.files,
    };
  }

  return (
    <>
      {back}
      <div className="flex flex-wrap items-baseline gap-3">
        <h1 className="text-2xl font-semibold tracking-tight">Cut plan: {access.design.name}</h1>
        <span className="font-mono text-sm text-ink-soft" data-testid="cut-revision">
          R{revision.number} · fingerprint {revision.specHash.slice(0, 12)}
        </span>
        {revisions.length > 1 ? (
          <nav aria-label="Revisions" className="flex gap-2 text-sm">
            {revisions.map((r) => (
              <Link
                key={r.id}
                href={`?revision=${r.number}`}
                className={r.number === revision.number ? "font-semibold" : "underline"}
              >
                R{r.number}
              </Link>
            ))}
          </nav>
        ) : null}
      </div>
      {approval ? (
        <p
          className="rounded-plate border border-pass/40 bg-white/60 px-3 py-2 text-sm text-pass"
          data-testid="approval-reference"
        >
          Client approval: {approvalLine(approval)}, signed{" "}
          {new Date(approval.signedAt).toISOString().slice(0, 16).replace("T", " ")} UTC. Every file of this revision
          carries the reference.
        </p>
      ) : (
        <div
          className="flex flex-wrap items-center gap-3 rounded-plate border border-caution bg-caution-soft px-3 py-2 text-sm text-caution-ink"
          data-testid="approval-reference"
        >
          <span className="font-semibold">{approvalLine(null)}</span>
          <span>The client has not approved R{revision.number}; its files are marked so.</span>
          <Link href={`/projects/${access.projectId}?review=${revision.id}#send-review`} className="underline">
            Send R{revision.number} for review
          </Link>
        </div>
      )}
      <Panel title="Load-path cautions">
        {!loads!.stored ? (
          <p className="mb-2 text-sm text-ink-soft" data-testid="loads-defaults">
            R{revision.number} was saved without load settings: these use the shop library&apos;s defaults (pushed by
            hand). Set the use and the load in the studio&apos;s Loads panel and save a revision.
          </p>
        ) : null}
        <CautionList cautions={loads!.report.cautions.map(cautionParts)} disclaimer={loads!.report.disclaimer} />
      </Panel>
      {/* The studio width: the sheets and the run are drawn wide. */}
      <div className="relative left-1/2 w-[min(110rem,calc(100vw-2rem))] -translate-x-1/2">
        <CutPlanner
          revision={{ id: revision.id, number: revision.number, spec: revision.spec, specHash: revision.specHash }}
          designName={found.designName}
          projectName={project?.name ?? ""}
          library={{
            materials: library.materials.map((m) => ({ id: m.id, name: m.name, thicknessMm: m.thicknessMm })),
            sheets: library.stockSheets.map((s) => ({
              id: s.id,
              name: s.name,
              lengthMm: s.lengthMm,
              widthMm: s.widthMm,
              grain: s.grain,
              materialId: s.materialId,
            })),
            machines: library.machines.map((k) => ({
              id: k.id,
              name: k.name,
              kind: k.kind,
              kerfMm: k.kerfMm,
              bedLengthMm: k.bedLengthMm,
              bedWidthMm: k.bedWidthMm,
              minInsideRadiusMm: k.minInsideRadiusMm,
            })),
          }}
          initialForm={formFromSettings(start.settings, start.ids)}
          saved={saved}
          approved={approval !== null}
        />
      </div>
    </>
  );
}
