// Path data (SVG 1.1 §8.3) is parsed by svg-pathdata: its grammar, implicit repeats, numbers run
// together ("1-2", "0.5.5") and arc flags without separators ("a1 1 0 00 1 1"), and relative
// commands made absolute (toAbs). Kept here: the command budget, the refusal of any error in the
// data naming the character (renderers draw up to the error; an importer that did that would hand
// the engine half a wheel), the S/T control-point reflection of §8.3.6/§8.3.7, the new subpath
// after Z at the closed one's first point (§8.3.3), and flattening after the transform m with our
// tolerance (curves.ts): arcs stay exact arcs here rather than svg-pathdata's cubic approximations.

import { SVGPathData, type SVGCommand } from "svg-pathdata";
import { fail, MAX_PATH_COMMANDS, PointBudget, type Pt, type Subpath } from "./common";
import { endpointToCentre, flattenArc, flattenCubic, flattenQuad } from "./curves";
import { apply, type Affine } from "./geometry";

export interface PathCounter {
  commands: number;
}

const COMMAND_LETTER = /[MmLlHhVvCcSsQqTtAaZz]/;

/** Counts the command letters of d against the file's budget before anything is parsed. */
function countCommands(d: string, counter: PathCounter): void {
  for (let i = 0; i < d.length; i++)
    if (COMMAND_LETTER.test(d[i]) && ++counter.commands > MAX_PATH_COMMANDS)
      fail(
        `The file has more than ${MAX_PATH_COMMANDS.toLocaleString("en-US")} path commands, the most the importer reads; simplify the drawing.`,
      );
}

/** svg-pathdata's SyntaxError as what went wrong and the 0-based index where. */
function describeSyntaxError(message: string, d: string): { what: string; at: number } {
  let m: RegExpExecArray | null;
  if ((m = /^Unexpected character "(.*)" at index (\d+)\. Command cannot follow comma/.exec(message)))
    return { what: `unexpected "${m[1]}" after a comma`, at: Number(m[2]) };
  if ((m = /^Unexpected character "(.*)" at index (\d+)/.exec(message)))
    return { what: `unexpected "${m[1]}"`, at: Number(m[2]) };
  if ((m = /^Unterminated command at index (\d+)/.exec(message)))
    return { what: "expected a number", at: Number(m[1]) };
  if (/^Unterminated command at the path end/.test(message)) return { what: "expected a number", at: d.length };
  if ((m = /^Invalid number ending at (\d+)/.exec(message)))
    return { what: "a number that cannot be read", at: Math.max(0, Number(m[1]) - 1) };
  if ((m = /^Expected positive number, got "(.*)" at index "(\d+)"/.exec(message)))
    return { what: "an arc radius must not be negative", at: Math.max(0, Number(m[2]) - m[1].length) };
  if ((m = /^Expected a flag, got "(.*)" at index "(\d+)"/.exec(message)))
    return { what: "expected an arc flag (0 or 1)", at: Math.max(0, Number(m[2]) - m[1].length) };
  return { what: "the path data cannot be read", at: 0 };
}

/** The commands of d, absolute, or a refusal naming the character where the data goes wrong. */
function parsePath(d: string, label: string): SVGCommand[] {
  const bad = (what: string, at: number): never =>
    fail(`${label}: ${what} at character ${at + 1} of its path data (d="${d.slice(Math.max(0, at - 12), at + 12)}").`);
  const first = d.search(/[^ \t\r\n\f]/);
  if (first >= 0 && d[first] !== "M" && d[first] !== "m")
    bad(
      COMMAND_LETTER.test(d[first]) ? "path data must begin with a moveto (M or m)" : `unexpected "${d[first]}"`,
      first,
    );
  let commands: SVGCommand[];
  try {
    commands = new SVGPathData(SVGPathData.parse(d)).toAbs().commands;
  } catch (e) {
    const { what, at } = describeSyntaxError(e instanceof Error ? e.message : String(e), d);
    return bad(what, at);
  }
  for (const c of commands)
    for (const v of Object.values(c)) if (typeof v === "number" && !Number.isFinite(v)) bad("a number out of range", 0);
  return commands;
}

/** Draws absolute path commands as flattened subpaths mapped by m, tracking the current point. */
class PathPen {
  readonly out: Subpath[] = [];
  private cur: Pt = [0, 0];
  private start: Pt = [0, 0];
  private ctrl: Pt | null = null; // last control point, for S (after C/S) and T (after Q/T)
  private ctrlKind: "cubic" | "quad" | null = null;
  private sub: Subpath | null = null;
  index = 0;
  get x(): number {
    return this.cur[0];
  }
  get y(): number {
    return this.cur[1];
  }
  constructor(
    private readonly m: Affine,
    private readonly tol: number,
    private readonly budget: PointBudget,
    private readonly label: string,
  ) {}
  private readonly where = () => `${this.label}, command ${this.index + 1},`;
  private t(q: Pt): Pt {
    return apply(this.m, q[0], q[1]);
  }
  private current(): Subpath {
    if (!this.sub) this.moveTo(this.cur, false);
    return this.sub!;
  }
  /** The control point a smooth S or T reflects (SVG 1.1 §8.3.6–8.3.7), or the current point. */
  private reflected(kind: "cubic" | "quad"): Pt {
    const c = this.ctrl;
    return c && this.ctrlKind === kind ? [2 * this.cur[0] - c[0], 2 * this.cur[1] - c[1]] : this.cur;
  }
  private remember(ctrl: Pt | null, kind: "cubic" | "quad" | null): void {
    this.ctrl = ctrl;
    this.ctrlKind = kind;
  }
  flush(): void {
    if (this.sub && this.sub.points.length >= 2) this.out.push(this.sub);
    this.sub = null;
  }
  moveTo(p: Pt, isStart = true): void {
    this.flush();
    this.budget.take(1, this.where);
    this.sub = {
      points: [this.t(p)],
      closed: false,
      arcs: 0,
      curves: 0,
      label: `${this.label} subpath ${this.out.length + 1}`,
    };
    if (isStart) this.cur = this.start = p;
    this.remember(null, null);
  }
  lineTo(p: Pt): void {
    const s = this.current();
    this.budget.take(1, this.where);
    s.points.push(this.t(p));
    this.cur = p;
    this.remember(null, null);
  }
  cubic(c1: Pt | null, c2: Pt, p: Pt): void {
    const from = this.cur;
    const k1 = c1 ?? this.reflected("cubic");
    const s = this.current();
    s.points.push(...flattenCubic(this.t(from), this.t(k1), this.t(c2), this.t(p), this.tol, this.budget, this.where));
    s.curves++;
    this.cur = p;
    this.remember(c2, "cubic");
  }
  quad(c1: Pt | null, p: Pt): void {
    const k1 = c1 ?? this.reflected("quad");
    const s = this.current();
    s.points.push(...flattenQuad(this.t(this.cur), this.t(k1), this.t(p), this.tol, this.budget, this.where));
    s.curves++;
    this.cur = p;
    this.remember(k1, "quad");
  }
  arc(c: { rX: number; rY: number; xRot: number; lArcFlag: number; sweepFlag: number }, p: Pt): void {
    const e = endpointToCentre(
      this.cur[0],
      this.cur[1],
      c.rX,
      c.rY,
      c.xRot,
      c.lArcFlag === 1,
      c.sweepFlag === 1,
      p[0],
      p[1],
    );
    if (e.kind === "line") return this.lineTo(p);
    if (e.kind === "arc") {
      const s = this.current();
      const pts = flattenArc(e.arc, this.m, this.tol, this.budget, this.where);
      pts[pts.length - 1] = this.t(p);
      s.points.push(...pts);
      s.arcs++;
      this.cur = p;
    }
    this.remember(null, null);
  }
  /** Z: closes the subpath; the next one starts at its first point (SVG 1.1 §8.3.3). */
  close(): void {
    if (this.sub) {
      this.sub.closed = true;
      this.flush();
    }
    this.cur = this.start;
    this.remember(null, null);
  }
}

/** Flattened subpaths of one path's d attribute, mapped by m. */
export function pathToSubpaths(
  d: string,
  m: Affine,
  tol: number,
  budget: PointBudget,
  label: string,
  counter: PathCounter,
): Subpath[] {
  countCommands(d, counter);
  const commands = parsePath(d, label);
  const pen = new PathPen(m, tol, budget, label);
  for (; pen.index < commands.length; pen.index++) {
    const c = commands[pen.index];
    if (c.type === SVGPathData.CLOSE_PATH) pen.close();
    else if (c.type === SVGPathData.MOVE_TO) pen.moveTo([c.x, c.y]);
    else if (c.type === SVGPathData.LINE_TO) pen.lineTo([c.x, c.y]);
    else if (c.type === SVGPathData.HORIZ_LINE_TO) pen.lineTo([c.x, pen.y]);
    else if (c.type === SVGPathData.VERT_LINE_TO) pen.lineTo([pen.x, c.y]);
    else if (c.type === SVGPathData.CURVE_TO) pen.cubic([c.x1, c.y1], [c.x2, c.y2], [c.x, c.y]);
    else if (c.type === SVGPathData.SMOOTH_CURVE_TO) pen.cubic(null, [c.x2, c.y2], [c.x, c.y]);
    else if (c.type === SVGPathData.QUAD_TO) pen.quad([c.x1, c.y1], [c.x, c.y]);
    else if (c.type === SVGPathData.SMOOTH_QUAD_TO) pen.quad(null, [c.x, c.y]);
    else if (c.type === SVGPathData.ARC) pen.arc(c, [c.x, c.y]);
  }
  pen.flush();
  return pen.out;
}
