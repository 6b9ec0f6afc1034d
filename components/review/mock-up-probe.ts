// A read-only window hook for browser tests of the review's mock-up, like the studio's
// (components/studio/view/studio-probe.ts): frames drawn, frame rate, where the roll is, and the
// drawn axle's screen height at each frame (to prove it stays level).

export interface ReviewProbe {
  mode: string;
  frames: number;
  fps: number;
  position: number;
  playing: boolean;
  view: "whole" | "follow";
  runLengthMm: number | null;
  /** Height of the nominal axle line on the drawing, px down from its top edge (a pair: the driver's axle). */
  axleLine: number;
  /** The same height of the drawn axle at each frame drawn in the current view, the last 600. */
  axleTrace: number[];
  /** How far the drawn axle sits off its line now, mm. */
  offLineMm: number;
  pixelsPerMm: number;
  markers: number;
}

declare global {
  interface Window {
    __axlewrightReview?: ReviewProbe;
  }
}

export function publishReviewProbe(el: HTMLElement | null, probe: ReviewProbe): void {
  if (typeof window !== "undefined") window.__axlewrightReview = probe;
  if (!el) return;
  el.dataset.frameCount = String(probe.frames);
  el.dataset.position = probe.position.toFixed(5);
}
