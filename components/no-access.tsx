import Link from "next/link";
import { Notice } from "./ui/notice";

export function NoAccess({ what }: { what: string }) {
  return (
    <div className="flex flex-col gap-3">
      <h1 className="text-xl font-semibold">Not available to your role</h1>
      <Notice tone="problem">{what}</Notice>
      <Link href="/projects" className="text-sm underline">
        Back to projects
      </Link>
    </div>
  );
}
