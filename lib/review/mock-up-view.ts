// What part of the mock-up is on screen: the whole run, or a window that follows the wheel at a
// readable scale. Both are to scale. The labels and dimension lines keep their screen size, so the
// room kept for them is set in screen pixels and turned into millimetres for the screen at hand.
// `scaleRatio` states the scale on the reader's screen (a CSS pixel is 1/96 in, CSS Values and Units
// Level 3 §5.2, so 0.2646 mm). Pure.
import type { RunScene } from "./run-scene";

export interface ViewBox {
  x: number;
  /** Top edge, in the drawing's flipped y (user y = −y mm). */
  y: number;
  width: number;
  height: number;
}

export type ViewMode = "whole" | "follow";

/** The drawing's room on screen, CSS px: its width, and the most height it may take. */
export interface Screen {
  width: number;
  maxHeight: number;
}

/** Screen pixels kept free around the drawing: the person's label on the left, the height dimensions on the right, the run's below. */
export const PAD = { left: 56, right: 235, top: 26, bottom: 50 };
/** On a narrow screen (a phone) the heights are listed below the drawing, not written beside it. */
export const COMPACT_PAD = { left: 60, right: 28, top: 22, bottom: 44 };
export const COMPACT_WIDTH = 640;

export const padFor = (screen: Screen) => (screen.width < COMPACT_WIDTH ? COMPACT_PAD : PAD);

interface Box {
  minX: number;
  maxX: number;
  minY: number;
  maxY: number;
}

/** The view showing `b` with PAD kept free on a screen of this size, and its mm per pixel. */
export function fitBox(b: Box, screen: Screen): { view: ViewBox; px: number } {
  const w = Math.max(120, screen.width);
  const h = Math.max(120, screen.maxHeight);
  const PAD = padFor(screen);
  const cw = Math.max(b.maxX - b.minX, 1);
  const ch = Math.max(b.maxY - b.minY, 1);
  const px = Math.max(cw / Math.max(40, w - PAD.left - PAD.right), ch / Math.max(40, h - PAD.top - PAD.bottom));
  const width = Math.max(cw + (PAD.left + PAD.right) * px, w * px);
  // The spare width (when the height decides the scale) is shared out evenly on both sides.
  const spare = width - cw - (PAD.left + PAD.right) * px;
  return {
    view: {
      x: b.minX - PAD.left * px - spare / 2,
      y: -(b.maxY + PAD.top * px),
      width,
      height: ch + (PAD.top + PAD.bottom) * px,
    },
    px,
  };
}

/** Everything drawn: the person, the run (or the pair) and the wheel's reach above its axle. */
export function contentBox(scene: RunScene): Box {
  return { ...scene.bounds };
}

export function wholeView(scene: RunScene, screen: Screen): { view: ViewBox; px: number } {
  return fitBox(contentBox(scene), screen);
}

/**
 * A window about three wheels wide (at least 1.8 m) centred on the wheel and kept inside the whole
 * drawing, from the floor to just over the wheel's reach (the person's head may leave it).
 */
export function followView(scene: RunScene, wheelX: number, screen: Screen): { view: ViewBox; px: number } {
  const all = contentBox(scene);
  const span = Math.min(all.maxX - all.minX, Math.max(1800, 3 * scene.dims.wheelAcross));
  const minX = Math.min(all.maxX - span, Math.max(all.minX, wheelX - span / 2));
  const axle = scene.kind === "run" ? scene.axleY : 0;
  const maxY = Math.min(all.maxY, axle + 0.75 * scene.dims.wheelAcross);
  return fitBox({ minX, maxX: minX + span, minY: all.minY, maxY }, screen);
}

export const MM_PER_CSS_PX = 25.4 / 96;

/** "1 : 40": drawing size to real size on this screen (mm per CSS pixel given), rounded to a readable figure. */
export function scaleRatio(mmPerPx: number): string {
  if (!(mmPerPx > 0) || !Number.isFinite(mmPerPx)) return "";
  const n = mmPerPx / MM_PER_CSS_PX;
  const nice = n >= 100 ? Math.round(n / 10) * 10 : n >= 10 ? Math.round(n) : Math.round(n * 10) / 10;
  return `1 : ${nice}`;
}
