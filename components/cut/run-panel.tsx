// The run as it will be built: the three end treatments side by side with what each costs, and a
// drawing of the profile with its cut stations, segments and support holes.
import type { RunPlan } from "@/lib/cut";
import type { PlanForm } from "@/lib/cut-plan/form";
import { Panel } from "@/components/ui/panel";

const mm = (v: number) => `${Number(v.toFixed(1))} mm`;

export function EndTreatments({
  run,
  chosen,
  choose,
}: {
  run: RunPlan;
  chosen: PlanForm["endTreatment"];
  choose: (t: PlanForm["endTreatment"]) => void;
}) {
  const t = run.tile;
  const rows: { key: PlanForm["endTreatment"]; label: string; periods: string; consequence: string }[] = [
    {
      key: "flat",
      label: "Flat run-out",
      periods: String(t.flatRunOut.periods),
      consequence: `${mm(t.flatRunOut.eachEnd)} flat at each end; ${mm(run.extraForNextPeriod)} more run would fit one more period`,
    },
    {
      key: "half",
      label: "Half period",
      periods: String(t.halfPeriod.periods),
      consequence: `${mm(t.halfPeriod.eachEnd)} flat at each end`,
    },
    {
      key: "scale",
      label: "Rescale the wheel",
      periods: String(t.scaled.periods),
      consequence: `everything × ${t.scaled.scale.toFixed(4)}: period ${mm(t.scaled.period)}, wheel radius ${t.scaled.wheelSize === undefined ? "—" : mm(t.scaled.wheelSize)} (${(t.scaled.scale - 1 >= 0 ? "+" : "") + ((t.scaled.scale - 1) * 100).toFixed(2)} %); no flat`,
    },
  ];
  return (
    <fieldset className="flex flex-col gap-1">
      <legend className="mb-1 text-sm font-medium">
        End treatment (whole periods {t.periods}, left over {mm(t.residual)})
      </legend>
      {rows.map((r) => (
        <label
          key={r.key}
          className={`flex cursor-pointer items-start gap-2 rounded-plate border px-2 py-1.5 text-sm ${r.key === chosen ? "border-ink bg-white/70" : "border-ink-line"}`}
        >
          <input
            type="radio"
            name="endTreatment"
            value={r.key}
            checked={r.key === chosen}
            onChange={() => choose(r.key)}
            className="mt-1"
          />
          <span>
            <span className="font-medium">{r.label}</span> — {r.periods} periods;{" "}
            <span className="text-ink-soft">{r.consequence}</span>
          </span>
        </label>
      ))}
    </fieldset>
  );
}

export function RunDrawing({ run }: { run: RunPlan }) {
  const minY = run.baseY;
  const maxY = Math.max(...run.profile.map((p) => p[1]));
  const h = maxY - minY;
  const pad = Math.max(run.runLength * 0.01, h * 0.1);
  const W = run.runLength + 2 * pad;
  const H = h + 2 * pad;
  const stroke = W / 800;
  const sx = (x: number) => x + pad;
  const sy = (y: number) => maxY - y + pad;
  const top = run.profile.map(([x, y]) => `${sx(x).toFixed(1)},${sy(y).toFixed(1)}`).join(" ");
  return (
    <svg
      viewBox={`0 0 ${W} ${H}`}
      className="w-full rounded-plate border border-ink-line bg-white"
      role="img"
      aria-label={`The run: ${run.segments.length} segments, cut at ${run.cuts.map((c) => c.toFixed(0)).join(", ") || "no stations"} mm`}
      data-testid="run-drawing"
      preserveAspectRatio="xMidYMid meet"
      style={{ aspectRatio: `${W} / ${Math.max(H, W / 12)}` }}
    >
      <polygon
        points={`${sx(0)},${sy(minY)} ${top} ${sx(run.runLength)},${sy(minY)}`}
        fill="#e6d8bb"
        stroke="#2d2a24"
        strokeWidth={stroke}
      />
      {run.cuts.map((c) => (
        <line
          key={c}
          x1={sx(c)}
          x2={sx(c)}
          y1={sy(maxY) - pad / 2}
          y2={sy(minY) + pad / 2}
          stroke="#c0392b"
          strokeWidth={stroke * 1.5}
          strokeDasharray={`${stroke * 6} ${stroke * 4}`}
        />
      ))}
      {run.supports.map((x) => (
        <circle key={x} cx={sx(x)} cy={sy(run.centreY)} r={stroke * 4} fill="#2d2a24" />
      ))}
      {run.segments.map((s) => (
        <text
          key={s.id}
          x={sx((s.x0 + s.x1) / 2)}
          y={sy(minY) - h * 0.18}
          fontSize={Math.min(h * 0.3, W / 40)}
          textAnchor="middle"
          fill="#2d2a24"
          className="font-mono"
        >
          {s.id}
        </text>
      ))}
    </svg>
  );
}

/** The run panel: the end treatments, the drawing and the run in figures. */
export function RunPanel({
  run,
  endTreatment,
  choose,
}: {
  run: RunPlan;
  endTreatment: PlanForm["endTreatment"];
  choose: (t: PlanForm["endTreatment"]) => void;
}) {
  return (
    <Panel title="Run">
      <div className="flex flex-col gap-3">
        <EndTreatments run={run} chosen={endTreatment} choose={choose} />
        <RunDrawing run={run} />
        <p className="text-sm" data-testid="run-summary">
          {run.periods} periods of {run.period.toFixed(2)} mm over {run.runLength.toFixed(0)} mm, in{" "}
          {run.segments.length} segments cut at {run.cuts.length ? run.cuts.map((c) => c.toFixed(1)).join(", ") : "—"}{" "}
          mm.
        </p>
      </div>
    </Panel>
  );
}
