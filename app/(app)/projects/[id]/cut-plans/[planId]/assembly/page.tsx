import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { InstallProgress, InstallTicks, TickBox } from "@/components/assembly/install-ticks";
import { LayoutPlan, station } from "@/components/assembly/layout-plan";
import { PrintButton } from "@/components/assembly/print-button";
import { CautionList } from "@/components/review/caution-list";
import { formatWhen } from "@/components/format";
import { Table } from "@/components/ui/table";
import { PAPER_SIZES, type Paper } from "@/lib/assembly/sheet";
import { cutPlanName } from "@/lib/cut-plan/name";
import { assemblySheetFor, bumpLimitParam, requireSheetAccess } from "@/lib/server/assembly";
import { requirePageUser } from "@/lib/server/dal";
import { AppError } from "@/lib/server/errors";
import { ticksOf } from "@/lib/server/installation-ticks";

export const metadata: Metadata = { title: "Assembly sheet" };

const pm = (mm: number, inches: boolean) => `± ${mm.toFixed(2)} mm${inches ? ` (± ${(mm / 25.4).toFixed(3)} in)` : ""}`;

function Section({
  n,
  title,
  children,
  breakBefore,
}: {
  n: number;
  title: string;
  children: React.ReactNode;
  breakBefore?: boolean;
}) {
  return (
    <section
      className={`flex flex-col gap-2 ${breakBefore ? "print-break-before" : ""}`}
      aria-labelledby={`sheet-${n}`}
    >
      <h2 id={`sheet-${n}`} className="border-b-2 border-ink pb-1 text-base font-semibold">
        {n}. {title}
      </h2>
      {children}
    </section>
  );
}

export default async function AssemblySheetPage({
  params,
  searchParams,
}: {
  params: Promise<{ id: string; planId: string }>;
  searchParams: Promise<{ paper?: string; units?: string; limit?: string }>;
}) {
  await requirePageUser();
  const { id, planId } = await params;
  const q = await searchParams;
  const access = await requireSheetAccess(/^\d{1,10}$/.test(planId) ? Number(planId) : -1).catch((e) => {
    if (e instanceof AppError && e.kind === "not_found") notFound();
    throw e;
  });
  if (String(access.projectId) !== id) notFound();
  const paper: Paper = q.paper === "letter" ? "letter" : "a4";
  const inchesAsked = q.units === "in" ? true : q.units === "mm" ? false : undefined;
  // A limit out of range falls back to the default rather than failing the page; the form says the range.
  const bumpLimit = (() => {
    try {
      return bumpLimitParam(q.limit);
    } catch {
      return undefined;
    }
  })();
  const [sheet, ticks] = await Promise.all([
    assemblySheetFor(access.plan, access, { inches: inchesAsked, bumpLimit }),
    ticksOf(access),
  ]);
  const inches = sheet.inches;
  const canTick = access.canManage || access.memberRole === "installer";
  const base = `/projects/${access.projectId}/cut-plans/${access.plan.id}/assembly`;
  const limitQuery = bumpLimit !== undefined ? `&limit=${bumpLimit}` : "";
  const link = (o: { paper?: Paper; units?: "mm" | "in" }) =>
    `${base}?paper=${o.paper ?? paper}&units=${o.units ?? (inches ? "in" : "mm")}${limitQuery}`;
  const pdf = `/api/cut-plans/${access.plan.id}/assembly-sheet?paper=${paper}&units=${inches ? "in" : "mm"}${limitQuery}`;
  const initial = {
    done: Object.fromEntries(ticks.items.map((i) => [i.item, i.done])),
    installed: ticks.installed,
    total: ticks.total,
  };

  return (
    <article className="assembly-sheet flex flex-col gap-6 text-sm" data-testid="assembly-sheet" data-paper={paper}>
      {/* The paper the browser prints on, as chosen here (CSS Paged Media, @page size). */}
      <style>{`@page { size: ${paper === "letter" ? "letter" : "A4"} portrait; margin: 12mm; } @media print { main { max-width: none; padding: 0; } }`}</style>
      <div className="no-print flex flex-wrap items-center gap-3 rounded-plate border border-ink-line bg-white/60 px-3 py-2">
        <Link href={`/projects/${access.projectId}`} className="text-ink-soft hover:underline">
          ← Project
        </Link>
        <span className="text-ink-soft">Paper:</span>
        {(Object.keys(PAPER_SIZES) as Paper[]).map((p) => (
          <Link
            key={p}
            href={link({ paper: p })}
            aria-current={p === paper ? "page" : undefined}
            className={p === paper ? "font-semibold" : "underline"}
          >
            {PAPER_SIZES[p].name}
          </Link>
        ))}
        <span className="text-ink-soft">Units:</span>
        <Link href={link({ units: "mm" })} className={!inches ? "font-semibold" : "underline"}>
          mm
        </Link>
        <Link href={link({ units: "in" })} className={inches ? "font-semibold" : "underline"}>
          mm and inches
        </Link>
        <form method="get" className="flex items-center gap-1">
          <input type="hidden" name="paper" value={paper} />
          <input type="hidden" name="units" value={inches ? "in" : "mm"} />
          <label htmlFor="bump-limit" className="text-ink-soft">
            Bump limit (mm)
          </label>
          <input
            id="bump-limit"
            name="limit"
            inputMode="decimal"
            defaultValue={sheet.tolerance.bumpLimit}
            className="w-16 rounded-plate border border-ink-line bg-white/70 px-1.5 py-0.5 font-mono"
            title="0.1 to 10 mm"
          />
          <button type="submit" className="underline">
            Apply
          </button>
        </form>
        <span className="flex-1" />
        <PrintButton />
        <a
          href={pdf}
          className="rounded-plate border border-ink bg-ink px-3 py-1.5 font-medium text-paper"
          data-testid="download-pdf"
          download
        >
          Download PDF
        </a>
      </div>

      <header className="flex flex-col gap-1 border-b-4 border-ink pb-3">
        <p className="font-mono text-xs uppercase tracking-wider text-ink-soft">
          Assembly sheet · {cutPlanName(sheet.cutPlanNumber, sheet.design.revision, { midSentence: true })}
        </p>
        <h1 className="text-2xl font-semibold tracking-tight">{sheet.project.name}</h1>
        <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-0.5">
          <dt className="text-ink-soft">Site</dt>
          <dd>{sheet.project.site || "—"}</dd>
          <dt className="text-ink-soft">Client</dt>
          <dd>{sheet.project.client ?? "—"}</dd>
          <dt className="text-ink-soft">Design</dt>
          <dd>
            {sheet.design.name} <span className="font-mono">R{sheet.design.revision}</span> · fingerprint{" "}
            <span className="font-mono">{sheet.design.specHash.slice(0, 12)}</span>
          </dd>
          <dt className="text-ink-soft">Sign-off</dt>
          <dd data-testid="sheet-approval">
            {sheet.approval ? (
              <>
                <span className="font-mono">{sheet.approval.reference}</span> by {sheet.approval.typedName}
                {sheet.approval.organisation ? `, ${sheet.approval.organisation}` : ""}
              </>
            ) : (
              <span className="rounded-plate border-2 border-caution px-2 py-0.5 font-bold text-caution-ink">
                NOT APPROVED — FOR REVIEW ONLY
              </span>
            )}
          </dd>
          <dt className="text-ink-soft">Date</dt>
          <dd className="font-mono text-xs">{formatWhen(sheet.date)}</dd>
          <dt className="text-ink-soft">Shop</dt>
          <dd>
            {sheet.shop.name} · {sheet.shop.contact}
          </dd>
        </dl>
      </header>

      <Section n={1} title="Cautions">
        <CautionList cautions={sheet.cautions} />
        <p className="text-xs">{sheet.disclaimer}</p>
      </Section>

      <InstallTicks cutPlanId={sheet.cutPlanId} initial={initial} canTick={canTick}>
        <div className="no-print">
          <InstallProgress />
        </div>

        {sheet.run ? (
          <Section n={2} title="Layout plan" breakBefore>
            <LayoutPlan run={sheet.run} joints={sheet.joints} inches={inches} />
            <p className="text-xs text-ink-soft">
              Run {station(sheet.run.length, inches)}: {sheet.run.periods} periods of {station(sheet.run.period, false)}
              {sheet.run.eachEnd > 0.5 ? `, ${station(sheet.run.eachEnd, false)} flat at each end` : ""}.
            </p>
          </Section>
        ) : (
          <Section n={2} title="Layout plan">
            <p>This design is a pair of wheels on fixed axles: there is no track run to lay out.</p>
          </Section>
        )}

        <Section n={3} title="Parts" breakBefore>
          <Table head={["Part", "Name", "Material", "Qty", "Cut from sheet", "Installed"]} caption="Parts">
            {sheet.parts.map((p) => (
              <tr key={p.id} data-testid={`sheet-part-${p.id}`}>
                <td className="font-mono font-semibold">{p.id}</td>
                <td>{p.name}</td>
                <td>{p.material}</td>
                <td className="font-mono">{p.quantity}</td>
                <td className="font-mono">{p.sheets.length ? p.sheets.join(", ") : "—"}</td>
                <td>
                  <TickBox item={p.id} label={`Part ${p.id}`} />
                </td>
              </tr>
            ))}
          </Table>
        </Section>

        <Section n={4} title="Order of assembly, joints, fasteners and tools">
          <ol className="list-decimal pl-5">
            {sheet.steps.map((s, i) => (
              <li key={i}>{s}</li>
            ))}
          </ol>
          {sheet.joints.length ? (
            <Table head={["Joint", "Station", "Joint kind", "Installed"]} caption="Joint schedule">
              {sheet.joints.map((j) => (
                <tr key={j.station}>
                  <td className="font-mono font-semibold">{j.between.join("/")}</td>
                  <td className="font-mono">{station(j.station, inches)}</td>
                  <td>{j.detail}</td>
                  <td>
                    <TickBox item={j.between.join("/")} label={`Joint ${j.between.join("/")}`} />
                  </td>
                </tr>
              ))}
            </Table>
          ) : null}
          <div className="grid gap-3 sm:grid-cols-2">
            <div>
              <h3 className="font-semibold">Fasteners</h3>
              <ul className="list-disc pl-5">
                {sheet.fasteners.map((f) => (
                  <li key={f}>{f}</li>
                ))}
              </ul>
            </div>
            <div>
              <h3 className="font-semibold">Tools</h3>
              <ul className="list-disc pl-5">
                {sheet.tools.map((t) => (
                  <li key={t}>{t}</li>
                ))}
              </ul>
            </div>
          </div>
        </Section>

        {sheet.levels.length ? (
          <Section n={5} title="Level and position" breakBefore>
            <p className="text-xs">
              Heights of the track&apos;s top above the datum. Each row&apos;s tolerance is how far a joint may sit off
              its station, or a support sit low, before the axle bumps by more than {sheet.tolerance.bumpLimit} mm.{" "}
              {sheet.tolerance.method}
            </p>
            <Table head={["Item", "Station", "Top above datum", "Tolerance", "Checked"]} caption="Level and position">
              {sheet.levels.map((r) => (
                <tr key={`${r.what}-${r.label}`} data-testid={`level-${r.label}`}>
                  <td className="font-mono">
                    {r.label}{" "}
                    <span className="font-sans text-xs text-ink-soft">
                      {r.what === "joint" ? "joint, along the run" : "support, low"}
                    </span>
                  </td>
                  <td className="font-mono">{station(r.station, inches)}</td>
                  <td className="font-mono">{station(r.topHeight, inches)}</td>
                  <td className="font-mono">{pm(r.tolerance, inches)}</td>
                  <td>
                    <span className="inline-block size-3.5 border border-ink align-middle" aria-hidden />
                  </td>
                </tr>
              ))}
            </Table>
          </Section>
        ) : null}
      </InstallTicks>

      <Section n={6} title="Installer's sign-off">
        <div className="grid gap-4 sm:grid-cols-2" data-testid="installer-sign-off">
          {["Installed by", "Date", "Checked level (largest deviation found)", "Signature"].map((label) => (
            <div key={label} className="flex flex-col gap-6">
              <span className="text-xs text-ink-soft">{label}</span>
              <span className="border-b border-ink" />
            </div>
          ))}
        </div>
      </Section>
      <p className="print-only text-xs text-ink-soft">
        {sheet.project.name} · {sheet.design.name} R{sheet.design.revision} ·{" "}
        {sheet.approval ? `approved ${sheet.approval.reference}` : "NOT APPROVED"} ·{" "}
        {cutPlanName(sheet.cutPlanNumber, sheet.design.revision, { midSentence: true })}
      </p>
    </article>
  );
}
