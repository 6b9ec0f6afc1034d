// A bounded reader of the SVG elements that carry geometry. The markup is read by saxes
// (svg-markup.ts), path data by svg-pathdata (svg-path.ts); this file walks the elements: which
// draw (geometry inside <defs>, <symbol>, <clipPath>, <mask>, <pattern>, <marker> or under
// display: none does not), the transform of each element and its ancestors (SVG 1.1 §7.6), nested
// <svg> viewports (§7.9), the limits on elements and nesting, and notes on what was ignored.
// <script>, <style> and <foreignObject> are skipped unread, event-handler attributes and external
// hrefs are noted and never used, <use> and <image> are not followed.

import type { SaxesTagPlain } from "saxes";
import { MAX_SVG_DEPTH, MAX_SVG_ELEMENTS, fail, PointBudget, type Pt, type ReadResult, type Units } from "./common";
import { multiply, type Affine } from "./geometry";
import { walkMarkup } from "./svg-markup";
import { parseTransform } from "./svg-numbers";
import { drawShape, GEOMETRY, type ShapeContext } from "./svg-shapes";
import { lengthOf, rootUnits, viewBoxMap, viewBoxOf } from "./svg-units";

interface Frame {
  ctm: Affine;
  skip: string | null; // why this subtree draws nothing, or null
}

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

const times = (n: number, one: string, many: string) => (n === 1 ? one : `${n} ${many}`);

/** Notes on ignored things, one per kind, with the count and the first line. */
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

function noteAttributes(notes: Notes, el: string, attrs: Map<string, string>, line: number): void {
  for (const [k, v] of attrs) {
    if (/^on/i.test(k))
      notes.add(
        "handler",
        line,
        (c, l) =>
          `ignored ${times(c, "an event-handler attribute", "event-handler attributes")} (first ${k} on <${el}>, line ${l}); nothing is ever run`,
      );
    if ((k === "href" || k.endsWith(":href")) && !v.trim().startsWith("#"))
      notes.add(
        "href",
        line,
        (c, l) =>
          `ignored ${times(c, "an external reference", "external references")} (first ${k}="${v.slice(0, 60)}" on <${el}>, line ${l}); nothing is ever fetched`,
      );
  }
}

function noteRawText(notes: Notes, el: string, line: number): void {
  if (el === "script")
    notes.add(
      "script",
      line,
      (c, l) =>
        `ignored ${times(c, "a <script> element", "<script> elements")} (first on line ${l}); scripts are never run`,
    );
  if (el === "foreignObject")
    notes.add(
      "foreign",
      line,
      (c, l) =>
        `ignored ${times(c, "a <foreignObject>", "<foreignObject> elements")} (first on line ${l}) and everything in it`,
    );
}

/** Why an element under parent draws nothing (null when it draws), noting <use> and <image>. */
function skipReason(el: string, attrs: Map<string, string>, parent: Frame, line: number, notes: Notes): string | null {
  if (parent.skip) return parent.skip;
  const hidden =
    attrs.get("display")?.trim() === "none" || /(^|;)\s*display\s*:\s*none\s*(;|$)/.test(attrs.get("style") ?? "");
  if (hidden) return "hidden (display: none)";
  if (el in NOT_DRAWN) return NOT_DRAWN[el];
  if (el === "use")
    notes.add(
      "use",
      line,
      (c, l) =>
        `ignored ${times(c, "a <use> element", "<use> elements")} (first on line ${l}); references are not followed`,
    );
  if (el === "image")
    notes.add(
      "image",
      line,
      (c, l) => `ignored ${times(c, "an <image>", "<image> elements")} (first on line ${l}); images are never loaded`,
    );
  // Text, gradients, editor metadata and unknown elements draw no outline.
  return GEOMETRY.has(el) || CONTAINERS.has(el) || el === "svg" ? null : "unused";
}

/** The map of an element's children: a nested viewport (SVG 1.1 §7.9) or its transform attribute. */
function elementMap(el: string, attrs: Map<string, string>, parent: Affine, line: number): Affine {
  if (el !== "svg")
    return attrs.has("transform") ? multiply(parent, parseTransform(attrs.get("transform")!, el, line)) : parent;
  const L = (k: string) => lengthOf(attrs.get(k), el, k, line);
  let ctm = multiply(parent, [1, 0, 0, 1, L("x"), L("y")]);
  const vb = viewBoxOf(attrs.get("viewBox"), el, line);
  if (vb && attrs.has("width") && attrs.has("height"))
    ctm = multiply(ctm, viewBoxMap(vb, L("width"), L("height"), attrs.get("preserveAspectRatio")));
  return ctm;
}

export function readSvg(text: string, tol: number, budget: PointBudget): ReadResult {
  const notes = new Notes();
  const shapes: ShapeContext = { tol, budget, counter: { commands: 0 }, subpaths: [] };
  const frames: Frame[] = [];
  let units: Units = "unknown";
  let unitNote = "";
  let elements = 0;

  const openRoot = (el: string, attrs: Map<string, string>, line: number) => {
    if (unitNote || el !== "svg") fail(`line ${line}: the root element is <${el}>, not <svg>.`);
    const root = rootUnits(attrs, line);
    units = root.units;
    unitNote = root.note;
    frames.push({ ctm: root.ctm, skip: null });
  };

  const openChild = (el: string, attrs: Map<string, string>, line: number, parent: Frame) => {
    if (frames.length >= MAX_SVG_DEPTH) fail(`line ${line}: elements are nested more than ${MAX_SVG_DEPTH} deep.`);
    const skip = skipReason(el, attrs, parent, line, notes);
    const ctm = skip ? parent.ctm : elementMap(el, attrs, parent.ctm, line);
    if (GEOMETRY.has(el)) {
      if (skip && skip !== "unused")
        notes.add(
          `skip:${skip}`,
          line,
          (c, l) => `ignored ${times(c, "a shape", "shapes")} ${skip} (first on line ${l})`,
        );
      else if (!skip) drawShape(el, attrs, ctm, line, shapes);
    }
    frames.push({ ctm, skip });
  };

  walkMarkup(text, {
    open(tag: SaxesTagPlain, line: number) {
      if (++elements > MAX_SVG_ELEMENTS)
        fail(
          `The SVG has more than ${MAX_SVG_ELEMENTS.toLocaleString("en-US")} elements, the most the importer reads; simplify the drawing.`,
        );
      const el = tag.name;
      const attrs = new Map(Object.entries(tag.attributes));
      noteAttributes(notes, el, attrs, line);
      const parent = frames[frames.length - 1];
      if (RAW_TEXT.has(el) && parent) {
        noteRawText(notes, el, line);
        frames.push({ ctm: parent.ctm, skip: "raw text" });
        return "raw";
      }
      if (!parent) openRoot(el, attrs, line);
      else openChild(el, attrs, line, parent);
    },
    close() {
      frames.pop();
    },
    instruction(target: string, line: number) {
      if (target.toLowerCase() === "xml-stylesheet")
        notes.add(
          "stylesheet",
          line,
          (k, l) =>
            `ignored ${times(k, "an xml-stylesheet instruction", "xml-stylesheet instructions")} (line ${l}); stylesheets are never loaded`,
        );
    },
  });
  if (!unitNote) fail("No <svg> element was found.");
  // SVG's y axis points down; the engine's points up.
  for (const s of shapes.subpaths) s.points = s.points.map(([x, y]) => [x, -y === 0 ? 0 : -y] as Pt);
  return {
    subpaths: shapes.subpaths,
    units,
    notes: [unitNote, "y flipped (SVG is y-down, the engine is y-up)", ...notes.list()],
  };
}
