import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { formatWhen, STATUS_LABEL } from "@/components/format";
import { MODE_LABELS } from "@/components/studio/spec-form/defaults";
import { AddMemberForm, RemoveMemberButton } from "@/components/member-forms";
import { Badge, Panel } from "@/components/ui/panel";
import { Table } from "@/components/ui/table";
import { listDesigns } from "@/db/queries/designs";
import { listMembers } from "@/db/queries/members";
import { getProjectSummary } from "@/db/queries/projects";
import { listAssignableUsers } from "@/db/queries/users";
import { requirePageUser, requireProjectAccess } from "@/lib/server/dal";
import { AppError } from "@/lib/server/errors";

export const metadata: Metadata = { title: "Project" };

// What each later stage will put here; said plainly, with no sample data.
const COMING = [
  { title: "Client review", text: "The client watches the mock-up, comments, and signs off one frozen revision." },
  { title: "Build log and assembly sheet", text: "Notes, site photos and the printable assembly sheet for the installer." },
];

export default async function ProjectPage({ params }: { params: Promise<{ id: string }> }) {
  await requirePageUser();
  const { id } = await params;
  const access = await requireProjectAccess(/^\d{1,10}$/.test(id) ? Number(id) : -1).catch((e) => {
    if (e instanceof AppError && e.kind === "not_found") notFound();
    throw e;
  });
  const [project, members, designs] = await Promise.all([getProjectSummary(access.projectId), listMembers(access.projectId), listDesigns(access.projectId)]);
  if (!project) notFound();
  const memberIds = new Set(members.map((m) => m.userId));
  const people = access.canManage ? (await listAssignableUsers()).filter((u) => !memberIds.has(u.id)) : [];

  return (
    <>
      <div className="flex flex-wrap items-baseline gap-3">
        <h1 className="text-2xl font-semibold tracking-tight">{project.name}</h1>
        <Badge>{STATUS_LABEL[project.status]}</Badge>
      </div>
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
        <dt className="text-ink-soft">Client</dt>
        <dd>{project.clientOrganisation ?? "—"}</dd>
        <dt className="text-ink-soft">Site</dt>
        <dd>{project.site || "—"}</dd>
        <dt className="text-ink-soft">Last change</dt>
        <dd className="font-mono text-xs">{formatWhen(project.updatedAt)}</dd>
        <dt className="text-ink-soft">Your part</dt>
        <dd>{access.memberRole ?? "admin (not a member)"}</dd>
      </dl>

      <Panel title="Members">
        <Table head={access.canManage ? ["Name", "E-mail", "Role", ""] : ["Name", "E-mail", "Role"]} caption="Members">
          {members.map((m) => (
            <tr key={m.id}>
              <td>
                {m.name}
                {m.active ? null : <span className="ml-2 text-xs text-caution">(deactivated)</span>}
              </td>
              <td className="font-mono text-xs">{m.email}</td>
              <td>{m.role}</td>
              {access.canManage ? (
                <td className="text-right">
                  <RemoveMemberButton projectId={access.projectId} memberId={m.id} name={m.name} />
                </td>
              ) : null}
            </tr>
          ))}
        </Table>
        {access.canManage ? (
          <div className="mt-4 border-t border-paper-edge pt-4">
            <AddMemberForm projectId={access.projectId} people={people} />
          </div>
        ) : null}
      </Panel>

      <Panel
        title="Designs"
        actions={
          access.canManage ? (
            <Link href={`/projects/${access.projectId}/designs/new`} className="text-sm font-medium underline">
              New design
            </Link>
          ) : null
        }
      >
        {designs.length === 0 ? (
          <p className="text-sm text-ink-soft">No designs yet.{access.canManage ? " Start one from a preset or from scratch." : ""}</p>
        ) : (
          <Table head={access.canManage ? ["Design", "Mode", "Latest revision", "Last change", "Cut plan"] : ["Design", "Mode", "Latest revision", "Last change"]} caption="Designs">
            {designs.map((d) => (
              <tr key={d.id}>
                <td>
                  <Link href={`/projects/${access.projectId}/designs/${d.id}`} className="font-medium underline decoration-ink-line underline-offset-2">
                    {d.name}
                  </Link>
                </td>
                <td>{MODE_LABELS[d.mode]}</td>
                <td className="font-mono text-xs">{d.latestRevision ? `R${d.latestRevision}` : "none yet"}</td>
                <td className="font-mono text-xs">{formatWhen(d.updatedAt)}</td>
                {access.canManage ? (
                  <td>
                    {d.latestRevision ? (
                      <Link href={`/projects/${access.projectId}/designs/${d.id}/cut`} className="text-sm underline decoration-ink-line underline-offset-2">
                        Parts and cut files
                      </Link>
                    ) : (
                      <span className="text-xs text-ink-soft">save a revision first</span>
                    )}
                  </td>
                ) : null}
              </tr>
            ))}
          </Table>
        )}
      </Panel>

      <div className="grid gap-4 sm:grid-cols-2">
        {COMING.map((c) => (
          <Panel key={c.title} title={c.title}>
            <p className="text-sm text-ink-soft">Not built yet. {c.text}</p>
          </Panel>
        ))}
      </div>
    </>
  );
}
