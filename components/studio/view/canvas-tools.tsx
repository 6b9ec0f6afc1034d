"use client";
// The zoom buttons in the canvas's corner and the one-line key reminder under it.
import { ZOOM_STEP } from "./use-canvas-controls";
import type { useViewTransform } from "./use-view-transform";

export function CanvasTools({
  vt,
  playing,
  speed,
}: {
  vt: ReturnType<typeof useViewTransform>;
  playing: boolean;
  speed: number;
}) {
  return (
    <>
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
      <p className="pointer-events-none absolute bottom-1 right-8 font-mono text-[10px] text-ink-soft">
        {playing ? `rolling ${speed}×` : "paused"} · drag to pan · wheel or +/− to zoom · F fit · Space play
      </p>
    </>
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
