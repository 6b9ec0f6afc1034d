"use client";

import { Circle, Group, Line, Text } from "react-konva";
import type { SolvedGeometry } from "@/lib/track";
import type { Pose } from "@/lib/studio/motion";
import { placeOutline, toScreen, type Pt, type View } from "@/lib/studio/view-math";
import { CAUTION, INK } from "./palette";

/** World points to Konva's flat [x0, y0, x1, y1, …] in screen pixels. */
export function flat(points: readonly Pt[], view: View): number[] {
  const out = new Array<number>(points.length * 2);
  for (let i = 0; i < points.length; i++) {
    out[2 * i] = view.ox + view.scale * points[i][0];
    out[2 * i + 1] = view.oy - view.scale * points[i][1];
  }
  return out;
}

interface BodyProps {
  outline: readonly Pt[];
  /** Clockwise turn (a counter-clockwise body passes its angle negated). */
  angleCw: number;
  axle: Pt;
  view: View;
  tone: "wheel" | "partner";
  name: string;
}

/** One wheel: its outline turned and placed, a mark from the axle to its start contact (so the turn shows on round shapes too), and the axle. */
export function WheelBody({ outline, angleCw, axle, view, tone, name }: BodyProps) {
  const placed = placeOutline(outline, angleCw, axle[0], axle[1]);
  const stroke = tone === "wheel" ? INK.base : INK.soft;
  const [ax, ay] = toScreen(view, axle);
  const [mx, my] = toScreen(view, placed[0]);
  return (
    <Group listening={false} name={name}>
      <Line
        points={flat(placed, view)}
        closed
        stroke={stroke}
        strokeWidth={1.5}
        fill={tone === "wheel" ? "rgba(29,53,87,0.07)" : "rgba(61,90,128,0.06)"}
        perfectDrawEnabled={false}
      />
      <Line points={[ax, ay, mx, my]} stroke={stroke} strokeWidth={1} dash={[4, 3]} opacity={0.7} />
      <AxleMark at={[ax, ay]} colour={stroke} />
    </Group>
  );
}

/** The axle: a small circle with a cross-hair through it, in screen pixels. */
export function AxleMark({ at, colour }: { at: Pt; colour: string }) {
  const [x, y] = at;
  return (
    <>
      <Circle x={x} y={y} radius={5} stroke={colour} strokeWidth={1.25} fill="rgba(246,240,225,0.9)" />
      <Line points={[x - 9, y, x + 9, y]} stroke={colour} strokeWidth={1} />
      <Line points={[x, y - 9, x, y + 9]} stroke={colour} strokeWidth={1} />
    </>
  );
}

export function ContactMark({ at, view }: { at: Pt; view: View }) {
  const [x, y] = toScreen(view, at);
  return (
    <Circle
      listening={false}
      x={x}
      y={y}
      radius={3.5}
      fill={INK.base}
      stroke="#f6f0e1"
      strokeWidth={1}
      name="contact"
    />
  );
}

/** The caution spot (e.g. where a wheel cuts in): the one place the safety orange is used. */
export function HighlightMark({ at, label, view, font }: { at: Pt; label?: string; view: View; font: string }) {
  const [x, y] = toScreen(view, at);
  return (
    <Group listening={false} name="highlight">
      <Circle x={x} y={y} radius={11} stroke={CAUTION} strokeWidth={2} />
      <Circle x={x} y={y} radius={2.5} fill={CAUTION} />
      {label ? <Text x={x + 14} y={y - 18} text={label} fontSize={11} fontFamily={font} fill={CAUTION} /> : null}
    </Group>
  );
}

/**
 * Where the wheels' axles are drawn at one pose. Track modes: set each wheel at the height its own
 * outline rests at (`resting`, lib/studio/motion restingAxles), so a wrong turn table would show as
 * a bobbing axle. Pairs keep their fixed axles.
 */
export function drawnAxles(
  result: SolvedGeometry,
  pose: Pose,
  resting: { wheel: number; partner?: number },
): { wheel: Pt; partner?: Pt } {
  const pair = result.mode === "partner-wheel";
  const wheelY = pair || !Number.isFinite(resting.wheel) ? pose.wheel.y : resting.wheel;
  if (!pose.partner) return { wheel: [pose.wheel.x, wheelY] };
  const partnerY =
    pair || resting.partner === undefined || !Number.isFinite(resting.partner) ? pose.partner.y : resting.partner;
  return { wheel: [pose.wheel.x, wheelY], partner: [pose.partner.x, partnerY] };
}

/** All moving bodies at one pose. */
export function PosedBodies({
  result,
  pose,
  resting,
  view,
}: {
  result: SolvedGeometry;
  pose: Pose;
  resting: { wheel: number; partner?: number };
  view: View;
}) {
  const axles = drawnAxles(result, pose, resting);
  return (
    <>
      {result.partner && pose.partner && axles.partner ? (
        <WheelBody
          outline={result.partner.points}
          angleCw={-pose.partner.angle}
          axle={axles.partner}
          view={view}
          tone="partner"
          name="partner"
        />
      ) : null}
      <WheelBody
        outline={result.wheel.points}
        angleCw={pose.wheel.angle}
        axle={axles.wheel}
        view={view}
        tone="wheel"
        name="wheel"
      />
      <ContactMark at={pose.contact} view={view} />
    </>
  );
}
