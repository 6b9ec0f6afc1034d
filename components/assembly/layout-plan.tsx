// The layout plan of the run, printed to scale: one SVG per strip, built by makerjs
// (lib/assembly/plan-svg.ts), its width in millimetres of paper (1 : scale), with the datum, the
// track parts and their base band, each joint's station, each support, the parts' ids and the
// direction of travel. Stations in mm, and inches beside them if chosen.
import type { SheetRun } from "@/lib/assembly/sheet";
import { planLayout } from "@/lib/assembly/plan-scale";
import { stripSvg } from "@/lib/assembly/plan-svg";

export const station = (mm: number, inches: boolean) =>
  `${mm.toFixed(1)} mm${inches ? ` (${(mm / 25.4).toFixed(2)} in)` : ""}`;

/** Printable width of the plan on the page, mm (A4 less its margins; Letter is a little wider). */
export const PLAN_WIDTH_MM = 180;

export function LayoutPlan({
  run,
  joints,
  inches,
}: {
  run: SheetRun;
  joints: { station: number; between: [string, string] }[];
  inches: boolean;
}) {
  const layout = planLayout(run.length, PLAN_WIDTH_MM);
  const k = layout.scale;
  return (
    <div className="flex flex-col gap-3" data-testid="layout-plan">
      <p className="text-xs">
        Scale 1 : {k} when printed at 100 % · datum: station 0 at the start of the run, heights from the track
        parts&apos; bottom edge · the wheel travels left to right.
      </p>
      {layout.strips.map((s, i) => (
        <figure key={i} className="flex flex-col gap-1 break-inside-avoid">
          <figcaption className="text-xs text-ink-soft">
            Strip {i + 1} of {layout.strips.length}: stations {station(s.from, false)} to {station(s.to, false)}
          </figcaption>
          {/* makerjs writes the SVG from our own numbers and ids, with every caption's text escaped. */}
          <div
            dangerouslySetInnerHTML={{
              __html: stripSvg({
                run,
                joints,
                range: { x0: s.from, x1: s.to },
                scale: k,
                first: i === 0,
                station: (mm) => station(mm, inches),
                label: `Layout plan, strip ${i + 1}, to scale 1 : ${k}`,
              }),
            }}
          />
        </figure>
      ))}
    </div>
  );
}
