// DXF out with @tarikjabiri/dxf (AC1021, i.e. AutoCAD 2007): $INSUNITS 4 (mm) or 1 (in) in the
// header (Autodesk DXF Reference, "$INSUNITS"), one LAYER table entry per layer, every ring a
// closed LWPOLYLINE (group 70 flag 1), drill holes as CIRCLE, engraving as LINE entities so that
// every polyline in the file is a closed contour (docs/fabrication.md §3.2: open paths read as slits); notes (the
// approval line) as TEXT on REFERENCE, which is never cut.
import { DxfWriter, LWPolylineFlags, Units } from "@tarikjabiri/dxf";
import { LAYERS, type Drawing, type LayerName } from "./drawing";

/** AutoCAD Color Index per layer (ACI 5 blue, 4 cyan, 6 magenta, 3 green, 8 grey). */
export const LAYER_ACI: Record<LayerName, number> = {
  CUT_OUTSIDE: 5,
  CUT_INSIDE: 4,
  DRILL: 6,
  ENGRAVE: 3,
  REFERENCE: 8,
};

export function drawingToDxf(d: Drawing): string {
  const dxf = new DxfWriter();
  dxf.setUnits(d.units === "in" ? Units.Inches : Units.Millimeters);
  // $MEASUREMENT: 0 English, 1 metric (Autodesk DXF Reference, header variables).
  dxf.setVariable("$MEASUREMENT", { 70: d.units === "in" ? 0 : 1 });
  dxf.setVariable("$EXTMIN", { 10: 0, 20: 0, 30: 0 });
  dxf.setVariable("$EXTMAX", { 10: d.width, 20: d.height, 30: 0 });
  for (const name of LAYERS) dxf.addLayer(name, LAYER_ACI[name]);
  for (const r of d.rings)
    dxf.addLWPolyline(
      r.points.map(([x, y]) => ({ point: { x, y } })),
      { flags: LWPolylineFlags.Closed, layerName: r.layer },
    );
  for (const c of d.circles) dxf.addCircle({ x: c.x, y: c.y, z: 0 }, c.r, { layerName: c.layer });
  for (const t of d.texts) dxf.addText({ x: t.x, y: t.y, z: 0 }, t.height, t.text, { layerName: t.layer });
  for (const l of d.lines)
    dxf.addLine({ x: l.a[0], y: l.a[1], z: 0 }, { x: l.b[0], y: l.b[1], z: 0 }, { layerName: l.layer });
  return dxf.stringify();
}
