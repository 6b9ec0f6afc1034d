"use client";
// The fabricator's studio for one design: the spec form, the solved design rolling on the canvas,
// the rolling check, and the revisions. The working spec is kept in the browser until it is saved
// as a revision; a revision opens read-only and can be copied into the working draft.
import { useRouter } from "next/navigation";
import { Notice } from "@/components/ui/notice";
import { Panel } from "@/components/ui/panel";
import type { Suggestion } from "@/lib/loads";
import type { LibraryMaterial } from "@/lib/loads/settings";
import { studioMessage } from "@/lib/studio/field-labels";
import { designSpecSchema, type DesignSpecInput } from "@/lib/track";
import type { LoadsSettings } from "@/lib/validation/loads";
import { LoadsPanel } from "./loads/loads-panel";
import { RevisionList } from "./revision-list";
import { SaveRevisionPanel } from "./save-revision-panel";
import { SpecForm } from "./spec-form/spec-form";
import { StudioHeader } from "./studio-header";
import { useSolver } from "./use-solver";
import { useStudioSpec } from "./use-studio-spec";
import { StudioView } from "./view";

export function DesignStudio({
  designId,
  projectId,
  revisionNumber,
  library = [],
}: {
  designId: number;
  projectId: number;
  revisionNumber?: number;
  library?: LibraryMaterial[];
}) {
  const router = useRouter();
  const base = `/projects/${projectId}/designs/${designId}`;
  const studio = useStudioSpec(designId, revisionNumber, library);
  const { design, spec, readOnly, canEdit, change, changeLoads } = studio;
  const solver = useSolver(spec ?? { mode: "track-for-wheel" }, spec ? studio.loadsRequest : null);
  // An uploaded outline's axle can also be placed on the canvas.
  const outlineWheel = spec?.wheel?.kind === "outline" ? spec.wheel : undefined;

  // The helper's one click: its design change into the draft, its input changes into the load settings.
  const apply = (s: Suggestion) => {
    if (s.spec && studio.working) change(s.spec as unknown as DesignSpecInput);
    if (s.inputs) changeLoads({ ...studio.loads, ...s.inputs } as LoadsSettings);
  };

  if (design.isError) return <Notice tone="problem">{(design.error as Error).message}</Notice>;
  if (!design.data) return <p className="text-sm text-ink-soft">Loading the design…</p>;
  const openRevision = studio.revision.data?.revision;

  return (
    <div className="flex flex-col gap-4">
      <StudioHeader
        name={design.data.design.name}
        base={base}
        revisionNumber={revisionNumber}
        canEdit={canEdit}
        unsaved={studio.unsaved}
        onCopyRevision={
          canEdit && openRevision
            ? () => {
                change(openRevision.spec);
                router.push(base);
              }
            : undefined
        }
      />

      <div className="grid gap-4 lg:grid-cols-[20rem_minmax(0,1fr)]">
        <div className="flex flex-col gap-4">
          {spec ? (
            <Panel title="Parameters">
              <SpecForm spec={spec} readOnly={readOnly} onChange={change} />
            </Panel>
          ) : (
            <Notice>{canEdit ? "Loading…" : "No revision has been saved yet."}</Notice>
          )}
          {canEdit && revisionNumber === undefined && studio.working ? (
            <SaveRevisionPanel
              designId={designId}
              spec={studio.working}
              loads={studio.loads}
              blocked={!!solver.error}
              onSaved={studio.forgetEdits}
            />
          ) : null}
        </div>
        <div className="flex min-w-0 flex-col gap-4">
          {spec ? (
            <StudioView
              result={solver.error ? undefined : solver.result}
              options={solver.options}
              check={solver.check}
              checkError={solver.checkError?.message}
              spec={designSpecSchema.safeParse(spec).data}
              error={solver.error ? studioMessage(solver.error) : undefined}
              onPick={
                readOnly
                  ? undefined
                  : (n: number) =>
                      change(spec.mode === "partner-wheel" ? { ...spec, lobes: n } : { ...spec, periodsPerTurn: n })
              }
              onAxleChange={
                readOnly || !outlineWheel ? undefined : (axle) => change({ ...spec, wheel: { ...outlineWheel, axle } })
              }
              belowCheck={(showAt) => (
                <LoadsPanel
                  settings={studio.loads}
                  library={library}
                  readOnly={readOnly}
                  loads={solver.loads}
                  error={solver.loadsError ? studioMessage(solver.loadsError) : undefined}
                  onChange={changeLoads}
                  onApply={apply}
                  showAt={showAt}
                />
              )}
            />
          ) : null}
        </div>
      </div>

      <Panel title="Revisions">
        <RevisionList
          revisions={design.data.revisions}
          base={base}
          openNumber={revisionNumber}
          reviewBase={canEdit ? `/projects/${design.data.design.projectId}` : undefined}
        />
      </Panel>
    </div>
  );
}
