import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { DesignStudio } from "@/components/studio/design-studio";
import { requireDesignAccess, requirePageUser } from "@/lib/server/dal";
import { AppError } from "@/lib/server/errors";
import { libraryMaterials } from "@/lib/server/loads";

export const metadata: Metadata = { title: "Studio" };

export default async function StudioPage({
  params,
  searchParams,
}: {
  params: Promise<{ id: string; designId: string }>;
  searchParams: Promise<{ revision?: string }>;
}) {
  await requirePageUser();
  const { id, designId } = await params;
  const { revision } = await searchParams;
  const access = await requireDesignAccess(/^\d{1,10}$/.test(designId) ? Number(designId) : -1).catch((e) => {
    if (e instanceof AppError && e.kind === "not_found") notFound();
    throw e;
  });
  if (String(access.projectId) !== id) notFound();
  const revisionNumber = revision && /^\d{1,6}$/.test(revision) ? Number(revision) : undefined;
  // The library rows the loads panel offers (plain figures only: no ids, dates or sources cross to the browser).
  const library = (await libraryMaterials()).map(
    ({ name, kind, thicknessMm, densityKgM3, modulusGpa, poisson, allowableMpa, frictionStatic }) => ({
      name,
      kind,
      thicknessMm,
      densityKgM3,
      modulusGpa,
      poisson,
      allowableMpa,
      frictionStatic,
    }),
  );
  return (
    <>
      <div className="no-print flex gap-4 text-sm">
        <Link href={`/projects/${access.projectId}`} className="text-ink-soft hover:underline">
          ← Project
        </Link>
        {access.canManage ? (
          <Link
            href={`/projects/${access.projectId}/designs/${access.design.id}/cut`}
            className="text-ink-soft hover:underline"
          >
            Cut plan →
          </Link>
        ) : null}
      </div>
      {/* The studio uses the whole width of the screen, not the reading width of other pages. */}
      <div className="relative left-1/2 w-[min(110rem,calc(100vw-2rem))] -translate-x-1/2">
        <DesignStudio
          designId={access.design.id}
          projectId={access.projectId}
          revisionNumber={revisionNumber}
          library={library}
        />
      </div>
    </>
  );
}
