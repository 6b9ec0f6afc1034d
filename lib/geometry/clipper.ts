// The one way into Clipper (Vatti clipping and offsetting, A. Johnson's Clipper 6.4.2, compiled to
// WebAssembly by js-angusj-clipper). Clipper works on integer coordinates, so every caller picks a
// scale: with SCALE_PER_MM = 1000 one integer step is 1 µm. The web build inlines its WASM, so the
// same import works in Node, in the Next.js server and in a Web Worker.
import * as clipper from "js-angusj-clipper/web";
import type { Pt } from "./point";

export { clipper };
export type ClipperLib = clipper.ClipperLibWrapper;

/** Integer steps per millimetre (1 µm); per inch it is 25.4 times as many. */
export const SCALE_PER_MM = 1000;

let loading: Promise<ClipperLib> | undefined;

/** Loads Clipper once per process or worker. */
export function loadClipper(): Promise<ClipperLib> {
  loading ??= clipper.loadNativeClipperLibInstanceAsync(clipper.NativeClipperLibRequestedFormat.WasmWithAsmJsFallback);
  return loading;
}

export function toPath(ring: readonly Pt[], scale: number): clipper.Path {
  return ring.map(([x, y]) => ({ x: Math.round(x * scale), y: Math.round(y * scale) }));
}

export function fromPath(path: clipper.ReadonlyPath, scale: number): Pt[] {
  return path.map((p) => [p.x / scale, p.y / scale] as Pt);
}
