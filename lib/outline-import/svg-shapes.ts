// The basic shapes of SVG 1.1 §9 and <path> as flattened subpaths, already mapped by the element's
// full transform m: <rect> (rx/ry per §9.2), <circle>, <ellipse>, <line>, <polyline>, <polygon>.

import { fail, PointBudget, type Pt, type Subpath } from "./common";
import { arcPoint, flattenArc, type CentreArc } from "./curves";
import { apply, type Affine } from "./geometry";
import { numberList } from "./svg-numbers";
import { pathToSubpaths, type PathCounter } from "./svg-path";
import { lengthOf } from "./svg-units";

export const GEOMETRY = new Set(["path", "rect", "circle", "ellipse", "polygon", "polyline", "line"]);

export interface ShapeContext {
  tol: number;
  budget: PointBudget;
  counter: PathCounter;
  subpaths: Subpath[];
}

interface Shape {
  el: string;
  a: Map<string, string>;
  m: Affine;
  line: number;
  label: string;
  where: () => string;
  L: (attr: string, fallback?: number) => number;
  pt: (x: number, y: number) => Pt;
  push: (points: Pt[], closed: boolean, arcs: number) => void;
}

function ellipseLoop(s: Shape, c: ShapeContext, cx: number, cy: number, rx: number, ry: number): void {
  const arc: CentreArc = { cx, cy, rx, ry, phi: 0, theta1: 0, dtheta: 2 * Math.PI };
  c.budget.take(1, s.where);
  s.push([s.pt(...arcPoint(arc, 0))].concat(flattenArc(arc, s.m, c.tol, c.budget, s.where)), true, 1);
}

function polyPoints(s: Shape, c: ShapeContext): void {
  const v = s.a.get("points") ?? "";
  const { numbers: nums, end } = numberList(v);
  if (end < v.length)
    fail(`${s.label}: its points cannot be read at character ${end + 1} ("${v.slice(end, end + 20)}").`);
  if (nums.length % 2 === 1)
    fail(`${s.label}: its points hold an odd count of numbers (${nums.length}); they must come in x, y pairs.`);
  c.budget.take(nums.length / 2, s.where);
  const pts: Pt[] = [];
  for (let k = 0; k < nums.length; k += 2) pts.push(s.pt(nums[k], nums[k + 1]));
  s.push(pts, s.el === "polygon", 0);
}

function rect(s: Shape, c: ShapeContext): void {
  const { L, pt, label } = s;
  const x = L("x");
  const y = L("y");
  const w = L("width");
  const h = L("height");
  if (w < 0 || h < 0) fail(`${label}: a negative width or height.`);
  if (w === 0 || h === 0) return;
  // SVG 1.1 §9.2: a missing rx takes ry and vice versa; each is at most half the side.
  let rx = s.a.has("rx") ? L("rx") : s.a.has("ry") ? L("ry") : 0;
  let ry = s.a.has("ry") ? L("ry") : rx;
  if (rx < 0 || ry < 0) fail(`${label}: a negative corner radius.`);
  rx = Math.min(rx, w / 2);
  ry = Math.min(ry, h / 2);
  if (rx === 0 || ry === 0) {
    c.budget.take(4, s.where);
    s.push([pt(x, y), pt(x + w, y), pt(x + w, y + h), pt(x, y + h)], true, 0);
    return;
  }
  const pts: Pt[] = [pt(x + rx, y)];
  const corner = (cx: number, cy: number, from: number) => {
    const arc: CentreArc = { cx, cy, rx, ry, phi: 0, theta1: from, dtheta: Math.PI / 2 };
    pts.push(...flattenArc(arc, s.m, c.tol, c.budget, s.where));
  };
  c.budget.take(5, s.where);
  pts.push(pt(x + w - rx, y));
  corner(x + w - rx, y + ry, -Math.PI / 2);
  pts.push(pt(x + w, y + h - ry));
  corner(x + w - rx, y + h - ry, 0);
  pts.push(pt(x + rx, y + h));
  corner(x + rx, y + h - ry, Math.PI / 2);
  pts.push(pt(x, y + ry));
  corner(x + rx, y + ry, Math.PI);
  s.push(pts, true, 4);
}

/** Adds the subpaths of one geometry element to c.subpaths. */
export function drawShape(el: string, a: Map<string, string>, m: Affine, line: number, c: ShapeContext): void {
  const label = `<${el}${a.has("id") ? ` id="${a.get("id")!.slice(0, 40)}"` : ""}> on line ${line}`;
  const s: Shape = {
    el,
    a,
    m,
    line,
    label,
    where: () => label,
    L: (k, fallback = 0) => lengthOf(a.get(k), el, k, line, fallback),
    pt: (x, y) => apply(m, x, y),
    push: (points, closed, arcs) => {
      if (points.length >= 2) c.subpaths.push({ points, closed, arcs, curves: 0, label });
    },
  };
  switch (el) {
    case "path": {
      const d = a.get("d");
      if (d !== undefined && d.trim() !== "")
        c.subpaths.push(...pathToSubpaths(d, m, c.tol, c.budget, label, c.counter));
      return;
    }
    case "polygon":
    case "polyline":
      return polyPoints(s, c);
    case "line":
      c.budget.take(2, s.where);
      return s.push([s.pt(s.L("x1"), s.L("y1")), s.pt(s.L("x2"), s.L("y2"))], false, 0);
    case "circle": {
      const r = s.L("r");
      if (r < 0) fail(`${label}: a negative radius.`);
      if (r > 0) ellipseLoop(s, c, s.L("cx"), s.L("cy"), r, r);
      return;
    }
    case "ellipse": {
      const rx = s.L("rx");
      const ry = s.L("ry");
      if (rx < 0 || ry < 0) fail(`${label}: a negative radius.`);
      if (rx > 0 && ry > 0) ellipseLoop(s, c, s.L("cx"), s.L("cy"), rx, ry);
      return;
    }
    case "rect":
      return rect(s, c);
  }
}
