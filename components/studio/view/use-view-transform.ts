"use client";

import { useState } from "react";
import { centreOn, fitView, zoomAbout, type Bounds, type Pt, type View } from "@/lib/studio/view-math";

const MIN_SCALE = 1e-3;
const MAX_SCALE = 500;

/**
 * Zoom and pan for the canvas. Until the user moves the view it is derived (fit to the content at
 * the current size, so a resize or a new result refits by itself); once moved it is kept for the
 * same design (`designKey`), and fit() hands it back to the derived one.
 */
export function useViewTransform(bounds: Bounds, width: number, height: number, designKey: string) {
  const [moved, setMoved] = useState<{ key: string; view: View } | null>(null);
  const fitted = fitView(bounds, width, height);
  const view = moved && moved.key === designKey ? moved.view : fitted;
  const set = (v: View) => setMoved({ key: designKey, view: v });
  return {
    view,
    fit: () => setMoved(null),
    zoomBy: (factor: number, at: Pt = [width / 2, height / 2]) => {
      const s = Math.min(MAX_SCALE, Math.max(MIN_SCALE, view.scale * factor));
      set(zoomAbout(view, s / view.scale, at));
    },
    panBy: (dx: number, dy: number) => set({ ...view, ox: view.ox + dx, oy: view.oy + dy }),
    /** Puts world point p in the middle of the canvas. */
    centre: (p: Pt) => set(centreOn(view, p, [width / 2, height / 2])),
  };
}
