// A read-only window hook for browser tests: how many frames the canvas has drawn, its recent
// frame rate, the cycle position, and the axle trace in screen pixels (to prove it stays level).
// The same numbers sit on the canvas element as data-frame-count / data-fps / data-position.

export interface StudioProbe {
  mode: string;
  frames: number;
  fps: number;
  position: number;
  /** Screen y (px, down) of each drawn point of the upper / only axle's trace. */
  axleTrace: number[];
  /**
   * The lower twin's trace, when there is one; for a partner wheel, the partner axle's height where
   * the drawn outlines put it (the canvas draws no trace for a pair: both axles are fixed).
   */
  lowerAxleTrace?: number[];
  /** Screen y of the nominal axle line. */
  axleLine: number;
  /** Screen y of the lower twin's axle line, or of the partner's fixed axle. */
  lowerAxleLine?: number;
  /** The zoom: screen pixels per spec unit. */
  pixelsPerUnit: number;
}

declare global {
  interface Window {
    __axlewrightStudio?: StudioProbe;
  }
}

/** Counts drawn frames and reports frames per second over the last second. */
export class FrameMeter {
  frames = 0;
  private stamps: number[] = [];

  tick(now: number): void {
    this.frames++;
    this.stamps.push(now);
    while (this.stamps.length && now - this.stamps[0] > 1000) this.stamps.shift();
  }

  get fps(): number {
    const n = this.stamps.length;
    if (n < 2) return 0;
    return ((n - 1) * 1000) / (this.stamps[n - 1] - this.stamps[0]);
  }
}

export function publishProbe(el: HTMLElement | null, probe: StudioProbe): void {
  if (typeof window !== "undefined") window.__axlewrightStudio = probe;
  if (!el) return;
  el.dataset.frameCount = String(probe.frames);
  el.dataset.fps = probe.fps.toFixed(1);
  el.dataset.position = probe.position.toFixed(5);
}
