import Link from "next/link";

export default function NotFound() {
  return (
    <main className="mx-auto flex max-w-md flex-col gap-3 px-4 py-16">
      <h1 className="text-xl font-semibold">Not found</h1>
      <p className="text-sm text-ink-soft">
        There is nothing here, or it belongs to a project you are not a member of.
      </p>
      <Link href="/projects" className="text-sm underline">
        Back to projects
      </Link>
    </main>
  );
}
