import type { Metadata } from "next";
import Link from "next/link";
import { formatWhen, STATUS_LABEL } from "@/components/format";
import { NewProjectForm } from "@/components/new-project-form";
import { Notice } from "@/components/ui/notice";
import { Badge, Panel } from "@/components/ui/panel";
import { Table } from "@/components/ui/table";
import { listVisibleProjects } from "@/db/queries/projects";
import { requirePageUser } from "@/lib/server/dal";

export const metadata: Metadata = { title: "Projects" };

export default async function ProjectsPage() {
  const user = await requirePageUser();
  const projects = await listVisibleProjects(user);
  const canCreate = user.role === "admin" || user.role === "fabricator";
  return (
    <>
      <h1 className="text-2xl font-semibold tracking-tight">Projects</h1>
      <Panel title={user.role === "admin" ? "All projects" : "Your projects"}>
        {projects.length === 0 ? (
          <Notice>You are not a member of any project yet. The shop adds you to the projects you work on.</Notice>
        ) : (
          <Table head={["Project", "Status", "Client", "Site", "Last change"]} caption="Projects">
            {projects.map((p) => (
              <tr key={p.id}>
                <td>
                  <Link
                    href={`/projects/${p.id}`}
                    className="font-medium underline decoration-ink-line underline-offset-2 hover:decoration-ink"
                  >
                    {p.name}
                  </Link>
                </td>
                <td>
                  <Badge>{STATUS_LABEL[p.status]}</Badge>
                </td>
                <td>{p.clientOrganisation ?? "—"}</td>
                <td>{p.site || "—"}</td>
                <td className="font-mono text-xs">{formatWhen(p.updatedAt)}</td>
              </tr>
            ))}
          </Table>
        )}
      </Panel>
      {canCreate ? (
        <Panel title="New project">
          <NewProjectForm />
        </Panel>
      ) : null}
    </>
  );
}
