"use client";
// Saving the working spec as the design's next revision: the draft first (so a reload shows what was
// saved), then the revision, then the browser's copies are dropped and the design is fetched again.
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { clearLocalDraft, clearLocalLoads } from "@/lib/studio/local-draft";
import type { DesignSpecInput } from "@/lib/track";
import type { LoadsSettings } from "@/lib/validation/loads";
import { api } from "./api";

export function useSaveRevision(designId: number, onSaved: () => void) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ spec, note, loads }: { spec: DesignSpecInput; note: string; loads: LoadsSettings }) => {
      await api.saveDraft(designId, spec, loads);
      return (await api.saveRevision(designId, spec, note, loads)).revision;
    },
    onSuccess: async () => {
      clearLocalDraft(designId);
      clearLocalLoads(designId);
      await queryClient.invalidateQueries({ queryKey: ["design", designId] });
      onSaved();
    },
  });
}
