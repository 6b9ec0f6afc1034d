"use client";

// The Konva stage itself, loaded only in the browser (see studio-canvas.tsx). Everything is
// transformed to screen pixels in JS (lib/studio/view-math View) rather than by a scaled Konva
// group, so strokes stay 1–1.5 px and text stays upright at any zoom.

import { useEffect, useMemo, useRef, useState } from "react";
import { Layer, Line, Stage } from "react-konva";
import type { DesignSpec, SolvedGeometry } from "@/lib/track";
import type { Axle } from "@/lib/studio/axle-placement";
import { axleTrace, poseAt, restingAxles } from "@/lib/studio/motion";
import { sceneOf } from "@/lib/studio/scene";
import { toScreen, type Pt } from "@/lib/studio/view-math";
import { tracesSoFar } from "./axle-traces";
import { HighlightMark, PosedBodies, drawnAxles, flat } from "./canvas-bodies";
import { CanvasReadout } from "./canvas-readout";
import { CanvasStaticLayer } from "./canvas-static-layer";
import { CanvasTools } from "./canvas-tools";
import { OutlineAxle, useAxleDrag } from "./outline-axle";
import { INK, monoFamily } from "./palette";
import { FrameMeter, publishProbe } from "./studio-probe";
import { useCanvasControls, useCanvasWidth } from "./use-canvas-controls";
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

export default function CanvasStage(props: CanvasStageProps) {
  const { spec, playing, speed, position, highlight, height, onAxleChange } = props;
  const box = useRef<HTMLDivElement>(null);
  const width = useCanvasWidth(box);
  const [font] = useState(monoFamily);
  const [meter] = useState(() => new FrameMeter());
  const [axleDrag, setAxleDrag] = useAxleDrag();
  const result = axleDrag?.result ?? props.result;
  const scene = useMemo(() => sceneOf(result), [result]);
  const trace = useMemo(() => axleTrace(result, 480), [result]);
  const vt = useViewTransform(scene.bounds, Math.max(width, 1), height, result.specHash);
  const { view } = vt;
  const controls = useCanvasControls(box, vt, props);

  // A highlight that changes brings its spot to the middle (state adjusted while rendering, as
  // React recommends for responding to a prop, rather than in an effect).
  const [seenHighlight, setSeenHighlight] = useState(highlight);
  if (highlight !== seenHighlight) {
    setSeenHighlight(highlight);
    if (highlight && width > 0) vt.centre(highlight.point);
  }

  const pose = poseAt(result, position);
  const resting = restingAxles(result, pose);
  const drawn = drawnAxles(result, pose, resting);
  const traces = tracesSoFar(result, scene.pair, trace, pose, resting, position);
  const traceFlat = flat(traces.upper, view);
  const lowerFlat = flat(traces.lower, view);

  useEffect(() => {
    meter.tick(performance.now());
    const ys = (f: number[]) => f.filter((_, i) => i % 2 === 1);
    publishProbe(box.current, {
      mode: result.mode,
      frames: meter.frames,
      fps: meter.fps,
      position,
      axleTrace: ys(traceFlat),
      lowerAxleTrace: lowerFlat.length
        ? ys(lowerFlat)
        : traces.pairRest.length
          ? traces.pairRest.map((y) => toScreen(view, [0, y])[1])
          : undefined,
      axleLine: toScreen(view, [0, scene.axleY])[1],
      lowerAxleLine: scene.lowerAxleY !== undefined ? toScreen(view, [0, scene.lowerAxleY])[1] : undefined,
      pixelsPerUnit: view.scale,
    });
  });

  const outline = spec?.wheel?.kind === "outline" ? spec.wheel : undefined;
  const showHandle = !!onAxleChange && !!outline && (!playing || !!axleDrag);
  const readoutId = `studio-readout-${result.specHash.slice(0, 8)}`;
  const staticLayer = useMemo(
    () => <CanvasStaticLayer view={view} width={width} height={height} result={result} scene={scene} font={font} />,
    [view, width, height, result, scene, font],
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
      {...controls}
    >
      {width > 0 ? (
        <Stage width={width} height={height}>
          {staticLayer}
          <Layer listening={false}>
            {traceFlat.length >= 4 ? (
              <Line points={traceFlat} stroke={INK.soft} strokeWidth={1.5} name="axle-trace" />
            ) : null}
            {lowerFlat.length >= 4 ? (
              <Line points={lowerFlat} stroke={INK.soft} strokeWidth={1.5} name="lower-axle-trace" />
            ) : null}
            <PosedBodies result={result} pose={pose} resting={resting} view={view} />
            {highlight ? <HighlightMark at={highlight.point} label={highlight.label} view={view} font={font} /> : null}
          </Layer>
        </Stage>
      ) : null}
      <CanvasReadout result={result} pose={pose} id={readoutId} />
      {showHandle && outline && onAxleChange ? (
        <OutlineAxle
          outline={outline}
          result={result}
          view={view}
          wheelAt={drawn.wheel}
          angleCw={pose.wheel.angle}
          drag={axleDrag}
          setDrag={setAxleDrag}
          box={box}
          onAxleChange={onAxleChange}
          onPlayingChange={props.onPlayingChange}
        />
      ) : null}
      <CanvasTools vt={vt} playing={playing} speed={speed} />
    </div>
  );
}
