"use client";
// The fabricator's studio for one design: the spec form, the solved design rolling on the canvas,
// the rolling check, and the revisions. The working spec is kept in the browser until it is saved
// as a revision; a revision opens read-only and can be copied into the working draft.
import { useQuery, useQueryClient } from "@tanstack/react-query";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useMemo, useState } from "react";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { Panel } from "@/components/ui/panel";
import type { Suggestion } from "@/lib/loads";
import { settingsOrDefault, treadsOf, type LibraryMaterial } from "@/lib/loads/settings";
import { studioMessage } from "@/lib/studio/field-labels";
import { clearLocalDraft, clearLocalLoads, loadLocalDraft, loadLocalLoads, sameSpec, saveLocalDraft, saveLocalLoads } from "@/lib/studio/local-draft";
import { designSpecSchema, type DesignSpecInput } from "@/lib/track";
import type { LoadsSettings } from "@/lib/validation/loads";
import { api } from "./api";
import { LoadsPanel } from "./loads/loads-panel";
import { RevisionList } from "./revision-list";
import { SpecForm } from "./spec-form/spec-form";
import { useSolver } from "./use-solver";
import { StudioView } from "./view";

function canonical(spec: unknown): unknown {
  const parsed = designSpecSchema.safeParse(spec);
  return parsed.success ? parsed.data : spec;
}

export function DesignStudio({ designId, projectId, revisionNumber, library = [] }: { designId: number; projectId: number; revisionNumber?: number; library?: LibraryMaterial[] }) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const base = `/projects/${projectId}/designs/${designId}`;
  const design = useQuery({ queryKey: ["design", designId], queryFn: () => api.design(designId) });
  const openRevision = design.data?.revisions.find((r) => r.number === revisionNumber);
  const revision = useQuery({ queryKey: ["revision", openRevision?.id], queryFn: () => api.revision(openRevision!.id), enabled: !!openRevision });
  const canEdit = design.data?.you.canEdit ?? false;
  const readOnly = revisionNumber !== undefined || !canEdit;

  const [edited, setWorking] = useState<DesignSpecInput | null>(null);
  const [note, setNote] = useState("");
  const [saving, setSaving] = useState(false);
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);

  // The working spec: what was edited here, else the local draft kept from before, else the saved draft.
  const savedDraft = design.data?.design.draft;
  const working = useMemo(() => edited ?? (savedDraft ? (loadLocalDraft(designId) ?? savedDraft) : null), [edited, savedDraft, designId]);

  // Viewers (clients, installers) see the newest saved revision; nobody but the shop sees drafts.
  const latest = design.data?.revisions[0];
  const latestRevision = useQuery({
    queryKey: ["revision", latest?.id],
    queryFn: () => api.revision(latest!.id),
    enabled: !canEdit && revisionNumber === undefined && !!latest,
  });
  const spec: DesignSpecInput | null =
    revisionNumber !== undefined ? (revision.data?.revision.spec ?? null) : canEdit ? working : (latestRevision.data?.revision.spec ?? null);
  // The load settings beside the spec: edited here, else kept in this browser, else the saved ones,
  // else the library's defaults; a revision shows its own.
  const [editedLoads, setEditedLoads] = useState<LoadsSettings | null>(null);
  const savedLoads = design.data?.design.loads ?? null;
  const shownLoads = useMemo((): LoadsSettings => {
    if (revisionNumber !== undefined) return settingsOrDefault(revision.data?.revision.loads ?? null, library).settings;
    if (!canEdit) return settingsOrDefault(latestRevision.data?.revision.loads ?? null, library).settings;
    return editedLoads ?? settingsOrDefault(loadLocalLoads(designId) ?? savedLoads, library).settings;
  }, [revisionNumber, revision.data, canEdit, latestRevision.data, editedLoads, designId, savedLoads, library]);
  const loadsRequest = useMemo(() => ({ settings: shownLoads, treads: treadsOf(library) }), [shownLoads, library]);
  const solver = useSolver(spec ?? { mode: "track-for-wheel" }, spec ? loadsRequest : null);
  // An uploaded outline's axle can also be placed on the canvas.
  const outlineWheel = spec?.wheel?.kind === "outline" ? spec.wheel : undefined;

  const unsaved = useMemo(
    () =>
      canEdit &&
      revisionNumber === undefined &&
      !!working &&
      !!design.data?.design.draft &&
      (!sameSpec(canonical(working), canonical(design.data.design.draft)) || !sameSpec(shownLoads, settingsOrDefault(savedLoads, library).settings)),
    [canEdit, revisionNumber, working, design.data, shownLoads, savedLoads, library],
  );

  const changeLoads = (next: LoadsSettings) => {
    setEditedLoads(next);
    saveLocalLoads(designId, next);
    setMessage(null);
  };

  // The helper's one click: its design change into the draft, its input changes into the load settings.
  const apply = (s: Suggestion) => {
    if (s.spec && working) change(s.spec as unknown as DesignSpecInput);
    if (s.inputs) changeLoads({ ...shownLoads, ...s.inputs } as LoadsSettings);
  };

  const change = (next: DesignSpecInput) => {
    setWorking(next);
    saveLocalDraft(designId, next);
    setMessage(null);
  };

  const saveRevision = async () => {
    if (!working) return;
    setSaving(true);
    setMessage(null);
    try {
      await api.saveDraft(designId, working, shownLoads);
      const { revision: saved } = await api.saveRevision(designId, working, note, shownLoads);
      clearLocalDraft(designId);
      clearLocalLoads(designId);
      setEditedLoads(null);
      setNote("");
      await queryClient.invalidateQueries({ queryKey: ["design", designId] });
      setWorking(null);
      setMessage({ ok: true, text: `Saved revision R${saved.number}.` });
    } catch (error) {
      setMessage({ ok: false, text: (error as Error).message });
    } finally {
      setSaving(false);
    }
  };

  if (design.isError) return <Notice tone="problem">{(design.error as Error).message}</Notice>;
  if (!design.data) return <p className="text-sm text-ink-soft">Loading the design…</p>;

  return (
    <div className="flex flex-col gap-4">
      <div className="flex flex-wrap items-center gap-3">
        <h1 className="text-2xl font-semibold tracking-tight">{design.data.design.name}</h1>
        {revisionNumber !== undefined ? (
          <>
            <span className="rounded-plate border border-ink-line px-2 py-0.5 font-mono text-sm" data-testid="read-only-badge">
              R{revisionNumber} · read-only
            </span>
            <Link href={base} className="text-sm underline">
              Back to the working draft
            </Link>
            {canEdit && revision.data ? (
              <Button
                type="button"
                variant="quiet"
                onClick={() => {
                  change(revision.data!.revision.spec);
                  router.push(base);
                }}
              >
                Copy into the working draft
              </Button>
            ) : null}
          </>
        ) : unsaved ? (
          <span className="rounded-plate border border-caution px-2 py-0.5 text-sm text-caution" data-testid="unsaved-flag">
            Unsaved changes (kept in this browser)
          </span>
        ) : null}
        {!canEdit ? <span className="text-sm text-ink-soft">You can view this design; only the shop edits it.</span> : null}
      </div>

      <div className="grid gap-4 lg:grid-cols-[20rem_minmax(0,1fr)]">
        <div className="flex flex-col gap-4">
          {spec ? (
            <Panel title="Parameters">
              <SpecForm spec={spec} readOnly={readOnly} onChange={change} />
            </Panel>
          ) : (
            <Notice>{canEdit ? "Loading…" : "No revision has been saved yet."}</Notice>
          )}
          {canEdit && revisionNumber === undefined && working ? (
            <Panel title="Save a revision">
              <div className="flex flex-col gap-2">
                <label htmlFor="revision-note" className="text-sm font-medium">
                  Note
                </label>
                <input
                  id="revision-note"
                  className="rounded-plate border border-ink-line bg-white/70 px-2 py-1 text-sm"
                  maxLength={500}
                  value={note}
                  onChange={(e) => setNote(e.target.value)}
                  placeholder="What changed, for the client and the shop"
                />
                <Button type="button" onClick={saveRevision} disabled={saving || !!solver.error}>
                  {saving ? "Saving…" : "Save revision"}
                </Button>
                {message ? <Notice tone={message.ok ? "done" : "problem"}>{message.text}</Notice> : null}
              </div>
            </Panel>
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
              onPick={readOnly ? undefined : (n: number) => change(spec.mode === "partner-wheel" ? { ...spec, lobes: n } : { ...spec, periodsPerTurn: n })}
              onAxleChange={readOnly || !outlineWheel ? undefined : (axle) => change({ ...spec, wheel: { ...outlineWheel, axle } })}
              belowCheck={(showAt) => (
                <LoadsPanel
                  settings={shownLoads}
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
        <RevisionList revisions={design.data.revisions} base={base} openNumber={revisionNumber} reviewBase={canEdit ? `/projects/${design.data.design.projectId}` : undefined} />
      </Panel>
    </div>
  );
}
