import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { NewDesignForm } from "@/components/new-design-form";
import { NoAccess } from "@/components/no-access";
import { Panel } from "@/components/ui/panel";
import { MODE_LABELS } from "@/components/studio/spec-form/defaults";
import { requirePageUser, requireProjectAccess } from "@/lib/server/dal";
import { AppError } from "@/lib/server/errors";
import { PRESETS } from "@/lib/studio/presets";

export const metadata: Metadata = { title: "New design" };

export default async function NewDesignPage({ params }: { params: Promise<{ id: string }> }) {
  await requirePageUser();
  const { id } = await params;
  const access = await requireProjectAccess(/^\d{1,10}$/.test(id) ? Number(id) : -1).catch((e) => {
    if (e instanceof AppError && e.kind === "not_found") notFound();
    throw e;
  });
  if (!access.canManage) return <NoAccess what="Only the project's fabricator or an admin creates designs." />;
  return (
    <>
      <h1 className="text-2xl font-semibold tracking-tight">New design</h1>
      <Panel title="Start">
        <NewDesignForm
          projectId={access.projectId}
          presets={PRESETS.map((p) => ({ id: p.id, label: p.label, group: MODE_LABELS[p.spec.mode] }))}
        />
      </Panel>
    </>
  );
}
