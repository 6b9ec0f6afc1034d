import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { Notice } from "@/components/ui/notice";
import { Panel } from "@/components/ui/panel";
import { Table } from "@/components/ui/table";
import { revisionByNumber } from "@/db/queries/designs";
import { requireDesignAccess, requirePageUser } from "@/lib/server/dal";
import { AppError } from "@/lib/server/errors";
import { checkFigures } from "@/components/studio/view/check-figures";
import type { Pt, SolveResult } from "@/lib/track";
import { solveStored } from "@/lib/server/designs";

export const metadata: Metadata = { title: "Compare revisions" };

// The design's dimensions in the studio's words; the rolling check's figures come from the studio's own
// list (checkFigures), so both pages name and format them alike.
const DIMENSIONS: { label: string; get: (r: SolveResult) => number | undefined }[] = [
  { label: "Period (one hump to the next)", get: (r) => r.period },
  { label: "Track depth", get: (r) => r.depth },
  { label: "Axle height", get: (r) => r.axleHeight },
  { label: "Centre distance", get: (r) => r.centreDistance },
  { label: "Wheel radius, smallest", get: (r) => r.wheel.rMin },
  { label: "Wheel radius, largest", get: (r) => r.wheel.rMax },
];

function fmt(v: number | undefined, unit: string): string {
  if (v === undefined) return "—";
  const s = Math.abs(v) !== 0 && (Math.abs(v) < 1e-3 || Math.abs(v) >= 1e6) ? v.toExponential(3) : v.toFixed(3);
  return `${s} ${unit}`;
}

/** Rows of figures for both revisions: dimensions first, then the rolling check, matched by key. */
function figureRows(results: SolveResult[]): { key: string; label: string; values: string[]; differs: boolean }[] {
  const units = results[0].units;
  const rows = DIMENSIONS.flatMap((f) => {
    const v = results.map(f.get);
    if (v.every((x) => x === undefined)) return [];
    const [x, y] = v;
    const differs = x !== undefined && y !== undefined && Math.abs(x - y) > 1e-9 * Math.max(1, Math.abs(x));
    return [{ key: f.label, label: f.label, values: v.map((x) => fmt(x, units)), differs }];
  });
  const checks = results.map(checkFigures);
  const keys = [...new Set(checks.flatMap((c) => c.map((f) => f.key)))];
  for (const key of keys) {
    const pair = checks.map((c) => c.find((f) => f.key === key));
    const values = pair.map((f) => f?.value ?? "—");
    rows.push({ key, label: (pair[0] ?? pair[1])!.label, values, differs: values[0] !== values[1] });
  }
  return rows;
}

function d(points: Pt[], dy = 0): string {
  return points.map(([x, y], i) => `${i ? "L" : "M"}${x.toFixed(2)} ${(-(y + dy)).toFixed(2)}`).join(" ") + " Z";
}

export default async function ComparePage({
  params,
  searchParams,
}: {
  params: Promise<{ id: string; designId: string }>;
  searchParams: Promise<{ a?: string; b?: string }>;
}) {
  await requirePageUser();
  const { designId } = await params;
  const { a, b } = await searchParams;
  const access = await requireDesignAccess(/^\d{1,10}$/.test(designId) ? Number(designId) : -1).catch((e) => {
    if (e instanceof AppError && e.kind === "not_found") notFound();
    throw e;
  });
  const numbers = [a, b].map((n) => (n && /^\d{1,6}$/.test(n) ? Number(n) : NaN));
  const rows = await Promise.all(
    numbers.map((n) => (Number.isFinite(n) ? revisionByNumber(access.design.id, n) : null)),
  );
  const base = `/projects/${access.projectId}/designs/${access.design.id}`;
  if (!rows[0] || !rows[1]) {
    return (
      <>
        <h1 className="text-2xl font-semibold">Compare revisions</h1>
        <Notice tone="problem">Choose two saved revisions of this design to compare.</Notice>
        <Link href={base} className="text-sm underline">
          Back to the studio
        </Link>
      </>
    );
  }
  const results = await Promise.all(rows.map((r) => solveStored(r!.spec)));
  const all = results.flatMap((r) => r.wheel.points.map(([x, y]) => [x, y] as Pt));
  const extent = Math.max(...all.map(([x, y]) => Math.hypot(x, y))) * 1.1;
  return (
    <>
      <Link href={base} className="no-print text-sm text-ink-soft hover:underline">
        ← Studio
      </Link>
      <h1 className="text-2xl font-semibold tracking-tight">
        {access.design.name}: R{rows[0].number} and R{rows[1].number}
      </h1>
      <div className="grid gap-4 lg:grid-cols-2">
        <Panel title="Figures">
          <Table head={["", `R${rows[0].number}`, `R${rows[1].number}`]} caption="Figures side by side">
            {figureRows(results).map((f) => (
              <tr key={f.key} className={f.differs ? "bg-paper-deep" : ""}>
                <td>{f.label}</td>
                <td className="font-mono text-xs">{f.values[0]}</td>
                <td className="font-mono text-xs">{f.values[1]}</td>
              </tr>
            ))}
            <tr>
              <td>Note</td>
              <td className="text-xs">{rows[0].note || "—"}</td>
              <td className="text-xs">{rows[1].note || "—"}</td>
            </tr>
          </Table>
        </Panel>
        <Panel title="Wheel outlines overlaid">
          <svg
            viewBox={`${-extent} ${-extent} ${2 * extent} ${2 * extent}`}
            className="h-80 w-full"
            role="img"
            aria-label={`Wheel of R${rows[0].number} in solid ink, R${rows[1].number} dashed`}
          >
            <line x1={-extent} x2={extent} y1={0} y2={0} stroke="#c4cfdc" strokeWidth={extent / 400} />
            <line y1={-extent} y2={extent} x1={0} x2={0} stroke="#c4cfdc" strokeWidth={extent / 400} />
            <path d={d(results[0].wheel.points)} fill="none" stroke="#1d3557" strokeWidth={extent / 150} />
            <path
              d={d(results[1].wheel.points)}
              fill="none"
              stroke="#3d5a80"
              strokeWidth={extent / 150}
              strokeDasharray={`${extent / 40} ${extent / 60}`}
            />
            <circle r={extent / 80} fill="#1d3557" />
          </svg>
          <p className="text-xs text-ink-soft">
            Solid: R{rows[0].number}. Dashed: R{rows[1].number}. Both with the axle at the centre, in their start pose.
          </p>
        </Panel>
      </div>
    </>
  );
}
