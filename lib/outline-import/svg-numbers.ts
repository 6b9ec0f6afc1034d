// Number lists in SVG attributes: a polygon's points (SVG 1.1 §9.7.1), a viewBox (§7.7) and the
// arguments of a transform function (§7.6) are numbers separated by whitespace and at most one
// comma. svg-pathdata reads path data only, so these plain lists are read here with one pattern.

import { fail } from "./common";
import { IDENTITY, multiply, type Affine } from "./geometry";

const NUMBER = /[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?/y;
const COMMA_WSP = /[ \t\r\n\f]*,?[ \t\r\n\f]*/y;

/** The numbers of a list, and where reading stopped (the string's length when all of it was read). */
export function numberList(s: string): { numbers: number[]; end: number } {
  const numbers: number[] = [];
  let i = s.length - s.replace(/^[ \t\r\n\f]+/, "").length;
  while (i < s.length) {
    NUMBER.lastIndex = i;
    const m = NUMBER.exec(s);
    const v = m ? Number(m[0]) : NaN;
    if (!m || !Number.isFinite(v)) break;
    numbers.push(v);
    COMMA_WSP.lastIndex = i + m[0].length;
    i = COMMA_WSP.exec(s) ? COMMA_WSP.lastIndex : i + m[0].length;
  }
  return { numbers, end: i };
}

const FUNCTION = /[ \t\r\n\f]*(matrix|translate|scale|rotate|skewX|skewY)[ \t\r\n\f]*\(([^)]*)\)[ \t\r\n\f]*,?/y;
const ARITY: Record<string, number[]> = {
  matrix: [6],
  translate: [1, 2],
  scale: [1, 2],
  rotate: [1, 3],
  skewX: [1],
  skewY: [1],
};
const rad = (deg: number) => (deg * Math.PI) / 180;

function functionMatrix(fn: string, a: number[]): Affine {
  const k = a.length;
  switch (fn) {
    case "matrix":
      return [a[0], a[1], a[2], a[3], a[4], a[5]];
    case "translate":
      return [1, 0, 0, 1, a[0], k === 2 ? a[1] : 0];
    case "scale":
      return [a[0], 0, 0, k === 2 ? a[1] : a[0], 0, 0];
    case "rotate": {
      const c = Math.cos(rad(a[0]));
      const s = Math.sin(rad(a[0]));
      const r: Affine = [c, s, -s, c, 0, 0];
      return k === 3 ? multiply(multiply([1, 0, 0, 1, a[1], a[2]], r), [1, 0, 0, 1, -a[1], -a[2]]) : r;
    }
    case "skewX":
      return [1, 0, Math.tan(rad(a[0])), 1, 0, 0];
    default:
      return [1, Math.tan(rad(a[0])), 0, 1, 0, 0];
  }
}

/** A transform attribute (SVG 1.1 §7.6) as one matrix, the functions applied left to right. */
export function parseTransform(v: string, el: string, line: number): Affine {
  const bad = (why: string, at: number): never =>
    fail(`line ${line}: <${el}> has a transform that cannot be read (${why} at character ${at + 1}).`);
  let m: Affine = IDENTITY;
  let i = 0;
  while (i < v.length && v.slice(i).trim() !== "") {
    FUNCTION.lastIndex = i;
    const f = FUNCTION.exec(v);
    if (!f)
      bad(
        "expected matrix, translate, scale, rotate, skewX or skewY",
        i + (v.length - i - v.slice(i).trimStart().length),
      );
    const [whole, fn, args] = f as RegExpExecArray;
    const list = numberList(args);
    if (list.end < args.length) bad("expected a number", i + whole.indexOf("(") + 1 + list.end);
    const k = list.numbers.length;
    if (!ARITY[fn].includes(k)) bad(`${fn} does not take ${k} number${k === 1 ? "" : "s"}`, i);
    m = multiply(m, functionMatrix(fn, list.numbers));
    i += whole.length;
  }
  if (!m.every(Number.isFinite)) bad("a number out of range", 0);
  return m;
}
