// The animated preview of a design rolling, for the review e-mail: the frames of rolling-frames.ts
// rasterised by sharp (librsvg) and joined into one animated WebP (or GIF), within a size cap
// (≤ 600 px wide, ≤ 1 MiB by default). Over the cap it steps down — fewer frames, then lower
// quality, then a smaller picture — and says so plainly if nothing fits. Node only (sharp).
import sharp from "sharp";
import type { SolvedGeometry } from "@/lib/track";
import { rollingFrames } from "./rolling-frames";

export interface AnimatedPreviewOptions {
  format?: "webp" | "gif";
  /** Largest file, bytes. */
  maxBytes?: number;
  /** Picture width, px (at most 600). */
  width?: number;
  frames?: number;
}

export interface AnimatedPreview {
  data: Buffer;
  contentType: string;
  width: number;
  height: number;
  frames: number;
  bytes: number;
}

export const MAX_PREVIEW_WIDTH = 600;
export const MAX_PREVIEW_BYTES = 1024 * 1024;

async function encode(
  result: SolvedGeometry,
  format: "webp" | "gif",
  width: number,
  frames: number,
  quality: number,
): Promise<AnimatedPreview> {
  const set = rollingFrames(result, { width, frames });
  const rasters = await Promise.all(set.frames.map((fr) => sharp(Buffer.from(fr.svg)).png().toBuffer()));
  const joined = sharp(rasters, { join: { animated: true } });
  const delay = set.frames.map(() => set.delayMs);
  const data =
    format === "webp"
      ? await joined.webp({ loop: 0, delay, quality, effort: 3 }).toBuffer()
      : await joined.gif({ loop: 0, delay, colours: quality >= 60 ? 64 : 32, effort: 5 }).toBuffer();
  return {
    data,
    contentType: format === "webp" ? "image/webp" : "image/gif",
    width: set.width,
    height: set.height,
    frames: set.frames.length,
    bytes: data.length,
  };
}

export async function animatedPreview(
  result: SolvedGeometry,
  opts: AnimatedPreviewOptions = {},
): Promise<AnimatedPreview> {
  const format = opts.format ?? "webp";
  const maxBytes = opts.maxBytes ?? MAX_PREVIEW_BYTES;
  const width = Math.min(MAX_PREVIEW_WIDTH, Math.max(120, Math.round(opts.width ?? 560)));
  const frames = Math.max(4, Math.round(opts.frames ?? 40));
  // Each step gives up a little more: frames first (the motion stays smooth enough), then quality, then size.
  const steps: Array<[number, number, number]> = [
    [width, frames, 78],
    [width, Math.max(4, Math.round(frames * 0.6)), 70],
    [width, Math.max(4, Math.round(frames * 0.4)), 55],
    [Math.round(width * 0.7), Math.max(4, Math.round(frames * 0.4)), 50],
    [Math.round(width * 0.5), Math.max(4, Math.round(frames * 0.3)), 40],
  ];
  let smallest = Infinity;
  for (const [w, n, q] of steps) {
    const made = await encode(result, format, w, n, q);
    if (made.bytes <= maxBytes) return made;
    smallest = Math.min(smallest, made.bytes);
  }
  throw new Error(`The animated preview does not fit in ${maxBytes} bytes: the smallest made was ${smallest} bytes.`);
}
