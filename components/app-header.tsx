import Image from "next/image";
import Link from "next/link";
import { signOutAction } from "@/lib/actions/auth";
import type { CurrentUser } from "@/lib/server/dal";
import { roleLabel } from "@/lib/labels";
import { Badge } from "./ui/panel";

export function AppHeader({ user }: { user: CurrentUser }) {
  return (
    <header className="no-print border-b border-paper-edge bg-paper/95">
      <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-6 gap-y-1 px-4 py-2">
        <Link href="/projects" className="flex items-center gap-2 font-semibold tracking-tight">
          <Image src="/logo.svg" alt="" width={40} height={25} />
          Axlewright
        </Link>
        <nav aria-label="Main" className="flex gap-4 text-sm">
          <Link href="/projects" className="hover:underline">
            Projects
          </Link>
          {user.role === "admin" || user.role === "fabricator" ? (
            <Link href="/shop" className="hover:underline">
              Shop library
            </Link>
          ) : null}
          {user.role === "admin" ? (
            <Link href="/admin/users" className="hover:underline">
              People
            </Link>
          ) : null}
        </nav>
        <div className="ml-auto flex items-center gap-3 text-sm">
          <span data-testid="current-user" className="whitespace-nowrap">
            {user.name} <Badge>{roleLabel(user.role)}</Badge>
          </span>
          <Link href="/account/password" className="whitespace-nowrap text-ink-soft hover:underline">
            Change password
          </Link>
          <form action={signOutAction}>
            <button type="submit" className="whitespace-nowrap text-ink-soft hover:underline">
              Sign out
            </button>
          </form>
        </div>
      </div>
    </header>
  );
}
