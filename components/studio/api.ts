// The studio's calls to the JSON route handlers. Every failure arrives as { status, message }.
import type { RevisionRow } from "@/db/queries/designs";
import type { DesignSpecInput } from "@/lib/track";
import type { LoadsSettings } from "@/lib/validation/loads";

export class ApiError extends Error {
  constructor(
    readonly status: number,
    message: string,
  ) {
    super(message);
  }
}

async function call<T>(url: string, init?: RequestInit): Promise<T> {
  const res = await fetch(url, { ...init, headers: { "content-type": "application/json", ...init?.headers } });
  const body = await res.json().catch(() => null);
  if (!res.ok) throw new ApiError(res.status, body?.message ?? `The server answered ${res.status}.`);
  return body as T;
}

export interface DesignPayload {
  design: { id: number; projectId: number; name: string; mode: string; updatedAt: string; draft?: DesignSpecInput; loads?: unknown };
  revisions: RevisionRow[];
  you: { canEdit: boolean };
}

export const api = {
  design: (id: number) => call<DesignPayload>(`/api/designs/${id}`),
  revision: (id: number) => call<{ revision: RevisionRow & { spec: DesignSpecInput; loads?: unknown }; design: { id: number; name: string; projectId: number } }>(`/api/revisions/${id}`),
  saveDraft: (id: number, draft: DesignSpecInput, loads?: LoadsSettings) => call<unknown>(`/api/designs/${id}`, { method: "PATCH", body: JSON.stringify({ draft, loads }) }),
  saveRevision: (id: number, spec: DesignSpecInput, note: string, loads?: LoadsSettings) =>
    call<{ revision: { id: number; number: number; specHash: string } }>(`/api/designs/${id}/revisions`, { method: "POST", body: JSON.stringify({ spec, note, loads }) }),
};
