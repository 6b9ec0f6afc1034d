import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { LogEntryForm } from "@/components/build-log/log-entry-form";
import { LogList } from "@/components/build-log/log-list";
import { Panel } from "@/components/ui/panel";
import { listLog } from "@/db/queries/build-log";
import { getProjectSummary } from "@/db/queries/projects";
import { PEOPLE_LOG_KINDS } from "@/db/schema";
import { requirePageUser, requireProjectAccess } from "@/lib/server/dal";
import { AppError } from "@/lib/server/errors";

export const metadata: Metadata = { title: "Build log" };

export default async function BuildLogPage({ params }: { params: Promise<{ id: string }> }) {
  await requirePageUser();
  const { id } = await params;
  const access = await requireProjectAccess(/^\d{1,10}$/.test(id) ? Number(id) : -1).catch((e) => {
    if (e instanceof AppError && e.kind === "not_found") notFound();
    throw e;
  });
  const [project, entries] = await Promise.all([
    getProjectSummary(access.projectId),
    listLog(access.projectId, { limit: 300 }),
  ]);
  const writer = access.canManage || access.memberRole === "installer";
  const client = access.memberRole === "client";
  return (
    <>
      <Link href={`/projects/${access.projectId}`} className="no-print text-sm text-ink-soft hover:underline">
        ← {project?.name ?? "Project"}
      </Link>
      <h1 className="text-2xl font-semibold tracking-tight">Build log: {project?.name}</h1>
      {writer || client ? (
        <Panel title={writer ? "Add an entry" : "Add a note"}>
          <LogEntryForm
            projectId={access.projectId}
            kinds={writer ? [...PEOPLE_LOG_KINDS] : ["note"]}
            photos={writer}
          />
        </Panel>
      ) : null}
      <LogList entries={entries} />
    </>
  );
}
