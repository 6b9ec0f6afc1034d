"use client";

// The axle of an uploaded outline as a handle on the canvas: drag it, or focus it and nudge it with
// the arrow keys (Shift for ten times the step). A position the engine would refuse is not taken,
// and the engine's own words say why (lib/studio/axle-placement).

import { useRef, useState, type KeyboardEvent, type PointerEvent, type RefObject } from "react";
import { dragStep, nudgeStep, snap, type Axle } from "@/lib/studio/axle-placement";
import { fmt, type Pt } from "@/lib/studio/view-math";

export interface AxleHandleProps {
  /** Where the handle sits, in screen pixels within the canvas box. */
  at: Pt;
  /** The axle as the spec has it (in the spec's units, the outline's own frame). */
  axle: Axle;
  units: "mm" | "in";
  pixelsPerUnit: number;
  /** The canvas box, for pointer positions. */
  box: RefObject<HTMLDivElement | null>;
  /** Starts a drag: the drawing holds still and this maps screen points to outline points until it ends. */
  onDragStart: () => (q: Pt) => Pt;
  onDragEnd: () => void;
  /** Places the axle; answers the engine's refusal, or undefined when the position was taken. */
  place: (axle: Axle) => string | undefined;
}

const KEYS: Record<string, Pt> = { ArrowRight: [1, 0], ArrowLeft: [-1, 0], ArrowUp: [0, 1], ArrowDown: [0, -1] };

export function AxleHandle({ at, axle, units, pixelsPerUnit, box, onDragStart, onDragEnd, place }: AxleHandleProps) {
  const grab = useRef<{ map: (q: Pt) => Pt; offset: Pt } | null>(null);
  const [refusal, setRefusal] = useState<string | undefined>();
  const [dragging, setDragging] = useState(false);

  const local = (e: PointerEvent): Pt => {
    const rect = box.current!.getBoundingClientRect();
    return [e.clientX - rect.left, e.clientY - rect.top];
  };
  const tryPlace = (next: Axle) => setRefusal(place(next));

  const onPointerDown = (e: PointerEvent<HTMLButtonElement>) => {
    // The canvas would start panning; this drag is the axle's.
    e.stopPropagation();
    e.preventDefault();
    e.currentTarget.setPointerCapture(e.pointerId);
    e.currentTarget.focus();
    const map = onDragStart();
    const p = map(local(e));
    // Keep the point grabbed under the pointer, wherever on the handle it was taken.
    grab.current = { map, offset: [p[0] - axle.x, p[1] - axle.y] };
    setDragging(true);
  };
  const onPointerMove = (e: PointerEvent<HTMLButtonElement>) => {
    const g = grab.current;
    if (!g) return;
    const [px, py] = g.map(local(e));
    const step = dragStep(pixelsPerUnit);
    tryPlace({ x: snap(px - g.offset[0], step), y: snap(py - g.offset[1], step) });
  };
  const endDrag = () => {
    if (!grab.current) return;
    grab.current = null;
    setDragging(false);
    onDragEnd();
  };
  const onKeyDown = (e: KeyboardEvent<HTMLButtonElement>) => {
    const dir = KEYS[e.key];
    if (!dir) return;
    // The canvas pans on the arrow keys; here they move the axle.
    e.preventDefault();
    e.stopPropagation();
    const d = nudgeStep(units, e.shiftKey);
    const tidy = (v: number) => Number(v.toPrecision(12));
    tryPlace({ x: tidy(axle.x + dir[0] * d), y: tidy(axle.y + dir[1] * d) });
  };

  const where = `x ${fmt(axle.x, 6)}, y ${fmt(axle.y, 6)} ${units}`;
  return (
    <>
      <button
        type="button"
        data-testid="axle-handle"
        aria-label={`Axle at ${where}. Drag it, or use the arrow keys to move it by ${nudgeStep(units, false)} ${units} (Shift: ${nudgeStep(units, true)} ${units}).`}
        title="Drag to place the axle"
        className="no-print absolute h-7 w-7 -translate-x-1/2 -translate-y-1/2 cursor-move touch-none rounded-full border-2 border-dashed border-ink bg-paper/40 hover:bg-paper/70 focus-visible:outline-2 focus-visible:outline-offset-2 focus-visible:outline-ink"
        style={{ left: at[0], top: at[1] }}
        onPointerDown={onPointerDown}
        onPointerMove={onPointerMove}
        onPointerUp={endDrag}
        onPointerCancel={endDrag}
        onLostPointerCapture={endDrag}
        onKeyDown={onKeyDown}
      />
      {dragging ? (
        <span
          className="pointer-events-none absolute rounded-plate bg-paper/90 px-1 font-mono text-[11px] text-ink"
          style={{ left: at[0] + 16, top: at[1] + 12 }}
        >
          {where}
        </span>
      ) : null}
      {refusal ? (
        <p
          role="alert"
          data-testid="axle-refusal"
          className="absolute bottom-6 left-2 max-w-[70%] rounded-plate border border-caution bg-paper/95 px-2 py-1 text-xs font-medium text-caution-ink"
        >
          {refusal}
        </p>
      ) : null}
    </>
  );
}
