// Lengths and the root's units. When the root's width and height carry mm, cm, in, pt or pc, user
// units are mapped to physical ones through the viewBox and preserveAspectRatio (SVG 1.1 §7.7–7.8;
// no viewBox means user units are CSS px, 96 per inch per CSS Values §6.2), and the output is in mm
// (from mm, cm) or in (from in, pt, pc). Otherwise the numbers are read as they stand and the units
// are "unknown". Lengths inside the drawing with units are converted to user units at 96 px per inch.

import { fail, type Units } from "./common";
import { IDENTITY, type Affine } from "./geometry";
import { numberList } from "./svg-numbers";

const PX_PER: Record<string, number> = { "": 1, px: 1, mm: 96 / 25.4, cm: 96 / 2.54, in: 96, pt: 96 / 72, pc: 16 };
const PHYSICAL_MM: Record<string, number> = { mm: 1, cm: 10, in: 25.4, pt: 25.4 / 72, pc: 25.4 / 6 };
const LENGTH = /^\s*([+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?)\s*([A-Za-z%]*)\s*$/;

type ViewBox = [number, number, number, number];

/** A length attribute in user units (fallback when absent). */
export function lengthOf(v: string | undefined, el: string, attr: string, line: number, fallback = 0): number {
  if (v === undefined) return fallback;
  const m = LENGTH.exec(v);
  if (!m) fail(`line ${line}: <${el}> has ${attr}="${v.slice(0, 40)}", which is not a length.`);
  const unit = m[2];
  if (!(unit in PX_PER))
    fail(
      `line ${line}: <${el}> has ${attr}="${v.slice(0, 40)}"; lengths in "${unit}" are not supported (use a number, px, mm, cm, in, pt or pc).`,
    );
  return Number(m[1]) * PX_PER[unit];
}

export function viewBoxOf(v: string | undefined, el: string, line: number): ViewBox | null {
  if (v === undefined) return null;
  const { numbers: nums, end } = numberList(v);
  if (end < v.length && nums.length < 5)
    fail(`line ${line}: <${el}> has a viewBox that cannot be read ("${v.slice(0, 40)}").`);
  if (nums.length !== 4)
    fail(`line ${line}: <${el}> has a viewBox of ${nums.length} numbers; it needs four (min-x min-y width height).`);
  if (!(nums[2] > 0 && nums[3] > 0))
    fail(`line ${line}: <${el}> has a viewBox with a width or height that is not positive.`);
  return [nums[0], nums[1], nums[2], nums[3]];
}

/** SVG 1.1 §7.8: the viewBox mapped onto a viewport of w × h. */
export function viewBoxMap(vb: ViewBox, w: number, h: number, par: string | undefined): Affine {
  const [vx, vy, vw, vh] = vb;
  const p = (par ?? "").trim().replace(/^defer\s+/, "");
  let sx = w / vw;
  let sy = h / vh;
  let tx = 0;
  let ty = 0;
  if (p !== "none") {
    const m =
      /^(xMinYMin|xMidYMin|xMaxYMin|xMinYMid|xMidYMid|xMaxYMid|xMinYMax|xMidYMax|xMaxYMax)?\s*(meet|slice)?$/.exec(p);
    const align = (m && m[1]) || "xMidYMid";
    const s = m && m[2] === "slice" ? Math.max(sx, sy) : Math.min(sx, sy);
    sx = sy = s;
    const ax = align.slice(1, 4);
    const ay = align.slice(5, 8);
    tx = ax === "Min" ? 0 : ax === "Mid" ? (w - vw * s) / 2 : w - vw * s;
    ty = ay === "Min" ? 0 : ay === "Mid" ? (h - vh * s) / 2 : h - vh * s;
  }
  return [sx, 0, 0, sy, tx - vx * sx, ty - vy * sy];
}

type Size = { value: number; unit: string } | null;

function sizeOf(v: string | undefined): Size {
  if (v === undefined) return null;
  const m = LENGTH.exec(v);
  return m ? { value: Number(m[1]), unit: m[2] } : { value: NaN, unit: "?" };
}

const physical = (s: Size) => s !== null && s.unit in PHYSICAL_MM && s.value > 0;

/** The root <svg>'s map from user units to output units, the units and a note saying how. */
export function rootUnits(a: Map<string, string>, line: number): { ctm: Affine; units: Units; note: string } {
  const w = sizeOf(a.get("width"));
  const h = sizeOf(a.get("height"));
  const vb = viewBoxOf(a.get("viewBox"), "svg", line);
  const lead = physical(w) ? w : physical(h) ? h : null;
  if (lead && (physical(w) || w === null) && (physical(h) || h === null) && (vb || (physical(w) && physical(h)))) {
    const units: Units = lead.unit === "mm" || lead.unit === "cm" ? "mm" : "in";
    const toOut = (s: { value: number; unit: string }) => (s.value * PHYSICAL_MM[s.unit]) / (units === "mm" ? 1 : 25.4);
    const sizeText = `${w ? `width ${a.get("width")?.trim()}` : ""}${w && h ? ", " : ""}${h ? `height ${a.get("height")?.trim()}` : ""}`;
    if (vb) {
      const W = w ? toOut(w) : (toOut(h!) * vb[2]) / vb[3];
      const H = h ? toOut(h) : (toOut(w!) * vb[3]) / vb[2];
      return {
        ctm: viewBoxMap(vb, W, H, a.get("preserveAspectRatio")),
        units,
        note: `units ${units} from the root's ${sizeText} and viewBox "${vb.join(" ")}"`,
      };
    }
    const s = units === "mm" ? 25.4 / 96 : 1 / 96;
    return {
      ctm: [s, 0, 0, s, 0, 0],
      units,
      note: `units ${units} from the root's ${sizeText}; with no viewBox, user units are CSS px (96 per inch)`,
    };
  }
  const given = [a.get("width"), a.get("height")].filter((v) => v !== undefined).map((v) => v!.trim());
  const note = given.length
    ? `units unknown: the root's size (${given.join(" × ")}) is not in mm, cm or in, so the numbers are read as they are (CSS px are 96 per inch, if the drawing was made at that scale)`
    : "units unknown: the root <svg> has no width and height in mm, cm or in, so the numbers are read as they are";
  return { ctm: IDENTITY, units: "unknown", note };
}
