"use client";

// The Konva stage itself, loaded only in the browser (see studio-canvas.tsx). Everything is
// transformed to screen pixels in JS (lib/studio/view-math View) rather than by a scaled Konva
// group, so strokes stay 1–1.5 px and text stays upright at any zoom.

import { useEffect, useEffectEvent, useMemo, useRef, useState, type KeyboardEvent, type PointerEvent } from "react";
import { Layer, Line, Stage } from "react-konva";
import type { DesignSpec, SolvedGeometry } from "@/lib/track";
import { axleRefusal, outlinePointAt, type Axle, type DrawnBody } from "@/lib/studio/axle-placement";
import { axleTrace, cycleOf, poseAt, restingAxles } from "@/lib/studio/motion";
import { rotateCw, toScreen, type Pt } from "@/lib/studio/view-math";
import { AxleHandle } from "./axle-handle";
import { CanvasDimensions } from "./canvas-dimensions";
import { CanvasGrid } from "./canvas-grid";
import { CanvasReadout } from "./canvas-readout";
import { AxleMark, HighlightMark, PosedBodies, drawnAxles, flat } from "./canvas-bodies";
import { INK, monoFamily } from "./palette";
import { sceneOf } from "@/lib/studio/scene";
import { FrameMeter, publishProbe } from "./studio-probe";
import { stepFrame } from "./use-rolling-clock";
import { useViewTransform } from "./use-view-transform";

export interface CanvasHighlight {
  /** In the canvas frame (spec units, y up). */
  point: Pt;
  label?: string;
}

export interface CanvasStageProps {
  result: SolvedGeometry;
  spec?: DesignSpec;
  playing: boolean;
  speed: number;
  position: number;
  onPositionChange: (position: number) => void;
  onPlayingChange?: (playing: boolean) => void;
  highlight?: CanvasHighlight | null;
  height: number;
  /** Moving the axle of an uploaded outline (a handle on the canvas); undefined: not editable here. */
  onAxleChange?: (axle: Axle) => void;
}

const ZOOM_STEP = 1.25;
const PAN_STEP = 40;

function describe(result: SolvedGeometry, spec?: DesignSpec): string {
  const what = {
    "track-for-wheel": "a wheel rolling on the track made for it",
    "wheel-for-track": "the wheel made for a track, rolling on it",
    "partner-wheel": "a driver wheel and its partner turning on fixed axles",
    "twin-wheels": "twin wheels rolling above and below one track",
  }[result.mode];
  const shape = spec?.wheel ? `, ${spec.wheel.kind} wheel` : spec?.track ? `, ${spec.track.kind} track` : "";
  return `Studio canvas: ${what}${shape}. Drag or arrow keys to pan, mouse wheel or + and − to zoom, F to fit, Space to play or pause, comma and full stop to step.`;
}

export default function CanvasStage({ result: latest, spec, playing, speed, position, onPositionChange, onPlayingChange, highlight, height, onAxleChange }: CanvasStageProps) {
  const box = useRef<HTMLDivElement>(null);
  const [width, setWidth] = useState(0);
  const [font] = useState(monoFamily);
  const [meter] = useState(() => new FrameMeter());
  // While the axle is dragged the drawing holds still (the result and the wheel's place as the drag
  // began), so the outline stays under the pointer while each new position is solved behind it.
  const [axleDrag, setAxleDrag] = useState<{ result: SolvedGeometry; body: DrawnBody } | null>(null);
  const result = axleDrag?.result ?? latest;
  const scene = useMemo(() => sceneOf(result), [result]);
  const trace = useMemo(() => axleTrace(result, 480), [result]);
  const vt = useViewTransform(scene.bounds, Math.max(width, 1), height, result.specHash);
  const { view } = vt;

  // A highlight that changes brings its spot to the middle (state adjusted while rendering, as
  // React recommends for responding to a prop, rather than in an effect).
  const [seenHighlight, setSeenHighlight] = useState(highlight);
  if (highlight !== seenHighlight) {
    setSeenHighlight(highlight);
    if (highlight && width > 0) vt.centre(highlight.point);
  }

  useEffect(() => {
    const el = box.current;
    if (!el) return;
    const ro = new ResizeObserver((entries) => setWidth(Math.floor(entries[0].contentRect.width)));
    ro.observe(el);
    return () => ro.disconnect();
  }, []);

  // React's onWheel listener is passive, so the page would scroll too; take the event natively.
  const onWheel = useEffectEvent((e: WheelEvent) => {
    e.preventDefault();
    const rect = box.current!.getBoundingClientRect();
    vt.zoomBy(Math.exp(-e.deltaY * (e.deltaMode === 1 ? 0.05 : 0.0015)), [e.clientX - rect.left, e.clientY - rect.top]);
  });
  useEffect(() => {
    const el = box.current;
    if (!el) return;
    const handler = (e: WheelEvent) => onWheel(e);
    el.addEventListener("wheel", handler, { passive: false });
    return () => el.removeEventListener("wheel", handler);
  }, []);

  const pose = poseAt(result, position);
  const resting = restingAxles(result, pose);
  const drawn = drawnAxles(result, pose, resting);
  const c = cycleOf(result);
  const travelled = position * c.length;

  // The axle's path so far, from the outlines' own resting heights (lib/studio/motion).
  const shown = scene.pair ? [] : trace.filter((t) => t.along - c.start <= travelled);
  const tracePts: Pt[] = shown.map((t) => [t.x, t.wheel]);
  const lowerPts: Pt[] = shown.filter((t) => t.partner !== undefined).map((t) => [t.x, t.partner!]);
  if (!scene.pair) {
    tracePts.push([pose.wheel.x, resting.wheel]);
    if (resting.partner !== undefined) lowerPts.push([pose.wheel.x, resting.partner]);
  }
  const traceFlat = flat(tracePts, view);
  const lowerFlat = flat(lowerPts, view);
  // A pair's axles are both fixed, so nothing is traced on the canvas; the probe still reports
  // where the drawn outlines, touching, would put the partner's axle over the turn so far.
  const pairRest = scene.pair ? trace.filter((t) => t.along <= travelled && t.partner !== undefined).map((t) => t.partner!) : [];
  if (scene.pair && resting.partner !== undefined) pairRest.push(resting.partner);

  useEffect(() => {
    meter.tick(performance.now());
    const ys = (f: number[]) => f.filter((_, i) => i % 2 === 1);
    publishProbe(box.current, {
      mode: result.mode,
      frames: meter.frames,
      fps: meter.fps,
      position,
      axleTrace: ys(traceFlat),
      lowerAxleTrace: lowerFlat.length ? ys(lowerFlat) : pairRest.length ? pairRest.map((y) => toScreen(view, [0, y])[1]) : undefined,
      axleLine: toScreen(view, [0, scene.axleY])[1],
      lowerAxleLine: scene.lowerAxleY !== undefined ? toScreen(view, [0, scene.lowerAxleY])[1] : undefined,
      pixelsPerUnit: view.scale,
    });
  });

  const onKeyDown = (e: KeyboardEvent<HTMLDivElement>) => {
    const k = e.key;
    // The zoom buttons inside keep Space and Enter for themselves.
    if (e.target !== e.currentTarget && (k === " " || k === "Enter")) return;
    let handled = true;
    if (k === "+" || k === "=") vt.zoomBy(ZOOM_STEP);
    else if (k === "-" || k === "_") vt.zoomBy(1 / ZOOM_STEP);
    else if (k === "f" || k === "F") vt.fit();
    else if (k === "ArrowLeft") vt.panBy(PAN_STEP, 0);
    else if (k === "ArrowRight") vt.panBy(-PAN_STEP, 0);
    else if (k === "ArrowUp") vt.panBy(0, PAN_STEP);
    else if (k === "ArrowDown") vt.panBy(0, -PAN_STEP);
    else if (k === " " && onPlayingChange) onPlayingChange(!playing);
    else if (k === "," || k === ".") {
      onPlayingChange?.(false);
      onPositionChange(stepFrame(position, k === "," ? -1 : 1, speed));
    } else if (k === "Home") onPositionChange(0);
    else handled = false;
    if (handled) e.preventDefault();
  };

  const drag = useRef<{ x: number; y: number } | null>(null);
  const onPointerDown = (e: PointerEvent<HTMLDivElement>) => {
    if ((e.target as HTMLElement).closest("button")) return;
    e.currentTarget.setPointerCapture(e.pointerId);
    drag.current = { x: e.clientX, y: e.clientY };
  };
  const onPointerMove = (e: PointerEvent<HTMLDivElement>) => {
    if (!drag.current) return;
    vt.panBy(e.clientX - drag.current.x, e.clientY - drag.current.y);
    drag.current = { x: e.clientX, y: e.clientY };
  };
  const endDrag = () => {
    drag.current = null;
  };

  // The axle handle of an uploaded outline: where the spec's axle is on the drawn wheel.
  const outline = spec?.wheel?.kind === "outline" ? spec.wheel : undefined;
  const showHandle = !!onAxleChange && !!outline && (!playing || !!axleDrag);
  let handleAt: Pt | null = null;
  if (showHandle && outline) {
    const body: DrawnBody = axleDrag?.body ?? { axleAt: drawn.wheel, angleCw: pose.wheel.angle, axle: outline.axle };
    const [dx, dy] = rotateCw([outline.axle.x - body.axle.x, outline.axle.y - body.axle.y], body.angleCw);
    handleAt = toScreen(view, [body.axleAt[0] + dx, body.axleAt[1] + dy]);
  }
  const startAxleDrag = () => {
    const body: DrawnBody = { axleAt: drawn.wheel, angleCw: pose.wheel.angle, axle: outline!.axle };
    const frozenView = view;
    onPlayingChange?.(false);
    setAxleDrag({ result, body });
    return (q: Pt) => outlinePointAt(q, frozenView, body);
  };
  const placeAxle = (axle: Axle) => {
    const refusal = axleRefusal(outline!.points, axle);
    if (!refusal) onAxleChange?.(axle);
    return refusal;
  };

  const axleLinePx = toScreen(view, [0, scene.axleY])[1];
  const lowerLinePx = scene.lowerAxleY !== undefined ? toScreen(view, [0, scene.lowerAxleY])[1] : undefined;
  const readoutId = `studio-readout-${result.specHash.slice(0, 8)}`;
  const staticLayer = useMemo(
    () => (
      <Layer listening={false}>
        <CanvasGrid view={view} width={width} height={height} units={result.units} font={font} />
        {!scene.pair ? <Line points={[0, axleLinePx, width, axleLinePx]} stroke={INK.faint} strokeWidth={1} dash={[8, 6]} /> : null}
        {lowerLinePx !== undefined && !scene.pair ? <Line points={[0, lowerLinePx, width, lowerLinePx]} stroke={INK.faint} strokeWidth={1} dash={[8, 6]} /> : null}
        {scene.track.length ? <Line points={flat(scene.track, view)} stroke={INK.base} strokeWidth={2} lineJoin="round" perfectDrawEnabled={false} /> : null}
        {scene.pair ? <AxleMark at={toScreen(view, [0, scene.lowerAxleY ?? 0])} colour={INK.soft} /> : null}
        <CanvasDimensions scene={scene} view={view} units={result.units} centreDistance={result.centreDistance} font={font} />
      </Layer>
    ),
    [view, width, height, result, scene, font, axleLinePx, lowerLinePx],
  );

  return (
    <div
      ref={box}
      role="application"
      aria-roledescription="drawing"
      aria-label={describe(result, spec)}
      aria-describedby={readoutId}
      tabIndex={0}
      data-studio-canvas=""
      data-mode={result.mode}
      className="relative cursor-grab touch-none select-none overflow-hidden rounded-plate border border-paper-edge bg-paper focus-visible:outline-2 active:cursor-grabbing"
      style={{ height }}
      onKeyDown={onKeyDown}
      onPointerDown={onPointerDown}
      onPointerMove={onPointerMove}
      onPointerUp={endDrag}
      onPointerCancel={endDrag}
    >
      {width > 0 ? (
        <Stage width={width} height={height}>
          {staticLayer}
          <Layer listening={false}>
            {traceFlat.length >= 4 ? <Line points={traceFlat} stroke={INK.soft} strokeWidth={1.5} name="axle-trace" /> : null}
            {lowerFlat.length >= 4 ? <Line points={lowerFlat} stroke={INK.soft} strokeWidth={1.5} name="lower-axle-trace" /> : null}
            <PosedBodies result={result} pose={pose} resting={resting} view={view} />
            {highlight ? <HighlightMark at={highlight.point} label={highlight.label} view={view} font={font} /> : null}
          </Layer>
        </Stage>
      ) : null}
      <CanvasReadout result={result} pose={pose} id={readoutId} />
      {handleAt && outline ? (
        <AxleHandle
          at={handleAt}
          axle={outline.axle}
          units={result.units}
          pixelsPerUnit={view.scale}
          box={box}
          onDragStart={startAxleDrag}
          onDragEnd={() => setAxleDrag(null)}
          place={placeAxle}
        />
      ) : null}
      <div className="no-print absolute right-2 top-2 flex gap-1">
        <ToolButton label="Zoom out" onClick={() => vt.zoomBy(1 / ZOOM_STEP)}>
          −
        </ToolButton>
        <ToolButton label="Zoom in" onClick={() => vt.zoomBy(ZOOM_STEP)}>
          +
        </ToolButton>
        <ToolButton label="Fit to view" onClick={vt.fit}>
          Fit
        </ToolButton>
      </div>
      <p className="pointer-events-none absolute bottom-1 right-8 font-mono text-[10px] text-ink-faint">
        {playing ? `rolling ${speed}×` : "paused"} · drag to pan · wheel or +/− to zoom · F fit · Space play
      </p>
    </div>
  );
}

function ToolButton({ label, onClick, children }: { label: string; onClick: () => void; children: string }) {
  return (
    <button
      type="button"
      aria-label={label}
      title={label}
      // Keep the canvas's own keys (and a drag) from starting on the button.
      onPointerDown={(e) => e.stopPropagation()}
      onClick={onClick}
      className="min-w-7 rounded-plate border border-ink-line bg-paper/90 px-1.5 py-0.5 font-mono text-sm text-ink hover:bg-paper-deep"
    >
      {children}
    </button>
  );
}
