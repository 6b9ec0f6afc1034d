// The layout plan of the run, printed to scale: one SVG per strip, its width in millimetres of paper
// (1 : scale), with the datum, the track and its base band, each joint's station, each support, the
// segments' ids and the direction of travel. Stations in mm, and inches beside them if chosen.
import type { SheetRun } from "@/lib/assembly/sheet";
import { planLayout } from "@/lib/assembly/plan-scale";

const INK = "#1d3557";
const SOFT = "#3d5a80";
const FILL = "#ece3cc";

export const station = (mm: number, inches: boolean) => `${mm.toFixed(1)} mm${inches ? ` (${(mm / 25.4).toFixed(2)} in)` : ""}`;

/** Printable width of the plan on the page, mm (A4 less its margins; Letter is a little wider). */
export const PLAN_WIDTH_MM = 180;

export function LayoutPlan({ run, joints, inches }: { run: SheetRun; joints: { station: number; between: [string, string] }[]; inches: boolean }) {
  const layout = planLayout(run.length, PLAN_WIDTH_MM);
  const top = Math.max(...run.profile.map((p) => p[1]));
  const depth = top - run.datumY;
  // Room above the track for station labels and below for support labels, in run mm at this scale.
  const k = layout.scale;
  const above = 16 * k;
  const below = 14 * k;
  return (
    <div className="flex flex-col gap-3" data-testid="layout-plan">
      <p className="text-xs">
        Scale 1 : {k} when printed at 100 % · datum: station 0 at the start of the run, heights from the track parts&apos; bottom edge · the wheel travels left to right.
      </p>
      {layout.strips.map((s, i) => {
        const w = s.to - s.from;
        const h = depth + above + below;
        const inStrip = (x: number) => x >= s.from - 1e-6 && x <= s.to + 1e-6;
        const pts = run.profile.filter((p) => inStrip(p[0]));
        const d = [`M${s.from} ${run.datumY}`, ...pts.map((p) => `L${p[0].toFixed(1)} ${p[1].toFixed(1)}`), `L${s.to} ${run.datumY}`, "Z"].join(" ");
        const font = { fontSize: 2.6 * k, fontFamily: "var(--font-plex-mono), monospace", fill: INK } as const;
        return (
          <figure key={i} className="flex flex-col gap-1 break-inside-avoid">
            <figcaption className="text-xs text-ink-soft">
              Strip {i + 1} of {layout.strips.length}: stations {station(s.from, false)} to {station(s.to, false)}
            </figcaption>
            <svg
              viewBox={`${s.from - 2 * k} ${-(top + above)} ${w + 4 * k} ${h}`}
              style={{ width: `${(w + 4 * k) / k}mm`, maxWidth: "100%", height: "auto" }}
              role="img"
              aria-label={`Layout plan, strip ${i + 1}, to scale 1 : ${k}`}
            >
              <g transform="scale(1,-1)">
                <path d={d} fill={FILL} stroke={INK} strokeWidth={0.25 * k} />
                <line x1={s.from - 2 * k} x2={s.to + 2 * k} y1={run.datumY} y2={run.datumY} stroke={SOFT} strokeWidth={0.2 * k} strokeDasharray={`${2 * k} ${1 * k}`} />
              </g>
              {joints.filter((j) => inStrip(j.station)).map((j) => (
                <g key={j.station} data-joint={j.between.join("/")}>
                  <line x1={j.station} x2={j.station} y1={-(top + 6 * k)} y2={-run.datumY} stroke={INK} strokeWidth={0.3 * k} />
                  <text x={j.station} y={-(top + 8 * k)} textAnchor="middle" {...font}>
                    {station(j.station, inches)}
                  </text>
                  <text x={j.station} y={-(top + 12.5 * k)} textAnchor="middle" {...font} fill={SOFT}>
                    {j.between.join(" | ")}
                  </text>
                </g>
              ))}
              {run.supports.map((x, n) =>
                inStrip(x) ? (
                  <g key={x} data-support={`S${n + 1}`}>
                    <path d={`M${x} ${-run.datumY} l${-1.5 * k} ${3 * k} h${3 * k} Z`} fill={SOFT} />
                    <text x={x} y={-run.datumY + 6.5 * k} textAnchor="middle" {...font}>
                      S{n + 1}
                    </text>
                    <text x={x} y={-run.datumY + 10 * k} textAnchor="middle" {...font} fontSize={2.2 * k} fill={SOFT}>
                      {x.toFixed(0)}
                    </text>
                  </g>
                ) : null,
              )}
              {run.segments.filter((g) => g.x1 > s.from && g.x0 < s.to).map((g) => (
                <text key={g.id} x={(Math.max(g.x0, s.from) + Math.min(g.x1, s.to)) / 2} y={-(run.datumY + depth * 0.35)} textAnchor="middle" {...font} fontWeight={600}>
                  {g.id}
                </text>
              ))}
              {i === 0 ? (
                <g>
                  <path d={`M${s.from + 4 * k} ${-(top + 3 * k)} h${14 * k} l${-2 * k} ${-1.2 * k} m${2 * k} ${1.2 * k} l${-2 * k} ${1.2 * k}`} stroke={INK} strokeWidth={0.3 * k} fill="none" />
                  <text x={s.from + 20 * k} y={-(top + 2.2 * k)} {...font} fontSize={2.2 * k}>
                    travel
                  </text>
                </g>
              ) : null}
            </svg>
          </figure>
        );
      })}
    </div>
  );
}
