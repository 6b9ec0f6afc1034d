"use client";
// What does not move while the design rolls: the grid, the axle lines, the track, a pair's fixed
// partner axle and the dimensions. Drawn once per view, not per frame.
import { Layer, Line } from "react-konva";
import type { Scene } from "@/lib/studio/scene";
import { toScreen, type View } from "@/lib/studio/view-math";
import type { SolvedGeometry } from "@/lib/track";
import { AxleMark, flat } from "./canvas-bodies";
import { CanvasDimensions } from "./canvas-dimensions";
import { CanvasGrid } from "./canvas-grid";
import { INK } from "./palette";

export function CanvasStaticLayer({
  view,
  width,
  height,
  result,
  scene,
  font,
}: {
  view: View;
  width: number;
  height: number;
  result: SolvedGeometry;
  scene: Scene;
  font: string;
}) {
  const axleLinePx = toScreen(view, [0, scene.axleY])[1];
  const lowerLinePx = scene.lowerAxleY !== undefined ? toScreen(view, [0, scene.lowerAxleY])[1] : undefined;
  return (
    <Layer listening={false}>
      <CanvasGrid view={view} width={width} height={height} units={result.units} font={font} />
      {!scene.pair ? (
        <Line points={[0, axleLinePx, width, axleLinePx]} stroke={INK.faint} strokeWidth={1} dash={[8, 6]} />
      ) : null}
      {lowerLinePx !== undefined && !scene.pair ? (
        <Line points={[0, lowerLinePx, width, lowerLinePx]} stroke={INK.faint} strokeWidth={1} dash={[8, 6]} />
      ) : null}
      {scene.track.length ? (
        <Line
          points={flat(scene.track, view)}
          stroke={INK.base}
          strokeWidth={2}
          lineJoin="round"
          perfectDrawEnabled={false}
        />
      ) : null}
      {scene.pair ? <AxleMark at={toScreen(view, [0, scene.lowerAxleY ?? 0])} colour={INK.soft} /> : null}
      <CanvasDimensions
        scene={scene}
        view={view}
        units={result.units}
        centreDistance={result.centreDistance}
        font={font}
      />
    </Layer>
  );
}
