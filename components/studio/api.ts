// The studio's calls to the JSON route handlers, through the one client helper
// (components/api/request-json.ts): every failure arrives as an ApiError { status, message }.
import { requestJson } from "@/components/api/request-json";
import type { RevisionRow } from "@/db/queries/designs";
import type { DesignSpecInput } from "@/lib/track";
import type { LoadsSettings } from "@/lib/validation/loads";

export interface DesignPayload {
  design: {
    id: number;
    projectId: number;
    name: string;
    mode: string;
    updatedAt: string;
    draft?: DesignSpecInput;
    loads?: unknown;
  };
  revisions: RevisionRow[];
  you: { canEdit: boolean };
}

export const api = {
  design: (id: number) => requestJson<DesignPayload>(`/api/designs/${id}`),
  revision: (id: number) =>
    requestJson<{
      revision: RevisionRow & { spec: DesignSpecInput; loads?: unknown };
      design: { id: number; name: string; projectId: number };
    }>(`/api/revisions/${id}`),
  saveDraft: (id: number, draft: DesignSpecInput, loads?: LoadsSettings) =>
    requestJson<unknown>(`/api/designs/${id}`, { method: "PATCH", body: { draft, loads } }),
  saveRevision: (id: number, spec: DesignSpecInput, note: string, loads?: LoadsSettings) =>
    requestJson<{ revision: { id: number; number: number; specHash: string } }>(`/api/designs/${id}/revisions`, {
      method: "POST",
      body: { spec, note, loads },
    }),
};
