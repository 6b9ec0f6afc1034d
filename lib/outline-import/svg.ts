// A bounded reader of the SVG elements that carry geometry. It reads the markup as text with a
// small tokenizer (no DOM, no DOMParser, so it runs in a Web Worker and in Node): it never renders,
// evaluates, fetches or follows anything. DOCTYPE and ENTITY declarations are refused (the
// "billion laughs" entity expansion and XML external entities live there); only XML's five
// predefined entities and numeric character references are decoded (XML 1.0 §4.6). <script>,
// <style> and <foreignObject> are skipped as raw text, event-handler attributes and external
// hrefs are noted and never used, <use> and <image> are not followed.
//
// Geometry comes from <path d>, <polygon>, <polyline>, <line>, <rect> (with rx/ry per SVG 1.1
// §9.2), <circle> and <ellipse>, with the transform attribute of the element and of its ancestors
// (SVG 1.1 §7.6: matrix, translate, scale, rotate, skewX, skewY). Units: when the root's width and
// height carry mm, cm, in, pt or pc, user units are mapped to physical ones through the viewBox and
// preserveAspectRatio (SVG 1.1 §7.7–7.8; no viewBox means user units are CSS px, 96 per inch per
// CSS Values §6.2), and the output is in mm (from mm, cm) or in (from in, pt, pc). Otherwise the
// numbers are read as they stand and the units are "unknown". Lengths inside the drawing with units
// are converted to user units at 96 px per inch.

import { fail, lineOf, MAX_SVG_DEPTH, MAX_SVG_ELEMENTS, PointBudget, type Pt, type ReadResult, type Subpath, type Units } from "./common";
import { flattenArc, arcPoint, type CentreArc } from "./curves";
import { apply, IDENTITY, multiply, type Affine } from "./geometry";
import { NumberScanner, pathToSubpaths, type PathCounter } from "./svg-path";

interface Frame {
  name: string;
  ctm: Affine;
  skip: string | null; // why this subtree draws nothing, or null
  line: number;
}

const PREDEFINED: Record<string, string> = { lt: "<", gt: ">", amp: "&", quot: '"', apos: "'" };

const GEOMETRY = new Set(["path", "rect", "circle", "ellipse", "polygon", "polyline", "line"]);
const CONTAINERS = new Set(["g", "a", "switch"]);
const NOT_DRAWN: Record<string, string> = {
  defs: "inside <defs>",
  symbol: "inside <symbol>",
  clipPath: "inside <clipPath>",
  mask: "inside <mask>",
  pattern: "inside <pattern>",
  marker: "inside <marker>",
};
const RAW_TEXT = new Set(["script", "style", "foreignObject"]);

const PX_PER: Record<string, number> = { "": 1, px: 1, mm: 96 / 25.4, cm: 96 / 2.54, in: 96, pt: 96 / 72, pc: 16 };
const PHYSICAL_MM: Record<string, number> = { mm: 1, cm: 10, in: 25.4, pt: 25.4 / 72, pc: 25.4 / 6 };
const LENGTH = /^\s*([+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?)\s*([A-Za-z%]*)\s*$/;

class Notes {
  private seen = new Map<string, { count: number; line: number; text: (n: number, line: number) => string }>();
  add(key: string, line: number, text: (n: number, line: number) => string) {
    const s = this.seen.get(key);
    if (s) s.count++;
    else this.seen.set(key, { count: 1, line, text });
  }
  list(): string[] {
    return [...this.seen.values()].map((s) => s.text(s.count, s.line));
  }
}

const times = (n: number, one: string, many: string) => (n === 1 ? one : `${n} ${many}`);

export function readSvg(text: string, tol: number, budget: PointBudget): ReadResult {
  const notes = new Notes();
  const subpaths: Subpath[] = [];
  const counter: PathCounter = { commands: 0 };
  const stack: Frame[] = [];
  let units: Units = "unknown";
  const unitNotes: string[] = [];
  let rootSeen = false;
  let rootClosed = false;
  let elements = 0;
  let i = 0;
  const n = text.length;
  // Line numbers, counted forward from the last one asked for (the reader only moves forward).
  let lineMark = 0;
  let lineCount = 1;
  const lineAt = (offset: number): number => {
    if (offset < lineMark) return lineOf(text, offset);
    for (let k = lineMark; k < offset && k < n; k++) if (text.charCodeAt(k) === 10) lineCount++;
    lineMark = Math.max(lineMark, Math.min(offset, n));
    return lineCount;
  };
  const at = (offset: number) => `line ${lineAt(offset)}`;

  const decode = (raw: string, offset: number): string =>
    raw.replace(/&([^;&\s]*);?/g, (whole, ref: string) => {
      if (!whole.endsWith(";")) fail(`${at(offset)}: a bare "&" in an attribute value (write &amp;).`);
      if (ref in PREDEFINED) return PREDEFINED[ref];
      const m = /^#(?:x([0-9A-Fa-f]{1,6})|([0-9]{1,7}))$/.exec(ref);
      if (m) {
        const cp = m[1] !== undefined ? parseInt(m[1], 16) : parseInt(m[2], 10);
        if (cp === 0 || cp > 0x10ffff || (cp >= 0xd800 && cp <= 0xdfff)) fail(`${at(offset)}: the character reference &${ref}; is not a valid character.`);
        return String.fromCodePoint(cp);
      }
      return fail(
        `${at(offset)}: the entity reference &${ref}; is not one of XML's predefined entities (custom entities need a DOCTYPE, which is refused).`,
      );
    });

  const NAME = /[\p{L}_:][\p{L}\p{N}_:.\-]*/uy;
  const readName = (): string | null => {
    NAME.lastIndex = i;
    const m = NAME.exec(text);
    if (!m) return null;
    i += m[0].length;
    return m[0];
  };
  const skipWs = () => {
    while (i < n && /\s/.test(text[i])) i++;
  };

  const lengthOf = (v: string | undefined, el: string, attr: string, line: number, fallback = 0): number => {
    if (v === undefined) return fallback;
    const m = LENGTH.exec(v);
    if (!m) fail(`line ${line}: <${el}> has ${attr}="${v.slice(0, 40)}", which is not a length.`);
    const unit = m[2];
    if (!(unit in PX_PER)) fail(`line ${line}: <${el}> has ${attr}="${v.slice(0, 40)}"; lengths in "${unit}" are not supported (use a number, px, mm, cm, in, pt or pc).`);
    return Number(m[1]) * PX_PER[unit];
  };

  const parseTransform = (v: string, el: string, line: number): Affine => {
    const sc = new NumberScanner(v);
    let m: Affine = IDENTITY;
    const bad = (why: string): never => fail(`line ${line}: <${el}> has a transform that cannot be read (${why} at character ${sc.i + 1}).`);
    sc.skipWsp();
    while (!sc.done) {
      const nm = /^(matrix|translate|scale|rotate|skewX|skewY)/.exec(v.slice(sc.i));
      if (!nm) bad("expected matrix, translate, scale, rotate, skewX or skewY");
      const fn = (nm as RegExpExecArray)[1];
      sc.i += fn.length;
      sc.skipWsp();
      if (v[sc.i] !== "(") bad('expected "("');
      sc.i++;
      const args: number[] = [];
      sc.skipWsp();
      while (v[sc.i] !== ")") {
        const x = sc.number();
        if (x === null) bad("expected a number");
        args.push(x as number);
        if (args.length > 6) bad("too many numbers");
        sc.skipCommaWsp();
      }
      sc.i++;
      const k = args.length;
      const rad = (deg: number) => (deg * Math.PI) / 180;
      let t: Affine;
      const arity = (ok: boolean) => {
        if (!ok) bad(`${fn} does not take ${k} number${k === 1 ? "" : "s"}`);
      };
      switch (fn) {
        case "matrix":
          arity(k === 6);
          t = [args[0], args[1], args[2], args[3], args[4], args[5]];
          break;
        case "translate":
          arity(k === 1 || k === 2);
          t = [1, 0, 0, 1, args[0], k === 2 ? args[1] : 0];
          break;
        case "scale":
          arity(k === 1 || k === 2);
          t = [args[0], 0, 0, k === 2 ? args[1] : args[0], 0, 0];
          break;
        case "rotate": {
          arity(k === 1 || k === 3);
          const c = Math.cos(rad(args[0]));
          const s = Math.sin(rad(args[0]));
          const r: Affine = [c, s, -s, c, 0, 0];
          t = k === 3 ? multiply(multiply([1, 0, 0, 1, args[1], args[2]], r), [1, 0, 0, 1, -args[1], -args[2]]) : r;
          break;
        }
        case "skewX":
          arity(k === 1);
          t = [1, 0, Math.tan(rad(args[0])), 1, 0, 0];
          break;
        default:
          arity(k === 1);
          t = [1, Math.tan(rad(args[0])), 0, 1, 0, 0];
      }
      m = multiply(m, t);
      sc.skipCommaWsp();
    }
    if (!m.every(Number.isFinite)) bad("a number out of range");
    return m;
  };

  const viewBoxOf = (v: string | undefined, el: string, line: number): [number, number, number, number] | null => {
    if (v === undefined) return null;
    const sc = new NumberScanner(v);
    const nums: number[] = [];
    sc.skipWsp();
    while (!sc.done && nums.length < 5) {
      const x = sc.number();
      if (x === null) fail(`line ${line}: <${el}> has a viewBox that cannot be read ("${v.slice(0, 40)}").`);
      nums.push(x as number);
      sc.skipCommaWsp();
    }
    if (nums.length !== 4) fail(`line ${line}: <${el}> has a viewBox of ${nums.length} numbers; it needs four (min-x min-y width height).`);
    if (!(nums[2] > 0 && nums[3] > 0)) fail(`line ${line}: <${el}> has a viewBox with a width or height that is not positive.`);
    return [nums[0], nums[1], nums[2], nums[3]];
  };

  /** SVG 1.1 §7.8: the viewBox mapped onto a viewport of w × h. */
  const viewBoxMap = (vb: [number, number, number, number], w: number, h: number, par: string | undefined): Affine => {
    const [vx, vy, vw, vh] = vb;
    const p = (par ?? "").trim().replace(/^defer\s+/, "");
    let sx = w / vw;
    let sy = h / vh;
    let tx = 0;
    let ty = 0;
    if (p !== "none") {
      const m = /^(xMinYMin|xMidYMin|xMaxYMin|xMinYMid|xMidYMid|xMaxYMid|xMinYMax|xMidYMax|xMaxYMax)?\s*(meet|slice)?$/.exec(p);
      const align = (m && m[1]) || "xMidYMid";
      const s = m && m[2] === "slice" ? Math.max(sx, sy) : Math.min(sx, sy);
      sx = sy = s;
      const ax = align.slice(1, 4);
      const ay = align.slice(5, 8);
      tx = ax === "Min" ? 0 : ax === "Mid" ? (w - vw * s) / 2 : w - vw * s;
      ty = ay === "Min" ? 0 : ay === "Mid" ? (h - vh * s) / 2 : h - vh * s;
    }
    return [sx, 0, 0, sy, tx - vx * sx, ty - vy * sy];
  };

  const rootMap = (a: Map<string, string>, line: number): Affine => {
    const size = (v: string | undefined) => {
      if (v === undefined) return null;
      const m = LENGTH.exec(v);
      return m ? { value: Number(m[1]), unit: m[2] } : { value: NaN, unit: "?" };
    };
    const w = size(a.get("width"));
    const h = size(a.get("height"));
    const vb = viewBoxOf(a.get("viewBox"), "svg", line);
    const phys = (s: { value: number; unit: string } | null) => s !== null && s.unit in PHYSICAL_MM && s.value > 0;
    const lead = phys(w) ? w : phys(h) ? h : null;
    if (lead && (phys(w) || w === null) && (phys(h) || h === null) && (vb || (phys(w) && phys(h)))) {
      units = lead.unit === "mm" || lead.unit === "cm" ? "mm" : "in";
      const toOut = (s: { value: number; unit: string }) => (s.value * PHYSICAL_MM[s.unit]) / (units === "mm" ? 1 : 25.4);
      const sizeText = `${w ? `width ${a.get("width")?.trim()}` : ""}${w && h ? ", " : ""}${h ? `height ${a.get("height")?.trim()}` : ""}`;
      if (vb) {
        const W = w ? toOut(w) : (toOut(h!) * vb[2]) / vb[3];
        const H = h ? toOut(h) : (toOut(w!) * vb[3]) / vb[2];
        unitNotes.push(`units ${units} from the root's ${sizeText} and viewBox "${vb.join(" ")}"`);
        return viewBoxMap(vb, W, H, a.get("preserveAspectRatio"));
      }
      const s = units === "mm" ? 25.4 / 96 : 1 / 96;
      unitNotes.push(`units ${units} from the root's ${sizeText}; with no viewBox, user units are CSS px (96 per inch)`);
      return [s, 0, 0, s, 0, 0];
    }
    const given = [a.get("width"), a.get("height")].filter((v) => v !== undefined).map((v) => v!.trim());
    unitNotes.push(
      given.length
        ? `units unknown: the root's size (${given.join(" × ")}) is not in mm, cm or in, so the numbers are read as they are (CSS px are 96 per inch, if the drawing was made at that scale)`
        : "units unknown: the root <svg> has no width and height in mm, cm or in, so the numbers are read as they are",
    );
    return IDENTITY;
  };

  const shape = (el: string, a: Map<string, string>, m: Affine, line: number) => {
    const label = `<${el}${a.has("id") ? ` id="${a.get("id")!.slice(0, 40)}"` : ""}> on line ${line}`;
    const where = () => label;
    const L = (k: string, fallback = 0) => lengthOf(a.get(k), el, k, line, fallback);
    const pt = (x: number, y: number) => apply(m, x, y);
    const push = (points: Pt[], closed: boolean, arcs: number) => {
      if (points.length >= 2) subpaths.push({ points, closed, arcs, curves: 0, label });
    };
    const ellipseLoop = (cx: number, cy: number, rx: number, ry: number) => {
      const arc: CentreArc = { cx, cy, rx, ry, phi: 0, theta1: 0, dtheta: 2 * Math.PI };
      budget.take(1, where);
      const pts = [pt(...arcPoint(arc, 0))].concat(flattenArc(arc, m, tol, budget, where));
      push(pts, true, 1);
    };
    switch (el) {
      case "path": {
        const d = a.get("d");
        if (d === undefined || d.trim() === "") return;
        subpaths.push(...pathToSubpaths(d, m, tol, budget, label, counter));
        return;
      }
      case "polygon":
      case "polyline": {
        const v = a.get("points") ?? "";
        const sc = new NumberScanner(v);
        const nums: number[] = [];
        sc.skipWsp();
        while (!sc.done) {
          const x = sc.number();
          if (x === null) fail(`${label}: its points cannot be read at character ${sc.i + 1} ("${v.slice(sc.i, sc.i + 20)}").`);
          nums.push(x as number);
          if (nums.length % 2 === 0) budget.take(1, where);
          sc.skipCommaWsp();
        }
        if (nums.length % 2 === 1) fail(`${label}: its points hold an odd count of numbers (${nums.length}); they must come in x, y pairs.`);
        const pts: Pt[] = [];
        for (let k = 0; k < nums.length; k += 2) pts.push(pt(nums[k], nums[k + 1]));
        push(pts, el === "polygon", 0);
        return;
      }
      case "line": {
        budget.take(2, where);
        push([pt(L("x1"), L("y1")), pt(L("x2"), L("y2"))], false, 0);
        return;
      }
      case "circle": {
        const r = L("r");
        if (r < 0) fail(`${label}: a negative radius.`);
        if (r > 0) ellipseLoop(L("cx"), L("cy"), r, r);
        return;
      }
      case "ellipse": {
        const rx = L("rx");
        const ry = L("ry");
        if (rx < 0 || ry < 0) fail(`${label}: a negative radius.`);
        if (rx > 0 && ry > 0) ellipseLoop(L("cx"), L("cy"), rx, ry);
        return;
      }
      case "rect": {
        const x = L("x");
        const y = L("y");
        const w = L("width");
        const h = L("height");
        if (w < 0 || h < 0) fail(`${label}: a negative width or height.`);
        if (w === 0 || h === 0) return;
        // SVG 1.1 §9.2: a missing rx takes ry and vice versa; each is at most half the side.
        let rx = a.has("rx") ? L("rx") : a.has("ry") ? L("ry") : 0;
        let ry = a.has("ry") ? L("ry") : rx;
        if (rx < 0 || ry < 0) fail(`${label}: a negative corner radius.`);
        rx = Math.min(rx, w / 2);
        ry = Math.min(ry, h / 2);
        if (rx === 0 || ry === 0) {
          budget.take(4, where);
          push([pt(x, y), pt(x + w, y), pt(x + w, y + h), pt(x, y + h)], true, 0);
          return;
        }
        const pts: Pt[] = [pt(x + rx, y)];
        const corner = (cx: number, cy: number, from: number) => {
          const arc: CentreArc = { cx, cy, rx, ry, phi: 0, theta1: from, dtheta: Math.PI / 2 };
          pts.push(...flattenArc(arc, m, tol, budget, where));
        };
        budget.take(5, where);
        pts.push(pt(x + w - rx, y));
        corner(x + w - rx, y + ry, -Math.PI / 2);
        pts.push(pt(x + w, y + h - ry));
        corner(x + w - rx, y + h - ry, 0);
        pts.push(pt(x + rx, y + h));
        corner(x + rx, y + h - ry, Math.PI / 2);
        pts.push(pt(x, y + ry));
        corner(x + rx, y + ry, Math.PI);
        push(pts, true, 4);
        return;
      }
    }
  };

  while (i < n) {
    const lt = text.indexOf("<", i);
    if (lt < 0) break;
    i = lt;
    if (text.startsWith("<!--", i)) {
      const end = text.indexOf("-->", i + 4);
      if (end < 0) fail(`${at(i)}: a comment that is never closed.`);
      i = end + 3;
      continue;
    }
    if (text.startsWith("<![CDATA[", i)) {
      const end = text.indexOf("]]>", i + 9);
      if (end < 0) fail(`${at(i)}: a CDATA section that is never closed.`);
      i = end + 3;
      continue;
    }
    if (text.startsWith("<!", i)) {
      const word = text.slice(i + 2, i + 9).toUpperCase();
      if (word.startsWith("DOCTYPE"))
        fail(`${at(i)}: the file has a DOCTYPE declaration, which is refused: DOCTYPEs can declare entities that expand without bound or read other files. Save the SVG without it.`);
      if (word.startsWith("ENTITY")) fail(`${at(i)}: the file declares an ENTITY, which is refused (entities can expand without bound or read other files).`);
      fail(`${at(i)}: an unexpected "<!" declaration.`);
    }
    if (text.startsWith("<?", i)) {
      const end = text.indexOf("?>", i + 2);
      if (end < 0) fail(`${at(i)}: a processing instruction that is never closed.`);
      if (/^<\?xml-stylesheet/i.test(text.slice(i, i + 20))) notes.add("stylesheet", lineAt(i), (k, l) => `ignored ${times(k, "an xml-stylesheet instruction", "xml-stylesheet instructions")} (line ${l}); stylesheets are never loaded`);
      i = end + 2;
      continue;
    }
    if (rootClosed) {
      // Markup after the root element cannot add geometry.
      break;
    }
    const tagStart = i;
    const line = lineAt(tagStart);
    if (text.startsWith("</", i)) {
      i += 2;
      const name = readName();
      skipWs();
      if (!name || text[i] !== ">") fail(`line ${line}: a closing tag that cannot be read.`);
      i++;
      const top = stack.pop();
      if (!top || top.name !== name)
        fail(`line ${line}: </${name}> does not match ${top ? `<${top.name}> opened on line ${top.line}` : "any open element"}.`);
      if (stack.length === 0) rootClosed = true;
      continue;
    }
    i++;
    const name = readName();
    if (!name) fail(`line ${line}: a "<" that does not start an element (write &lt;).`);
    const attrs = new Map<string, string>();
    let selfClosing = false;
    for (;;) {
      const before = i;
      skipWs();
      if (i >= n) fail(`line ${line}: the <${name}> tag is never closed.`);
      if (text.startsWith("/>", i)) {
        selfClosing = true;
        i += 2;
        break;
      }
      if (text[i] === ">") {
        i++;
        break;
      }
      if (i === before) fail(`line ${line}: <${name}> needs a space between attributes.`);
      const an = readName();
      if (!an) fail(`line ${line}: <${name}> has an attribute that cannot be read (at "${text.slice(i, i + 20)}").`);
      skipWs();
      if (text[i] !== "=") fail(`line ${line}: <${name}> attribute ${an} has no value.`);
      i++;
      skipWs();
      const q = text[i];
      if (q !== '"' && q !== "'") fail(`line ${line}: <${name}> attribute ${an} must be quoted.`);
      const end = text.indexOf(q, i + 1);
      if (end < 0) fail(`line ${line}: <${name}> attribute ${an} is never closed.`);
      const raw = text.slice(i + 1, end);
      if (raw.includes("<")) fail(`line ${line}: <${name}> attribute ${an} holds a "<" (write &lt;).`);
      if (attrs.has(an!)) fail(`line ${line}: <${name}> gives the attribute ${an} twice.`);
      attrs.set(an!, decode(raw, i));
      i = end + 1;
    }
    if (++elements > MAX_SVG_ELEMENTS)
      fail(`The SVG has more than ${MAX_SVG_ELEMENTS.toLocaleString("en-US")} elements, the most the importer reads; simplify the drawing.`);
    const el = name!;
    for (const [k, v] of attrs) {
      if (/^on/i.test(k))
        notes.add("handler", line, (c, l) => `ignored ${times(c, "an event-handler attribute", "event-handler attributes")} (first ${k} on <${el}>, line ${l}); nothing is ever run`);
      if ((k === "href" || k.endsWith(":href")) && !v.trim().startsWith("#"))
        notes.add("href", line, (c, l) => `ignored ${times(c, "an external reference", "external references")} (first ${k}="${v.slice(0, 60)}" on <${el}>, line ${l}); nothing is ever fetched`);
    }
    if (RAW_TEXT.has(el)) {
      if (el === "script") notes.add("script", line, (c, l) => `ignored ${times(c, "a <script> element", "<script> elements")} (first on line ${l}); scripts are never run`);
      if (el === "foreignObject") notes.add("foreign", line, (c, l) => `ignored ${times(c, "a <foreignObject>", "<foreignObject> elements")} (first on line ${l}) and everything in it`);
      if (!selfClosing) {
        const close = new RegExp(`</${el}\\s*>`, "gi");
        close.lastIndex = i;
        const m = close.exec(text);
        if (!m) fail(`line ${line}: the <${el}> element is never closed.`);
        i = m!.index + m![0].length;
      }
      continue;
    }
    const parent = stack[stack.length - 1];
    if (!parent) {
      if (rootSeen || el !== "svg") fail(`line ${line}: the root element is <${el}>, not <svg>.`);
      rootSeen = true;
      const frame: Frame = { name: el, ctm: rootMap(attrs, line), skip: null, line };
      if (!selfClosing) stack.push(frame);
      else rootClosed = true;
      continue;
    }
    if (stack.length >= MAX_SVG_DEPTH) fail(`line ${line}: elements are nested more than ${MAX_SVG_DEPTH} deep.`);
    let skip = parent.skip;
    const hidden = attrs.get("display")?.trim() === "none" || /(^|;)\s*display\s*:\s*none\s*(;|$)/.test(attrs.get("style") ?? "");
    if (!skip && hidden) skip = "hidden (display: none)";
    if (!skip && el in NOT_DRAWN) skip = NOT_DRAWN[el];
    if (!skip && el === "use") notes.add("use", line, (c, l) => `ignored ${times(c, "a <use> element", "<use> elements")} (first on line ${l}); references are not followed`);
    if (!skip && el === "image") notes.add("image", line, (c, l) => `ignored ${times(c, "an <image>", "<image> elements")} (first on line ${l}); images are never loaded`);
    const known = GEOMETRY.has(el) || CONTAINERS.has(el) || el === "svg";
    if (!skip && !known) skip = "unused"; // text, gradients, editor metadata and unknown elements draw no outline
    let ctm = parent.ctm;
    if (!skip) {
      if (el === "svg") {
        // A nested viewport (SVG 1.1 §7.9): x, y and, with a viewBox and a size, the viewBox map.
        ctm = multiply(ctm, [1, 0, 0, 1, lengthOf(attrs.get("x"), el, "x", line), lengthOf(attrs.get("y"), el, "y", line)]);
        const vb = viewBoxOf(attrs.get("viewBox"), el, line);
        if (vb && attrs.has("width") && attrs.has("height"))
          ctm = multiply(ctm, viewBoxMap(vb, lengthOf(attrs.get("width"), el, "width", line), lengthOf(attrs.get("height"), el, "height", line), attrs.get("preserveAspectRatio")));
      } else if (attrs.has("transform")) ctm = multiply(ctm, parseTransform(attrs.get("transform")!, el, line));
    }
    if (GEOMETRY.has(el)) {
      if (skip && skip !== "unused") notes.add(`skip:${skip}`, line, (c, l) => `ignored ${times(c, "a shape", "shapes")} ${skip} (first on line ${l})`);
      else if (!skip) shape(el, attrs, ctm, line);
    }
    if (!selfClosing) stack.push({ name: el, ctm, skip, line });
  }
  if (!rootSeen) fail("No <svg> element was found.");
  if (!rootClosed) {
    const top = stack[stack.length - 1];
    fail(`The file ends before <${top.name}> (opened on line ${top.line}) is closed; it may be cut short.`);
  }
  // SVG's y axis points down; the engine's points up.
  for (const s of subpaths) s.points = s.points.map(([x, y]) => [x, -y === 0 ? 0 : -y] as Pt);
  return { subpaths, units, notes: [...unitNotes, "y flipped (SVG is y-down, the engine is y-up)", ...notes.list()] };
}
