import type { Metadata } from "next";
import { NoAccess } from "@/components/no-access";
import { Badge, Panel } from "@/components/ui/panel";
import { Table } from "@/components/ui/table";
import { ActiveToggle, NewUserForm, RoleSelect } from "@/components/user-forms";
import { listUsers } from "@/db/queries/users";
import { requirePageUser } from "@/lib/server/dal";

export const metadata: Metadata = { title: "People" };

export default async function UsersPage() {
  const user = await requirePageUser();
  if (user.role !== "admin") return <NoAccess what="Only an admin manages people and roles." />;
  const people = await listUsers();
  return (
    <>
      <h1 className="text-2xl font-semibold tracking-tight">People</h1>
      <Panel title="Accounts">
        <Table head={["Name", "E-mail", "Organisation", "Role", "Status", ""]} caption="Accounts">
          {people.map((p) => (
            <tr key={p.id} data-testid={`user-${p.email}`}>
              <td>{p.name}</td>
              <td className="font-mono text-xs">{p.email}</td>
              <td>{p.organisation ?? "—"}</td>
              <td>
                <RoleSelect userId={p.id} role={p.role} name={p.name} />
              </td>
              <td>{p.active ? <Badge tone="pass">active</Badge> : <Badge tone="caution">deactivated</Badge>}</td>
              <td>
                {p.id === user.id ? (
                  <span className="text-xs text-ink-soft">you</span>
                ) : (
                  <ActiveToggle userId={p.id} active={p.active} name={p.name} />
                )}
              </td>
            </tr>
          ))}
        </Table>
      </Panel>
      <Panel title="Add a person">
        <NewUserForm />
      </Panel>
    </>
  );
}
