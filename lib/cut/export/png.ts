// Node only: a PNG preview rendered from the preview SVG by sharp (libvips with librsvg).
import sharp from "sharp";

/** Renders an SVG whose width is given in mm or in at `widthPx` pixels across. */
export async function svgToPng(svg: string, widthPx = 1600): Promise<Buffer> {
  const m = svg.match(/<svg[^>]*\swidth="([\d.]+)(mm|in)"/);
  const inches = m ? Number(m[1]) / (m[2] === "mm" ? 25.4 : 1) : widthPx / 96;
  // Measured with sharp 0.35 / librsvg 2.63: a physical length renders at density px/in, and sharp
  // scales that again by density/72, so pixels = inches × density² / 72.
  const density = Math.min(2400, Math.max(1, Math.sqrt((72 * widthPx) / inches)));
  return sharp(Buffer.from(svg), { density }).resize({ width: widthPx }).png().toBuffer();
}
