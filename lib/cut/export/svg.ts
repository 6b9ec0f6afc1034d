// SVG out at true scale: width and height carry the unit (SVG 1.1 §7.10: "mm", "in"), and the
// viewBox is in that unit, so one user unit is one millimetre (or inch). y is flipped (y' = height
// − y) so the picture reads like the DXF, whose y points up. One <g> per layer with its own stroke
// colour; rings are closed paths ("Z"), drill holes circles, engraving one path of line segments.
// The preview variant (for the PNGs) adds a paper background, a light fill for the parts and
// strokes wide enough to see at screen size.
import { LAYERS, type Drawing, type LayerName } from "./drawing";

/** Our own stroke colours: ink blue cuts, teal holes, plum drill marks, olive engraving, grey sheet. */
export const LAYER_COLOUR: Record<LayerName, string> = {
  CUT_OUTSIDE: "#1d3f8f",
  CUT_INSIDE: "#1f7a8c",
  DRILL: "#8e3b8e",
  ENGRAVE: "#5d7a1f",
  REFERENCE: "#8a8272",
};

export function drawingToSvg(d: Drawing, opts: { preview?: boolean; title?: string } = {}): string {
  const digits = d.units === "in" ? 5 : 4;
  const f = (v: number) => String(Number(v.toFixed(digits)));
  const H = d.height;
  const P = (x: number, y: number) => `${f(x)} ${f(H - y)}`;
  const hairline = d.units === "in" ? 0.004 : 0.1;
  const stroke = opts.preview ? Math.max(d.width, d.height) / 900 : hairline;
  const out: string[] = [];
  out.push(`<?xml version="1.0" encoding="UTF-8"?>`);
  out.push(
    `<svg xmlns="http://www.w3.org/2000/svg" width="${f(d.width)}${d.units}" height="${f(d.height)}${d.units}" viewBox="0 0 ${f(d.width)} ${f(d.height)}">`,
  );
  if (opts.title) out.push(`<title>${escapeXml(opts.title)}</title>`);
  if (opts.preview) {
    out.push(`<rect x="0" y="0" width="${f(d.width)}" height="${f(d.height)}" fill="#f5efe0"/>`);
    const fill = d.rings
      .filter((r) => r.layer === "CUT_OUTSIDE" || r.layer === "CUT_INSIDE")
      .map((r) => ringPath(r.points, P))
      .join("");
    if (fill) out.push(`<path d="${fill}" fill="#dfe6f2" fill-rule="evenodd" stroke="none"/>`);
  }
  for (const layer of LAYERS) {
    const body: string[] = [];
    for (const r of d.rings) if (r.layer === layer) body.push(`<path d="${ringPath(r.points, P)}"/>`);
    for (const c of d.circles)
      if (c.layer === layer) body.push(`<circle cx="${f(c.x)}" cy="${f(H - c.y)}" r="${f(c.r)}"/>`);
    const segs = d.lines.filter((l) => l.layer === layer).map((l) => `M${P(l.a[0], l.a[1])}L${P(l.b[0], l.b[1])}`);
    if (segs.length) body.push(`<path d="${segs.join("")}"/>`);
    for (const t of d.texts)
      if (t.layer === layer)
        body.push(
          `<text x="${f(t.x)}" y="${f(H - t.y)}" font-size="${f(t.height * 1.4)}" font-family="IBM Plex Mono, DejaVu Sans Mono, monospace" fill="${LAYER_COLOUR[layer]}" stroke="none">${escapeXml(t.text)}</text>`,
        );
    out.push(
      `<g id="${layer}" fill="none" stroke="${LAYER_COLOUR[layer]}" stroke-width="${f(stroke)}" stroke-linejoin="round" stroke-linecap="round"${layer === "REFERENCE" && !opts.preview ? ' stroke-dasharray="5 5"' : ""}>`,
    );
    out.push(...body);
    out.push(`</g>`);
  }
  out.push(`</svg>`);
  return out.join("\n") + "\n";
}

function ringPath(points: Array<[number, number]>, P: (x: number, y: number) => string): string {
  return `M${points.map(([x, y]) => P(x, y)).join("L")}Z`;
}

export function escapeXml(s: string): string {
  return s.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/>/g, "&gt;").replace(/"/g, "&quot;");
}
