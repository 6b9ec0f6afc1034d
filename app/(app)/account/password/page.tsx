import type { Metadata } from "next";
import { PasswordForm } from "@/components/password-form";
import { Panel } from "@/components/ui/panel";
import { requirePageUser } from "@/lib/server/dal";

export const metadata: Metadata = { title: "Change password" };

export default async function ChangePasswordPage() {
  const user = await requirePageUser();
  return (
    <>
      <h1 className="text-2xl font-semibold tracking-tight">Change password</h1>
      <Panel title={`Account: ${user.email}`}>
        <PasswordForm />
      </Panel>
    </>
  );
}
