// An ASCII DXF reader for outlines. A DXF file is a list of group-code / value pairs, one per line
// (AutoCAD DXF Reference, "DXF Format": group codes 0 entity type, 10/20 x/y, 11/21 second point,
// 40 radius, 42 bulge, 50/51 start/end angle in degrees, 70 flags, 210–230 extrusion direction).
// Lines may end in CRLF, CR or LF and carry padding; both are tolerated.
//
// Read: $INSUNITS from the HEADER (0 unitless, 1 inches, 2 feet, 4 millimetres, 5 centimetres, 6
// metres, … per the $INSUNITS table of the DXF reference), and in ENTITIES: LWPOLYLINE (70 bit 1 =
// closed; each vertex's 42 bulge = tan(θ/4) of the arc to the next vertex, positive counter-
// clockwise), POLYLINE / VERTEX / SEQEND (2-D and 3-D polylines; meshes are ignored; spline-frame
// control points skipped), CIRCLE, and LINE and ARC entities joined end to end, within the chord
// tolerance, into chains (one loop when they meet). Points of LWPOLYLINE, POLYLINE, ARC and CIRCLE
// are in the entity's object coordinate system: an extrusion of (0, 0, −1) mirrors x (the
// arbitrary-axis algorithm gives the OCS x-axis as (−1, 0, 0)); a tilted plane is refused. Other
// entities, and the BLOCKS section (INSERT is not followed), are noted and ignored.

import { fail, fmt, fmtPt, MAX_DXF_ENTITIES, PointBudget, type Pt, type ReadResult, type Subpath, type Units } from "./common";
import { flattenArc, type CentreArc } from "./curves";
import { apply, dist, type Affine } from "./geometry";

interface Pair {
  code: number;
  value: string;
  line: number;
}

interface Entity {
  type: string;
  line: number;
  pairs: Pair[];
}

const NUMBER = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;

// $INSUNITS code → output unit and factor (DXF reference, HEADER section, $INSUNITS).
const INSUNITS: Record<number, { units: "mm" | "in"; scale: number; name: string }> = {
  1: { units: "in", scale: 1, name: "inches" },
  2: { units: "in", scale: 12, name: "feet" },
  3: { units: "in", scale: 63360, name: "miles" },
  4: { units: "mm", scale: 1, name: "millimetres" },
  5: { units: "mm", scale: 10, name: "centimetres" },
  6: { units: "mm", scale: 1000, name: "metres" },
  7: { units: "mm", scale: 1e6, name: "kilometres" },
  8: { units: "in", scale: 1e-6, name: "microinches" },
  9: { units: "in", scale: 1e-3, name: "mils" },
  10: { units: "in", scale: 36, name: "yards" },
  11: { units: "mm", scale: 1e-7, name: "ångströms" },
  12: { units: "mm", scale: 1e-6, name: "nanometres" },
  13: { units: "mm", scale: 1e-3, name: "microns" },
  14: { units: "mm", scale: 100, name: "decimetres" },
  15: { units: "mm", scale: 1e4, name: "decametres" },
  16: { units: "mm", scale: 1e5, name: "hectometres" },
  21: { units: "in", scale: 1200 / 3937 / 0.0254, name: "US survey feet" },
};

function pairsOf(text: string): Pair[] {
  const lines = text.split(/\r\n|\r|\n/);
  while (lines.length && lines[lines.length - 1].trim() === "") lines.pop();
  const pairs: Pair[] = [];
  for (let k = 0; k < lines.length; k += 2) {
    const codeText = lines[k].trim();
    if (!/^-?\d{1,4}$/.test(codeText)) fail(`DXF line ${k + 1}: expected a group code (a whole number), found "${codeText.slice(0, 30)}".`);
    if (k + 1 >= lines.length) fail(`DXF line ${k + 1}: group code ${codeText} has no value line; the file may be cut short.`);
    pairs.push({ code: Number(codeText), value: lines[k + 1].trim(), line: k + 1 });
  }
  return pairs;
}

function num(p: Pair, type: string): number {
  if (!NUMBER.test(p.value)) fail(`DXF line ${p.line + 1}: group ${p.code} of the ${type} should be a number, found "${p.value.slice(0, 30)}".`);
  const v = Number(p.value);
  if (!Number.isFinite(v)) fail(`DXF line ${p.line + 1}: the number "${p.value.slice(0, 30)}" is out of range.`);
  return v;
}

interface Piece {
  points: Pt[];
  label: string;
  arcs: number;
}

export function readDxf(text: string, tol: number, budget: PointBudget): ReadResult {
  const pairs = pairsOf(text);
  const notes: string[] = [];
  let units: Units = "unknown";
  let scale = 1;
  let insunits: number | null = null;
  const entities: Entity[] = [];
  let sawEntities = false;
  let sawEof = false;
  let blocksWithGeometry = 0;

  // Sections: 0 SECTION, 2 name, …, 0 ENDSEC; then 0 EOF.
  let k = 0;
  while (k < pairs.length) {
    const p = pairs[k];
    if (p.code === 999) {
      k++;
      continue;
    }
    if (p.code === 0 && p.value === "EOF") {
      sawEof = true;
      break;
    }
    if (!(p.code === 0 && p.value === "SECTION")) fail(`DXF line ${p.line}: expected "0 / SECTION" or "0 / EOF", found "${p.code} / ${p.value.slice(0, 30)}".`);
    const nm = pairs[k + 1];
    if (!nm || nm.code !== 2) fail(`DXF line ${p.line + 2}: a SECTION must be followed by its name (group code 2).`);
    const name = nm.value;
    k += 2;
    const startLine = p.line;
    let current: Entity | null = null;
    let closed = false;
    for (; k < pairs.length; k++) {
      const q = pairs[k];
      if (q.code === 0 && q.value === "ENDSEC") {
        closed = true;
        k++;
        break;
      }
      if (name === "HEADER" && q.code === 9 && q.value === "$INSUNITS") {
        const v = pairs[k + 1];
        if (v && v.code === 70) {
          if (!/^[+-]?\d+$/.test(v.value)) fail(`DXF line ${v.line + 1}: $INSUNITS should be a whole number, found "${v.value.slice(0, 30)}".`);
          insunits = Number(v.value);
        }
      }
      if (name === "BLOCKS" && q.code === 0 && ["LINE", "ARC", "LWPOLYLINE", "POLYLINE", "CIRCLE"].includes(q.value)) blocksWithGeometry++;
      if (name === "ENTITIES") {
        sawEntities = true;
        if (q.code === 0) {
          if (entities.length >= MAX_DXF_ENTITIES)
            fail(`The DXF has more than ${MAX_DXF_ENTITIES.toLocaleString("en-US")} entities, the most the importer reads; simplify the drawing.`);
          current = { type: q.value, line: q.line, pairs: [] };
          entities.push(current);
        } else if (current) current.pairs.push(q);
        else fail(`DXF line ${q.line}: the ENTITIES section must start with an entity (group code 0).`);
      }
    }
    if (!closed) fail(`The DXF ends inside the ${name} section that starts on line ${startLine} (no ENDSEC); the file may be cut short.`);
  }
  if (!sawEof) notes.push("the DXF has no EOF marker after its last section");
  if (!sawEntities) fail("The DXF has no ENTITIES section, so there is no geometry to read.");

  if (insunits !== null && INSUNITS[insunits]) {
    const u = INSUNITS[insunits];
    units = u.units;
    scale = u.scale;
    notes.push(u.scale === 1 ? `units ${units} ($INSUNITS ${insunits})` : `drawing units ${u.name} ($INSUNITS ${insunits}) converted to ${units}; the tolerance is taken in ${units}`);
  } else if (insunits === null) notes.push("units unknown: the DXF header has no $INSUNITS");
  else if (insunits === 0) notes.push("units unknown: $INSUNITS is 0 (unitless)");
  else notes.push(`units unknown: $INSUNITS ${insunits} is not a length unit the importer converts`);
  if (blocksWithGeometry) notes.push(`ignored geometry inside block definitions (BLOCKS section); INSERT references are not followed`);

  const subpaths: Subpath[] = [];
  const pieces: Piece[] = [];
  const ignored = new Map<string, { count: number; line: number }>();
  const ignore = (e: Entity, why = "") => {
    const key = e.type + why;
    const s = ignored.get(key);
    if (s) s.count++;
    else ignored.set(key, { count: 1, line: e.line });
  };

  /** The OCS → output map of an entity: mirror x for extrusion (0, 0, −1), then the unit scale. */
  const ocs = (e: Entity): Affine => {
    let nx = 0;
    let ny = 0;
    let nz = 1;
    for (const p of e.pairs) {
      if (p.code === 210) nx = num(p, e.type);
      if (p.code === 220) ny = num(p, e.type);
      if (p.code === 230) nz = num(p, e.type);
    }
    const len = Math.hypot(nx, ny, nz);
    if (!(len > 0)) fail(`DXF line ${e.line}: the ${e.type} has a zero extrusion direction.`);
    if (Math.abs(nx / len) > 1e-9 || Math.abs(ny / len) > 1e-9)
      fail(`DXF line ${e.line}: the ${e.type} lies in a tilted plane (extrusion ${fmt(nx)}, ${fmt(ny)}, ${fmt(nz)}); only drawings in the XY plane are read.`);
    return [nz > 0 ? scale : -scale, 0, 0, scale, 0, 0];
  };
  const wcs: Affine = [scale, 0, 0, scale, 0, 0];

  /** Points after a, ending at b, of the bulged segment a → b (bulge = tan(θ/4)). */
  const bulgeTo = (a: Pt, b: Pt, bulge: number, m: Affine, where: () => string): { pts: Pt[]; arc: boolean } => {
    const c = dist(a, b);
    if (bulge === 0 || c === 0) {
      budget.take(1, where);
      return { pts: [apply(m, b[0], b[1])], arc: false };
    }
    const theta = 4 * Math.atan(bulge);
    const h = (c * (1 - bulge * bulge)) / (4 * bulge); // signed distance of the centre left of the chord
    const ux = (b[0] - a[0]) / c;
    const uy = (b[1] - a[1]) / c;
    const cx = (a[0] + b[0]) / 2 - uy * h;
    const cy = (a[1] + b[1]) / 2 + ux * h;
    const r = Math.hypot(a[0] - cx, a[1] - cy);
    const arc: CentreArc = { cx, cy, rx: r, ry: r, phi: 0, theta1: Math.atan2(a[1] - cy, a[0] - cx), dtheta: theta };
    const pts = flattenArc(arc, m, tol, budget, where);
    pts[pts.length - 1] = apply(m, b[0], b[1]);
    return { pts, arc: true };
  };

  const polyline = (verts: Array<{ p: Pt; bulge: number }>, closedFlag: boolean, m: Affine, label: string) => {
    const where = () => label;
    if (verts.length < 2) return;
    budget.take(1, where);
    const pts: Pt[] = [apply(m, verts[0].p[0], verts[0].p[1])];
    let arcs = 0;
    const count = closedFlag ? verts.length : verts.length - 1;
    for (let v = 0; v < count; v++) {
      const a = verts[v];
      const b = verts[(v + 1) % verts.length];
      const seg = bulgeTo(a.p, b.p, a.bulge, m, where);
      pts.push(...seg.pts);
      if (seg.arc) arcs++;
    }
    subpaths.push({ points: pts, closed: closedFlag, arcs, curves: 0, label });
  };

  for (let e = 0; e < entities.length; e++) {
    const ent = entities[e];
    const label = `${ent.type} on DXF line ${ent.line}`;
    const get = (code: number, fallback?: number): number => {
      const p = ent.pairs.find((q) => q.code === code);
      if (!p) {
        if (fallback === undefined) fail(`DXF line ${ent.line}: the ${ent.type} has no group ${code}.`);
        return fallback as number;
      }
      return num(p, ent.type);
    };
    switch (ent.type) {
      case "LWPOLYLINE": {
        const flags = get(70, 0);
        const verts: Array<{ p: Pt; bulge: number }> = [];
        for (const p of ent.pairs) {
          if (p.code === 10) verts.push({ p: [num(p, ent.type), NaN], bulge: 0 });
          else if (p.code === 20) {
            if (!verts.length) fail(`DXF line ${p.line}: a y (group 20) before any x (group 10) in the LWPOLYLINE.`);
            verts[verts.length - 1].p[1] = num(p, ent.type);
          } else if (p.code === 42) {
            if (!verts.length) fail(`DXF line ${p.line}: a bulge (group 42) before any vertex in the LWPOLYLINE.`);
            verts[verts.length - 1].bulge = num(p, ent.type);
          }
        }
        const missing = verts.findIndex((v) => Number.isNaN(v.p[1]));
        if (missing >= 0) fail(`DXF line ${ent.line}: vertex ${missing + 1} of the LWPOLYLINE has an x but no y.`);
        polyline(verts, (flags & 1) === 1, ocs(ent), label);
        break;
      }
      case "POLYLINE": {
        const flags = get(70, 0);
        const verts: Array<{ p: Pt; bulge: number }> = [];
        let f = e + 1;
        for (; f < entities.length && entities[f].type === "VERTEX"; f++) {
          const v = entities[f];
          const vflags = Number(v.pairs.find((q) => q.code === 70)?.value ?? 0) || 0;
          if (vflags & 16) continue; // spline frame control point: not on the curve
          const x = v.pairs.find((q) => q.code === 10);
          const y = v.pairs.find((q) => q.code === 20);
          if (!x || !y) fail(`DXF line ${v.line}: a VERTEX without an x or y.`);
          const b = v.pairs.find((q) => q.code === 42);
          verts.push({ p: [num(x!, "VERTEX"), num(y!, "VERTEX")], bulge: b ? num(b, "VERTEX") : 0 });
        }
        if (f >= entities.length || entities[f].type !== "SEQEND") fail(`DXF line ${ent.line}: the POLYLINE has no SEQEND after its vertices.`);
        e = f;
        if (flags & (16 | 64)) {
          ignore(ent, " mesh");
          break;
        }
        if (flags & (2 | 4)) notes.push(`${label} is curve- or spline-fitted; its fitted vertices are used`);
        // A 3-D polyline's vertices are world coordinates; a 2-D one's are in its OCS.
        polyline(verts, (flags & 1) === 1, flags & 8 ? wcs : ocs(ent), label);
        break;
      }
      case "VERTEX":
      case "SEQEND":
        fail(`DXF line ${ent.line}: a ${ent.type} outside a POLYLINE.`);
        break;
      case "LINE": {
        budget.take(2, () => label);
        const a = apply(wcs, get(10), get(20));
        const b = apply(wcs, get(11), get(21));
        if (dist(a, b) > 0) pieces.push({ points: [a, b], label, arcs: 0 });
        break;
      }
      case "ARC":
      case "CIRCLE": {
        const m = ocs(ent);
        const r = get(40);
        if (!(r > 0)) fail(`DXF line ${ent.line}: the ${ent.type} has a radius of ${fmt(r)}; it must be positive.`);
        const cx = get(10);
        const cy = get(20);
        const a0 = ent.type === "ARC" ? (get(50) * Math.PI) / 180 : 0;
        let sweep = 2 * Math.PI;
        if (ent.type === "ARC") {
          // Counter-clockwise from the start angle to the end angle (degrees).
          let d = (get(51) - get(50)) % 360;
          if (d <= 0) d += 360;
          sweep = (d * Math.PI) / 180;
        }
        const arc: CentreArc = { cx, cy, rx: r, ry: r, phi: 0, theta1: a0, dtheta: sweep };
        budget.take(1, () => label);
        const pts = [apply(m, cx + r * Math.cos(a0), cy + r * Math.sin(a0))].concat(flattenArc(arc, m, tol, budget, () => label));
        if (ent.type === "CIRCLE") {
          pts[pts.length - 1] = pts[0];
          subpaths.push({ points: pts, closed: true, arcs: 1, curves: 0, label });
        } else pieces.push({ points: pts, label, arcs: 1 });
        break;
      }
      default:
        ignore(ent);
    }
  }
  for (const [key, s] of ignored)
    notes.push(`ignored ${s.count} ${key} ${s.count === 1 ? "entity" : "entities"} (first on DXF line ${s.line}); only LWPOLYLINE, POLYLINE, LINE, ARC and CIRCLE are read`);

  if (pieces.length) subpaths.push(...chain(pieces, tol, notes));
  return { subpaths, units, notes };
}

/** LINE and ARC pieces joined end to end where their ends lie within tol (reversing as needed). */
function chain(pieces: Piece[], tol: number, notes: string[]): Subpath[] {
  const cell = tol;
  const grid = new Map<string, Array<{ piece: number; end: 0 | 1 }>>();
  const key = (p: Pt, dx = 0, dy = 0) => {
    const gx = Math.floor(p[0] / cell) + dx;
    const gy = Math.floor(p[1] / cell) + dy;
    if (!Number.isFinite(gx) || !Number.isFinite(gy)) fail("The DXF's coordinates are too large for the tolerance; use a larger tolerance.");
    return `${gx},${gy}`;
  };
  const endOf = (i: number, end: 0 | 1): Pt => (end === 0 ? pieces[i].points[0] : pieces[i].points[pieces[i].points.length - 1]);
  pieces.forEach((_, i) => {
    for (const end of [0, 1] as const) {
      const k = key(endOf(i, end));
      const list = grid.get(k) ?? [];
      list.push({ piece: i, end });
      grid.set(k, list);
    }
  });
  const used = new Array<boolean>(pieces.length).fill(false);
  const near = (p: Pt): Array<{ piece: number; end: 0 | 1 }> => {
    const found: Array<{ piece: number; end: 0 | 1 }> = [];
    for (let dx = -1; dx <= 1; dx++)
      for (let dy = -1; dy <= 1; dy++)
        for (const c of grid.get(key(p, dx, dy)) ?? []) if (!used[c.piece] && dist(endOf(c.piece, c.end), p) <= tol) found.push(c);
    return found;
  };
  const out: Subpath[] = [];
  for (let s = 0; s < pieces.length; s++) {
    if (used[s]) continue;
    used[s] = true;
    let pts = pieces[s].points.slice();
    let arcs = pieces[s].arcs;
    let count = 1;
    const first = pieces[s].label;
    for (const direction of ["forward", "backward"] as const) {
      for (;;) {
        const tip = direction === "forward" ? pts[pts.length - 1] : pts[0];
        const found = near(tip);
        if (found.length === 0) break;
        if (found.length > 1)
          fail(
            `Three or more LINE/ARC ends meet at ${fmtPt(tip)} (${[first, ...found.map((c) => pieces[c.piece].label)].slice(0, 4).join(", ")}); ` +
              "the pieces must join into a single chain.",
          );
        const c = found[0];
        used[c.piece] = true;
        count++;
        arcs += pieces[c.piece].arcs;
        let add = pieces[c.piece].points.slice();
        if (direction === "forward") {
          if (c.end === 1) add.reverse();
          pts = pts.concat(add.slice(1));
        } else {
          if (c.end === 0) add.reverse();
          add = add.slice(0, -1);
          pts = add.concat(pts);
        }
      }
      // A chain that came back to its start needs no backward pass.
      if (direction === "forward" && count > 1 && dist(pts[0], pts[pts.length - 1]) <= tol) break;
    }
    const closed = dist(pts[0], pts[pts.length - 1]) <= tol && pts.length > 2;
    out.push({ points: pts, closed, arcs, curves: 0, label: `the chain of ${count} LINE/ARC piece${count === 1 ? "" : "s"} that includes ${first}` });
  }
  if (out.length > 1) notes.push(`the LINE and ARC entities form ${out.length} separate chains (joined where ends lie within ${fmt(tol)})`);
  return out;
}
