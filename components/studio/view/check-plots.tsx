"use client";

import type { SolvedGeometry } from "@/lib/track";
import {
  curvatureSeries,
  outlineFrictionSeries,
  robustMax,
  speedRatioSeries,
  trackFrictionSeries,
  twinRatioSeries,
  bodyAngle,
  type Series,
} from "@/lib/studio/view-math";
import { Panel } from "@/components/ui/panel";
import { FRICTION_GUIDE } from "./check-figures";
import { LinePlot } from "./line-plot";

interface PlotSpec {
  key: string;
  title: string;
  series: Series;
  xLabel: string;
  yLabel: string;
  xDomain: [number, number];
  guide?: { y: number; label: string };
  clip?: number;
  clipNote?: string;
}

/** A clip level for curvature: a corner reads as a huge spike, so scale to the smooth rest. */
function curvatureClip(s: Series): number | undefined {
  const m = robustMax(s.y, 0.03);
  const top = Math.max(...s.y.map(Math.abs));
  return top > 4 * m && m > 0 ? 2 * m : undefined;
}

/** The plots for a result, all read off the engine's own polylines and tables (lib/studio/view-math). */
export function plotsFor(r: SolvedGeometry): PlotSpec[] {
  const u = r.units;
  if (r.mode === "partner-wheel") {
    const sector = (2 * Math.PI) / Math.max(1, r.wheel.symmetry);
    const dom: [number, number] = [0, sector];
    const curv = curvatureSeries(r.wheel.points, bodyAngle);
    const inSector = { x: [] as number[], y: [] as number[] };
    curv.x.forEach((x, i) => {
      if (x < sector) {
        inSector.x.push(x);
        inSector.y.push(curv.y[i]);
      }
    });
    const order = inSector.x.map((_, i) => i).sort((a, b) => inSector.x[a] - inSector.x[b]);
    const sorted = { x: order.map((i) => inSector.x[i]), y: order.map((i) => inSector.y[i]) };
    const clip = curvatureClip(sorted);
    return [
      {
        key: "friction",
        title: "Grip needed (μ = |r′|/r)",
        series: outlineFrictionSeries(r.wheel.points, sector),
        xLabel: "driver turn θ (rad)",
        yLabel: "|r′|/r",
        xDomain: dom,
        guide: { y: FRICTION_GUIDE, label: `${FRICTION_GUIDE}` },
      },
      {
        key: "ratio",
        title: "Speed ratio ω partner / ω driver",
        series: speedRatioSeries(r.follower ?? []),
        xLabel: "driver turn θ (rad)",
        yLabel: "ratio",
        xDomain: dom,
      },
      {
        key: "curvature",
        title: "Driver pitch-curve curvature",
        series: sorted,
        xLabel: "driver turn θ (rad)",
        yLabel: `κ (1/${u}, + convex)`,
        xDomain: dom,
        clip,
        clipNote: "off the scale: a corner or very tight bend",
      },
    ];
  }
  const pts = r.track?.points ?? [];
  if (!pts.length) return [];
  const dom: [number, number] = [pts[0][0], pts[pts.length - 1][0]];
  const curv = curvatureSeries(pts, (p) => p[0]);
  const clip = curvatureClip(curv);
  const plots: PlotSpec[] = [
    {
      key: "friction",
      title: "Grip needed (μ = |dy/dx|)",
      series: trackFrictionSeries(pts),
      xLabel: `axle x (${u})`,
      yLabel: "|dy/dx|",
      xDomain: dom,
      guide: { y: FRICTION_GUIDE, label: `${FRICTION_GUIDE}` },
    },
  ];
  if (r.mode === "twin-wheels" && r.motion)
    plots.push({
      key: "ratio",
      title: "Speed ratio ω lower / ω upper",
      series: twinRatioSeries(r.motion),
      xLabel: `axle x (${u})`,
      yLabel: "ratio",
      xDomain: dom,
    });
  plots.push({
    key: "curvature",
    title: "Track curvature",
    series: curv,
    xLabel: `axle x (${u})`,
    yLabel: `κ (1/${u}, + bends up)`,
    xDomain: dom,
    clip,
    clipNote: "off the scale: a cusp or very tight bend",
  });
  return plots;
}

export function CheckPlots({ result }: { result?: SolvedGeometry }) {
  if (!result)
    return (
      <Panel title="Along the roll">
        <p className="text-sm text-ink-soft" aria-busy="true">
          Solving…
        </p>
      </Panel>
    );
  const plots = plotsFor(result);
  return (
    <Panel title={result.mode === "partner-wheel" ? "Over one driver sector" : "Over one track period"}>
      {plots.length ? (
        <div className="grid gap-4 sm:grid-cols-2 xl:grid-cols-3">
          {plots.map(({ key, ...p }) => (
            <LinePlot key={key} {...p} />
          ))}
        </div>
      ) : (
        <p className="text-sm text-ink-soft">This result has no track to plot.</p>
      )}
    </Panel>
  );
}
