import { QueryProvider } from "@/components/api/query-provider";
import { AppHeader } from "@/components/app-header";
import { SessionKeeper } from "@/components/session-keeper";
import { requirePageUser } from "@/lib/server/dal";

export default async function AppLayout({ children }: { children: React.ReactNode }) {
  // Layouts are not a safe place for access checks (pages check again); this only draws the header.
  const user = await requirePageUser();
  return (
    <>
      <AppHeader user={user} />
      <SessionKeeper />
      {/* Every client call to the API goes through react-query: one client for all signed-in pages. */}
      <QueryProvider>
        <main className="mx-auto flex max-w-6xl flex-col gap-6 px-4 py-6">{children}</main>
      </QueryProvider>
    </>
  );
}
