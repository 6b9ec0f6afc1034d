import type { Metadata } from "next";
import Image from "next/image";
import { redirect } from "next/navigation";
import { SignInForm } from "@/components/sign-in-form";
import { getCurrentUser } from "@/lib/server/dal";

export const metadata: Metadata = { title: "Sign in" };

export default async function LoginPage({ searchParams }: { searchParams: Promise<{ callbackUrl?: string }> }) {
  if (await getCurrentUser()) redirect("/projects");
  const { callbackUrl } = await searchParams;
  let path = "/projects";
  try {
    // Keep only a path on this site, never another origin.
    if (callbackUrl) {
      const url = new URL(callbackUrl, "http://local");
      path = url.pathname + url.search;
    }
  } catch {
    /* keep the default */
  }
  return (
    <main className="mx-auto flex min-h-screen max-w-sm flex-col justify-center gap-6 px-4">
      <div className="flex items-center gap-3">
        <Image src="/logo.svg" alt="" width={64} height={40} priority />
        <div>
          <h1 className="text-2xl font-semibold tracking-tight">Axlewright</h1>
          <p className="text-sm text-ink-soft">Wheels and tracks that roll level.</p>
        </div>
      </div>
      <div className="rounded-plate border border-paper-edge bg-paper p-5 shadow-sheet">
        <SignInForm callbackUrl={path} />
      </div>
    </main>
  );
}
