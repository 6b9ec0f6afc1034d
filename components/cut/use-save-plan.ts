"use client";
// Saving a nest as the revision's next cut plan: the server checks it again before one insert.
import { useMutation } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { postJson } from "@/components/api/request-json";
import type { PlanChoice } from "@/lib/cut-plan/compose";
import type { SheetNestResult } from "@/lib/nest/types";

export interface SaveIntent {
  purpose: "review" | "production";
  reason?: string;
}

export interface SavedPlanAnswer {
  cutPlan: { id: number; number: number; summary: { sheets: number; utilisation: number } };
}

export function useSavePlan(revisionId: number) {
  const router = useRouter();
  return useMutation({
    mutationFn: ({ choice, nest, intent }: { choice: PlanChoice; nest: SheetNestResult; intent: SaveIntent }) =>
      postJson<SavedPlanAnswer>(`/api/revisions/${revisionId}/cut-plans`, { ...choice, nest, ...intent }),
    onSuccess: () => router.refresh(),
  });
}
