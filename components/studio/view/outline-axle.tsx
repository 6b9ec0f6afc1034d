"use client";
// The axle handle of an uploaded outline, placed where the spec's axle is on the drawn wheel. While it
// is dragged the drawing holds still (the result and the wheel's place as the drag began), so the
// outline stays under the pointer while each new position is solved behind it.
import { useState, type RefObject } from "react";
import { axleRefusal, outlinePointAt, type Axle, type DrawnBody } from "@/lib/studio/axle-placement";
import { rotateCw, toScreen, type Pt, type View } from "@/lib/studio/view-math";
import type { DesignSpec, SolvedGeometry } from "@/lib/track";
import { AxleHandle } from "./axle-handle";

type OutlineWheel = Extract<NonNullable<DesignSpec["wheel"]>, { kind: "outline" }>;
export type AxleDrag = { result: SolvedGeometry; body: DrawnBody } | null;

/** The frozen drag, if any; the result to draw is the frozen one while it lasts. */
export function useAxleDrag() {
  return useState<AxleDrag>(null);
}

export function OutlineAxle(props: {
  outline: OutlineWheel;
  result: SolvedGeometry;
  view: View;
  /** Where the wheel's axle is drawn now and how far the wheel has turned (clockwise). */
  wheelAt: Pt;
  angleCw: number;
  drag: AxleDrag;
  setDrag: (drag: AxleDrag) => void;
  box: RefObject<HTMLDivElement | null>;
  onAxleChange: (axle: Axle) => void;
  onPlayingChange?: (playing: boolean) => void;
}) {
  const { outline, view, drag } = props;
  const body: DrawnBody = drag?.body ?? { axleAt: props.wheelAt, angleCw: props.angleCw, axle: outline.axle };
  const [dx, dy] = rotateCw([outline.axle.x - body.axle.x, outline.axle.y - body.axle.y], body.angleCw);
  const at = toScreen(view, [body.axleAt[0] + dx, body.axleAt[1] + dy]);
  const start = () => {
    const now: DrawnBody = { axleAt: props.wheelAt, angleCw: props.angleCw, axle: outline.axle };
    props.onPlayingChange?.(false);
    props.setDrag({ result: props.result, body: now });
    return (q: Pt) => outlinePointAt(q, view, now);
  };
  const place = (axle: Axle) => {
    const refusal = axleRefusal(outline.points, axle);
    if (!refusal) props.onAxleChange(axle);
    return refusal;
  };
  return (
    <AxleHandle
      at={at}
      axle={outline.axle}
      units={props.result.units}
      pixelsPerUnit={view.scale}
      box={props.box}
      onDragStart={start}
      onDragEnd={() => props.setDrag(null)}
      place={place}
    />
  );
}
