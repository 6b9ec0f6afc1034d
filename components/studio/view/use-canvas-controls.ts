"use client";
// The canvas's own input: its width (followed with a ResizeObserver), the mouse wheel (taken natively,
// since React's listener is passive and the page would scroll too), keys and pointer drags.
import {
  useEffect,
  useEffectEvent,
  useRef,
  useState,
  type KeyboardEvent,
  type PointerEvent,
  type RefObject,
} from "react";
import { stepFrame } from "./use-rolling-clock";
import type { useViewTransform } from "./use-view-transform";

export const ZOOM_STEP = 1.25;
const PAN_STEP = 40;

interface Playback {
  playing: boolean;
  speed: number;
  position: number;
  onPositionChange: (position: number) => void;
  onPlayingChange?: (playing: boolean) => void;
}

export function useCanvasWidth(box: RefObject<HTMLDivElement | null>): number {
  const [width, setWidth] = useState(0);
  useEffect(() => {
    const el = box.current;
    if (!el) return;
    const ro = new ResizeObserver((entries) => setWidth(Math.floor(entries[0].contentRect.width)));
    ro.observe(el);
    return () => ro.disconnect();
  }, [box]);
  return width;
}

export function useCanvasControls(
  box: RefObject<HTMLDivElement | null>,
  vt: ReturnType<typeof useViewTransform>,
  playback: Playback,
) {
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
  }, [box]);

  const onKeyDown = (e: KeyboardEvent<HTMLDivElement>) => {
    const k = e.key;
    const { playing, speed, position, onPositionChange, onPlayingChange } = playback;
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
  return { onKeyDown, onPointerDown, onPointerMove, onPointerUp: endDrag, onPointerCancel: endDrag };
}
