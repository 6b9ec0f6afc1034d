"use client";

import dynamic from "next/dynamic";
import type { CanvasStageProps } from "./canvas-stage";

export type StudioCanvasProps = Omit<CanvasStageProps, "result" | "height"> & {
  /** undefined while the engine is solving. */
  result?: CanvasStageProps["result"];
  /** Canvas height in px (default 440); the width follows the container. */
  height?: number;
};

export const DEFAULT_CANVAS_HEIGHT = 440;

function CanvasPlaceholder({ height, children }: { height: number; children: string }) {
  return (
    <div
      role="status"
      aria-live="polite"
      className="flex items-center justify-center rounded-plate border border-paper-edge bg-paper font-mono text-sm text-ink-soft"
      style={{ height }}
    >
      {children}
    </div>
  );
}

// Konva draws on a browser <canvas>; keeping the stage out of the server render avoids loading
// it in Node at all (the page still renders its frame and placeholder on the server).
const CanvasStage = dynamic(() => import("./canvas-stage"), {
  ssr: false,
  loading: () => <CanvasPlaceholder height={DEFAULT_CANVAS_HEIGHT}>Loading the drawing…</CanvasPlaceholder>,
});

/** The studio's drawing: track, wheel(s), axle trace and contact at `position`, zoomable and pannable. */
export function StudioCanvas({ result, height = DEFAULT_CANVAS_HEIGHT, ...rest }: StudioCanvasProps) {
  if (!result) return <CanvasPlaceholder height={height}>Solving…</CanvasPlaceholder>;
  return <CanvasStage result={result} height={height} {...rest} />;
}
