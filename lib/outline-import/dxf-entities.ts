// The entities that carry an outline, built by dxf-parser from the checked groups (dxf-groups.ts)
// and turned into points here: LWPOLYLINE (70 bit 1 = closed; each vertex's 42 bulge = tan(θ/4)
// of the arc to the next vertex, positive counter-clockwise), POLYLINE / VERTEX / SEQEND (2-D and
// 3-D polylines; meshes are ignored; spline-frame control points skipped), CIRCLE, and LINE and
// ARC pieces for dxf-chain.ts. Points of LWPOLYLINE, POLYLINE, ARC and CIRCLE are in the entity's
// object coordinate system: an extrusion of (0, 0, −1) mirrors x (the arbitrary-axis algorithm
// gives the OCS x-axis as (−1, 0, 0)); a tilted plane is refused.
//
// Taken from the groups rather than from dxf-parser: the extrusion direction (dxf-parser does not
// read CIRCLE's, and names the others three ways) and an ARC's angles in degrees as written (so a
// full turn stays exactly 360° when the sweep is worked out).

import DxfParser, {
  type IArcEntity,
  type ICircleEntity,
  type IEntity,
  type ILineEntity,
  type ILwpolylineEntity,
  type IPolylineEntity,
} from "dxf-parser";
import { fail, fmt, PointBudget, type Pt, type Subpath } from "./common";
import { flattenArc, type CentreArc } from "./curves";
import type { Piece } from "./dxf-chain";
import { num, type Entity, type Pair } from "./dxf-groups";
import { apply, dist, type Affine } from "./geometry";

const READ = new Set(["LWPOLYLINE", "POLYLINE", "LINE", "ARC", "CIRCLE"]);
const NUMERIC = new Set([10, 20, 11, 21, 40, 42, 50, 51, 70, 210, 220, 230]);
const REQUIRED: Record<string, number[]> = { LINE: [10, 20, 11, 21], ARC: [10, 20, 40, 50, 51], CIRCLE: [10, 20, 40] };
// dxf-parser reads these as x, y[, z] and throws when the y does not follow at once.
const POINTS: Record<string, number[]> = { LINE: [10, 11, 210], ARC: [10], CIRCLE: [10], POLYLINE: [210] };

export interface EntityContext {
  tol: number;
  budget: PointBudget;
  /** Drawing units to output units ($INSUNITS). */
  scale: number;
  subpaths: Subpath[];
  pieces: Piece[];
  notes: string[];
  ignore: (e: Entity, why?: string) => void;
}

function checkNumbers(pairs: Pair[], type: string): void {
  for (const p of pairs) if (NUMERIC.has(p.code)) num(p, type);
}

function checkLwpolyline(e: Entity): number {
  const hasY: boolean[] = [];
  for (const p of e.pairs) {
    if (p.code === 10) hasY.push(false);
    else if (p.code === 20) {
      if (!hasY.length) fail(`DXF line ${p.line}: a y (group 20) before any x (group 10) in the LWPOLYLINE.`);
      hasY[hasY.length - 1] = true;
    } else if (p.code === 42 && !hasY.length)
      fail(`DXF line ${p.line}: a bulge (group 42) before any vertex in the LWPOLYLINE.`);
  }
  const missing = hasY.indexOf(false);
  if (missing >= 0) fail(`DXF line ${e.line}: vertex ${missing + 1} of the LWPOLYLINE has an x but no y.`);
  return hasY.length;
}

/** What dxf-parser does not check, refused with the line; returns an LWPOLYLINE's vertex count. */
function checkEntity(e: Entity): number {
  checkNumbers(e.pairs, e.type);
  for (const code of REQUIRED[e.type] ?? [])
    if (!e.pairs.some((p) => p.code === code)) fail(`DXF line ${e.line}: the ${e.type} has no group ${code}.`);
  for (const code of POINTS[e.type] ?? [])
    e.pairs.forEach((p, i) => {
      if (p.code === code && e.pairs[i + 1]?.code !== code + 10)
        fail(`DXF line ${p.line}: in the ${e.type}, group ${code} must be followed by group ${code + 10}.`);
    });
  for (const v of e.vertices) {
    checkNumbers(v.pairs, "VERTEX");
    const flags = Number(v.pairs.find((q) => q.code === 70)?.value ?? 0);
    const has = (code: number) => v.pairs.some((q) => q.code === code);
    if (!(flags & 16) && (!has(10) || !has(20))) fail(`DXF line ${v.line}: a VERTEX without an x or y.`);
  }
  return e.type === "LWPOLYLINE" ? checkLwpolyline(e) : 0;
}

/** An entity's groups as DXF lines for dxf-parser. An LWPOLYLINE gets its vertex count (group 90)
 * from the vertices it lists, as we have always read it (dxf-parser reads exactly that many), and
 * loses its vertex identifiers (group 91, DXF 2010 and later), at which dxf-parser stops reading
 * vertices. */
function groupLines(type: string, pairs: Pair[], vertices: number): string[] {
  const lw = type === "LWPOLYLINE";
  const kept = pairs.filter((p) => !(lw && (p.code === 90 || p.code === 91)));
  return ["0", type, ...(lw ? ["90", String(vertices)] : []), ...kept.flatMap((p) => [String(p.code), p.value])];
}

/** dxf-parser's reading of the given entities, one for one. */
function parseEntities(entities: Entity[], counts: number[]): IEntity[] {
  const body = entities.flatMap((e, i) => [
    ...groupLines(e.type, e.pairs, counts[i]),
    ...e.vertices.flatMap((v) => groupLines("VERTEX", v.pairs, 0)),
    ...(e.type === "POLYLINE" ? ["0", "SEQEND"] : []),
  ]);
  const text = ["0", "SECTION", "2", "ENTITIES", ...body, "0", "ENDSEC", "0", "EOF"].join("\n");
  let parsed: IEntity[] = [];
  try {
    parsed = new DxfParser().parse(text)?.entities ?? [];
  } catch {
    fail("The DXF's entities could not be read: their groups are not in the order the DXF reference gives.");
  }
  if (parsed.length !== entities.length || parsed.some((p, i) => p.type !== entities[i].type))
    fail("The DXF's entities could not be read: their groups are not in the order the DXF reference gives.");
  return parsed;
}

/** The OCS → output map of an entity: mirror x for extrusion (0, 0, −1), then the unit scale. */
function ocs(e: Entity, scale: number): Affine {
  const value = (code: number, fallback: number) => {
    const p = e.pairs.find((q) => q.code === code);
    return p ? num(p, e.type) : fallback;
  };
  const nx = value(210, 0);
  const ny = value(220, 0);
  const nz = value(230, 1);
  const len = Math.hypot(nx, ny, nz);
  if (!(len > 0)) fail(`DXF line ${e.line}: the ${e.type} has a zero extrusion direction.`);
  if (Math.abs(nx / len) > 1e-9 || Math.abs(ny / len) > 1e-9)
    fail(
      `DXF line ${e.line}: the ${e.type} lies in a tilted plane (extrusion ${fmt(nx)}, ${fmt(ny)}, ${fmt(nz)}); only drawings in the XY plane are read.`,
    );
  return [nz > 0 ? scale : -scale, 0, 0, scale, 0, 0];
}

/** Points after a, ending at b, of the bulged segment a → b (bulge = tan(θ/4)). */
function bulgeTo(
  a: Pt,
  b: Pt,
  bulge: number,
  m: Affine,
  c: EntityContext,
  where: () => string,
): { pts: Pt[]; arc: boolean } {
  const chord = dist(a, b);
  if (bulge === 0 || chord === 0) {
    c.budget.take(1, where);
    return { pts: [apply(m, b[0], b[1])], arc: false };
  }
  const theta = 4 * Math.atan(bulge);
  const h = (chord * (1 - bulge * bulge)) / (4 * bulge); // signed distance of the centre left of the chord
  const ux = (b[0] - a[0]) / chord;
  const uy = (b[1] - a[1]) / chord;
  const cx = (a[0] + b[0]) / 2 - uy * h;
  const cy = (a[1] + b[1]) / 2 + ux * h;
  const r = Math.hypot(a[0] - cx, a[1] - cy);
  const arc: CentreArc = { cx, cy, rx: r, ry: r, phi: 0, theta1: Math.atan2(a[1] - cy, a[0] - cx), dtheta: theta };
  const pts = flattenArc(arc, m, c.tol, c.budget, where);
  pts[pts.length - 1] = apply(m, b[0], b[1]);
  return { pts, arc: true };
}

type Vertex = { p: Pt; bulge: number };

function polyline(verts: Vertex[], closed: boolean, m: Affine, label: string, c: EntityContext): void {
  const where = () => label;
  if (verts.length < 2) return;
  c.budget.take(1, where);
  const pts: Pt[] = [apply(m, verts[0].p[0], verts[0].p[1])];
  let arcs = 0;
  const count = closed ? verts.length : verts.length - 1;
  for (let v = 0; v < count; v++) {
    const seg = bulgeTo(verts[v].p, verts[(v + 1) % verts.length].p, verts[v].bulge, m, c, where);
    pts.push(...seg.pts);
    if (seg.arc) arcs++;
  }
  c.subpaths.push({ points: pts, closed, arcs, curves: 0, label });
}

function lwpolyline(e: Entity, p: ILwpolylineEntity, vertices: number, label: string, c: EntityContext): void {
  const verts = p.vertices ?? [];
  if (verts.length !== vertices || verts.some((v) => typeof v.x !== "number" || typeof v.y !== "number"))
    fail(
      `DXF line ${e.line}: the LWPOLYLINE's vertices could not be read (after each x, group 10, only groups 20, 30, 40, 41 and 42 may follow).`,
    );
  polyline(
    verts.map((v) => ({ p: [v.x, v.y] as Pt, bulge: v.bulge ?? 0 })),
    p.shape === true,
    ocs(e, c.scale),
    label,
    c,
  );
}

function polylineEntity(e: Entity, p: IPolylineEntity, label: string, c: EntityContext): void {
  if ((p.vertices ?? []).length !== e.vertices.length)
    fail(`DXF line ${e.line}: the POLYLINE's vertices could not be read.`);
  if (p.is3dPolygonMesh || p.isPolyfaceMesh) return c.ignore(e, " mesh");
  if (p.includesCurveFitVertices || p.includesSplineFitVertices)
    c.notes.push(`${label} is curve- or spline-fitted; its fitted vertices are used`);
  const verts = p.vertices
    .filter((v) => !v.splineControlPoint)
    .map((v) => ({ p: [v.x, v.y] as Pt, bulge: v.bulge ?? 0 }));
  // A 3-D polyline's vertices are world coordinates; a 2-D one's are in its OCS.
  const m: Affine = p.is3dPolyline ? [c.scale, 0, 0, c.scale, 0, 0] : ocs(e, c.scale);
  polyline(verts, p.shape === true, m, label, c);
}

function line(p: ILineEntity, label: string, c: EntityContext): void {
  c.budget.take(2, () => label);
  const wcs: Affine = [c.scale, 0, 0, c.scale, 0, 0];
  const [a, b] = p.vertices.map((v) => apply(wcs, v.x, v.y));
  if (dist(a, b) > 0) c.pieces.push({ points: [a, b], label, arcs: 0 });
}

function arcOrCircle(e: Entity, p: IArcEntity | ICircleEntity, label: string, c: EntityContext): void {
  const m = ocs(e, c.scale);
  const r = p.radius;
  if (!(r > 0)) fail(`DXF line ${e.line}: the ${e.type} has a radius of ${fmt(r)}; it must be positive.`);
  const { x: cx, y: cy } = p.center;
  const degrees = (code: number) =>
    num(
      e.pairs.find((q) => q.code === code)!,
      e.type,
    );
  const a0 = e.type === "ARC" ? (degrees(50) * Math.PI) / 180 : 0;
  let sweep = 2 * Math.PI;
  if (e.type === "ARC") {
    // Counter-clockwise from the start angle to the end angle (degrees).
    let d = (degrees(51) - degrees(50)) % 360;
    if (d <= 0) d += 360;
    sweep = (d * Math.PI) / 180;
  }
  const arc: CentreArc = { cx, cy, rx: r, ry: r, phi: 0, theta1: a0, dtheta: sweep };
  c.budget.take(1, () => label);
  const pts = [apply(m, cx + r * Math.cos(a0), cy + r * Math.sin(a0))].concat(
    flattenArc(arc, m, c.tol, c.budget, () => label),
  );
  if (e.type === "CIRCLE") {
    pts[pts.length - 1] = pts[0];
    c.subpaths.push({ points: pts, closed: true, arcs: 1, curves: 0, label });
  } else c.pieces.push({ points: pts, label, arcs: 1 });
}

/** Adds the geometry of the entities to c (closed shapes to subpaths, LINE/ARC to pieces). */
export function readEntities(entities: Entity[], c: EntityContext): void {
  const read = entities.filter((e) => READ.has(e.type));
  const counts = read.map(checkEntity);
  const parsed = parseEntities(read, counts);
  for (const e of entities) if (!READ.has(e.type)) c.ignore(e);
  read.forEach((e, i) => {
    const label = `${e.type} on DXF line ${e.line}`;
    const p = parsed[i];
    if (e.type === "LWPOLYLINE") lwpolyline(e, p as ILwpolylineEntity, counts[i], label, c);
    else if (e.type === "POLYLINE") polylineEntity(e, p as IPolylineEntity, label, c);
    else if (e.type === "LINE") line(p as ILineEntity, label, c);
    else arcOrCircle(e, p as IArcEntity | ICircleEntity, label, c);
  });
}
