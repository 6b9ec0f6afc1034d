"use client";

import { Shape, Text } from "react-konva";
import { gridRules, ticks, toWorld, type View } from "@/lib/studio/view-math";
import { INK } from "./palette";

// The drafting sheet's millimetre grid, drawn in screen pixels (crisp 1 px rules at any zoom):
// only decades of the unit whose rules land at least ~6 px apart, every tenth one darker, and
// numbers on the rules far enough apart to read.

const FINE = "rgba(196, 180, 140, 0.28)";
const MAJOR = "rgba(196, 180, 140, 0.6)";

export function CanvasGrid({
  view,
  width,
  height,
  units,
  font,
}: {
  view: View;
  width: number;
  height: number;
  units: "mm" | "in";
  font: string;
}) {
  const rules = gridRules(view.scale, units);
  const [x0, y1] = toWorld(view, [0, 0]);
  const [x1, y0] = toWorld(view, [width, height]);
  const near = (v: number, step: number) => Math.abs(v / step - Math.round(v / step)) < 1e-6;
  // Keep the bottom-left corner free so the two rows of numbers do not run into each other.
  const labelsX = ticks(x0, x1, rules.label, 200).filter((x) => view.ox + view.scale * x > 36);
  const labelsY = ticks(y0, y1, rules.label, 200).filter((y) => view.oy - view.scale * y < height - 20);
  const label = (v: number) => Number(v.toPrecision(10)).toString();
  return (
    <>
      <Shape
        listening={false}
        perfectDrawEnabled={false}
        sceneFunc={(ctx) => {
          for (const [step, colour, skipMajor] of [
            [rules.fine, FINE, true],
            [rules.major, MAJOR, false],
          ] as const) {
            ctx.beginPath();
            for (const x of ticks(x0, x1, step)) {
              if (skipMajor && near(x, rules.major)) continue;
              const px = Math.round(view.ox + view.scale * x) + 0.5;
              ctx.moveTo(px, 0);
              ctx.lineTo(px, height);
            }
            for (const y of ticks(y0, y1, step)) {
              if (skipMajor && near(y, rules.major)) continue;
              const py = Math.round(view.oy - view.scale * y) + 0.5;
              ctx.moveTo(0, py);
              ctx.lineTo(width, py);
            }
            ctx.setAttr("strokeStyle", colour);
            ctx.setAttr("lineWidth", 1);
            ctx.stroke();
          }
        }}
      />
      {labelsX.map((x) => (
        <Text
          key={`x${x}`}
          listening={false}
          x={view.ox + view.scale * x + 3}
          y={height - 14}
          text={label(x)}
          fontSize={10}
          fontFamily={font}
          fill={INK.faint}
        />
      ))}
      {labelsY.map((y) => (
        <Text
          key={`y${y}`}
          listening={false}
          x={3}
          y={view.oy - view.scale * y - 12}
          text={label(y)}
          fontSize={10}
          fontFamily={font}
          fill={INK.faint}
        />
      ))}
      <Text
        listening={false}
        x={width - 28}
        y={height - 14}
        text={units}
        fontSize={10}
        fontFamily={font}
        fill={INK.faint}
      />
    </>
  );
}
