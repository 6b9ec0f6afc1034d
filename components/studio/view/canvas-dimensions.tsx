"use client";

import { Arrow, Group, Line, Text } from "react-konva";
import { fmt, toScreen, type View } from "@/lib/studio/view-math";
import type { Scene } from "@/lib/studio/scene";
import { INK } from "./palette";

// Drafting-style dimension lines on the canvas: the period under the track, the centre distance
// beside a pair. The full set of figures is in the readout beside the canvas.

function Dimension({
  from,
  to,
  text,
  font,
  vertical,
}: {
  from: [number, number];
  to: [number, number];
  text: string;
  font: string;
  vertical?: boolean;
}) {
  const [x0, y0] = from;
  const [x1, y1] = to;
  const ext = 6;
  return (
    <Group listening={false}>
      {vertical ? (
        <>
          <Line points={[x0 - ext, y0, x0 + ext, y0]} stroke={INK.soft} strokeWidth={1} />
          <Line points={[x1 - ext, y1, x1 + ext, y1]} stroke={INK.soft} strokeWidth={1} />
        </>
      ) : (
        <>
          <Line points={[x0, y0 - ext, x0, y0 + ext]} stroke={INK.soft} strokeWidth={1} />
          <Line points={[x1, y1 - ext, x1, y1 + ext]} stroke={INK.soft} strokeWidth={1} />
        </>
      )}
      <Arrow
        points={[x0, y0, x1, y1]}
        pointerAtBeginning
        pointerLength={6}
        pointerWidth={5}
        stroke={INK.soft}
        fill={INK.soft}
        strokeWidth={1}
      />
      <Text
        x={vertical ? x0 + 8 : (x0 + x1) / 2 - 60}
        y={vertical ? (y0 + y1) / 2 - 6 : y0 + 5}
        width={vertical ? undefined : 120}
        align={vertical ? "left" : "center"}
        text={text}
        fontSize={11}
        fontFamily={font}
        fill={INK.soft}
      />
    </Group>
  );
}

export function CanvasDimensions({
  scene,
  view,
  units,
  centreDistance,
  font,
}: {
  scene: Scene;
  view: View;
  units: string;
  centreDistance?: number;
  font: string;
}) {
  if (scene.pair) {
    if (!centreDistance) return null;
    const [x, y0] = toScreen(view, [scene.bounds.maxX, 0]);
    const [, y1] = toScreen(view, [0, -centreDistance]);
    return (
      <Dimension
        from={[x + 16, y0]}
        to={[x + 16, y1]}
        text={`a = ${fmt(centreDistance)} ${units}`}
        font={font}
        vertical
      />
    );
  }
  if (!scene.period) return null;
  const [x0, y] = toScreen(view, [scene.runStart, scene.bounds.minY]);
  const [x1] = toScreen(view, [scene.runStart + scene.period, 0]);
  return <Dimension from={[x0, y + 14]} to={[x1, y + 14]} text={`period ${fmt(scene.period)} ${units}`} font={font} />;
}
