"use client";
// Which spec and load settings the studio shows, and where edits go. The working spec is what was
// edited here, else the draft kept in this browser, else the saved draft; a revision shows its own;
// viewers (clients, installers) see the newest saved revision, never a draft.
import { useQuery } from "@tanstack/react-query";
import { useMemo, useState } from "react";
import { settingsOrDefault, treadsOf, type LibraryMaterial } from "@/lib/loads/settings";
import { loadLocalDraft, loadLocalLoads, sameSpec, saveLocalDraft, saveLocalLoads } from "@/lib/studio/local-draft";
import { designSpecSchema, type DesignSpecInput } from "@/lib/track";
import type { LoadsSettings } from "@/lib/validation/loads";
import { api } from "./api";

function canonical(spec: unknown): unknown {
  const parsed = designSpecSchema.safeParse(spec);
  return parsed.success ? parsed.data : spec;
}

export function useStudioSpec(designId: number, revisionNumber: number | undefined, library: LibraryMaterial[]) {
  const design = useQuery({ queryKey: ["design", designId], queryFn: () => api.design(designId) });
  const openRevision = design.data?.revisions.find((r) => r.number === revisionNumber);
  const revision = useQuery({
    queryKey: ["revision", openRevision?.id],
    queryFn: () => api.revision(openRevision!.id),
    enabled: !!openRevision,
  });
  const canEdit = design.data?.you.canEdit ?? false;
  const readOnly = revisionNumber !== undefined || !canEdit;

  const [edited, setEdited] = useState<DesignSpecInput | null>(null);
  const savedDraft = design.data?.design.draft;
  const working = useMemo(
    () => edited ?? (savedDraft ? (loadLocalDraft(designId) ?? savedDraft) : null),
    [edited, savedDraft, designId],
  );

  const latest = design.data?.revisions[0];
  const latestRevision = useQuery({
    queryKey: ["revision", latest?.id],
    queryFn: () => api.revision(latest!.id),
    enabled: !canEdit && revisionNumber === undefined && !!latest,
  });
  const spec: DesignSpecInput | null =
    revisionNumber !== undefined
      ? (revision.data?.revision.spec ?? null)
      : canEdit
        ? working
        : (latestRevision.data?.revision.spec ?? null);

  // The load settings beside the spec: edited here, else kept in this browser, else the saved ones,
  // else the library's defaults; a revision shows its own.
  const [editedLoads, setEditedLoads] = useState<LoadsSettings | null>(null);
  const savedLoads = design.data?.design.loads ?? null;
  const loads = useMemo((): LoadsSettings => {
    if (revisionNumber !== undefined) return settingsOrDefault(revision.data?.revision.loads ?? null, library).settings;
    if (!canEdit) return settingsOrDefault(latestRevision.data?.revision.loads ?? null, library).settings;
    return editedLoads ?? settingsOrDefault(loadLocalLoads(designId) ?? savedLoads, library).settings;
  }, [revisionNumber, revision.data, canEdit, latestRevision.data, editedLoads, designId, savedLoads, library]);
  const loadsRequest = useMemo(() => ({ settings: loads, treads: treadsOf(library) }), [loads, library]);

  const unsaved =
    canEdit &&
    revisionNumber === undefined &&
    !!working &&
    !!savedDraft &&
    (!sameSpec(canonical(working), canonical(savedDraft)) ||
      !sameSpec(loads, settingsOrDefault(savedLoads, library).settings));

  const change = (next: DesignSpecInput) => {
    setEdited(next);
    saveLocalDraft(designId, next);
  };
  const changeLoads = (next: LoadsSettings) => {
    setEditedLoads(next);
    saveLocalLoads(designId, next);
  };
  /** After a save: the server's draft is the truth again. */
  const forgetEdits = () => {
    setEdited(null);
    setEditedLoads(null);
  };

  return {
    design,
    revision,
    canEdit,
    readOnly,
    working,
    spec,
    loads,
    loadsRequest,
    unsaved,
    change,
    changeLoads,
    forgetEdits,
  };
}
