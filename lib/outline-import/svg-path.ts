// The SVG path data reader: the grammar of SVG 1.1 §8.3.9 ("The grammar for path data") — commands
// M L H V C S Q T A Z in absolute and relative form, implicit repeats (extra pairs after M are
// line-tos), numbers run together ("1-2", "0.5.5"), arc flags written without separators
// ("a1 1 0 00 1 1"), the S/T control-point reflection of §8.3.6/§8.3.7 and, after Z, a new
// subpath starting at the closed one's first point (§8.3.3). Any error in the data refuses the
// path, naming the character where it went wrong (renderers draw up to the error; an importer that
// did that would hand the engine half a wheel). Curves are flattened after the transform m.

import { fail, MAX_PATH_COMMANDS, PointBudget, type Pt, type Subpath } from "./common";
import { endpointToCentre, flattenArc, flattenCubic, flattenQuad } from "./curves";
import { apply, type Affine } from "./geometry";

export type { Subpath };

export interface PathCounter {
  commands: number;
}

const isDigit = (c: number) => c >= 48 && c <= 57;
const isWsp = (c: number) => c === 32 || c === 9 || c === 10 || c === 13 || c === 12;

/** A cursor over a string of SVG numbers (path data, points lists, transform arguments). */
export class NumberScanner {
  i = 0;
  constructor(readonly s: string) {}
  get done(): boolean {
    return this.i >= this.s.length;
  }
  skipWsp(): void {
    while (this.i < this.s.length && isWsp(this.s.charCodeAt(this.i))) this.i++;
  }
  /** Whitespace, at most one comma, whitespace. */
  skipCommaWsp(): void {
    this.skipWsp();
    if (this.s.charCodeAt(this.i) === 44) {
      this.i++;
      this.skipWsp();
    }
  }
  atNumber(): boolean {
    const c = this.s.charCodeAt(this.i);
    if (isDigit(c)) return true;
    if (c === 43 || c === 45) {
      const d = this.s.charCodeAt(this.i + 1);
      return isDigit(d) || (d === 46 && isDigit(this.s.charCodeAt(this.i + 2)));
    }
    return c === 46 && isDigit(this.s.charCodeAt(this.i + 1));
  }
  /** A number at the cursor, or null (cursor unchanged). */
  number(): number | null {
    const s = this.s;
    let j = this.i;
    if (s.charCodeAt(j) === 43 || s.charCodeAt(j) === 45) j++;
    let digits = 0;
    while (isDigit(s.charCodeAt(j))) {
      j++;
      digits++;
    }
    if (s.charCodeAt(j) === 46) {
      j++;
      while (isDigit(s.charCodeAt(j))) {
        j++;
        digits++;
      }
    }
    if (digits === 0) return null;
    const e = s.charCodeAt(j);
    if (e === 101 || e === 69) {
      let k = j + 1;
      if (s.charCodeAt(k) === 43 || s.charCodeAt(k) === 45) k++;
      if (isDigit(s.charCodeAt(k))) {
        while (isDigit(s.charCodeAt(k))) k++;
        j = k;
      }
    }
    const v = Number(s.slice(this.i, j));
    if (!Number.isFinite(v)) return null;
    this.i = j;
    return v;
  }
  /** An arc flag: a single '0' or '1'. */
  flag(): boolean | null {
    const c = this.s.charCodeAt(this.i);
    if (c === 48 || c === 49) {
      this.i++;
      return c === 49;
    }
    return null;
  }
}

/** Flattened subpaths of one path's d attribute, mapped by m. */
export function pathToSubpaths(d: string, m: Affine, tol: number, budget: PointBudget, label: string, counter: PathCounter): Subpath[] {
  const sc = new NumberScanner(d);
  const out: Subpath[] = [];
  let cur: Pt = [0, 0];
  let start: Pt = [0, 0];
  let ctrl: Pt | null = null; // last control point, for S (after C/S) and T (after Q/T)
  let ctrlKind: "cubic" | "quad" | null = null;
  const st: { sub: Subpath | null } = { sub: null };
  const bad = (what: string): never => fail(`${label}: ${what} at character ${sc.i + 1} of its path data (d="${d.slice(Math.max(0, sc.i - 12), sc.i + 12)}").`);
  const where = () => `${label}, command at character ${sc.i + 1},`;
  const flush = () => {
    if (st.sub && st.sub.points.length >= 2) out.push(st.sub);
    st.sub = null;
  };
  const begin = (p: Pt) => {
    flush();
    budget.take(1, where);
    st.sub = { points: [apply(m, p[0], p[1])], closed: false, arcs: 0, curves: 0, label: `${label} subpath ${out.length + 1}` };
  };
  const current = (): Subpath => {
    if (!st.sub) begin(cur);
    return st.sub as Subpath;
  };
  const num = (): number => {
    sc.skipCommaWsp();
    const v = sc.number();
    if (v === null) bad("expected a number");
    return v as number;
  };
  const flag = (): boolean => {
    sc.skipCommaWsp();
    const v = sc.flag();
    if (v === null) bad("expected an arc flag (0 or 1)");
    return v as boolean;
  };
  const lineTo = (p: Pt) => {
    const s = current();
    budget.take(1, where);
    s.points.push(apply(m, p[0], p[1]));
    cur = p;
  };
  const more = (): boolean => {
    const save = sc.i;
    sc.skipCommaWsp();
    if (sc.atNumber()) return true;
    sc.i = save;
    return false;
  };

  sc.skipWsp();
  let first = true;
  while (!sc.done) {
    const ch = d[sc.i];
    if (!/[MmLlHhVvCcSsQqTtAaZz]/.test(ch)) bad(`unexpected "${ch}"`);
    if (first && ch !== "M" && ch !== "m") bad("path data must begin with a moveto (M or m)");
    first = false;
    sc.i++;
    if (++counter.commands > MAX_PATH_COMMANDS)
      fail(`The file has more than ${MAX_PATH_COMMANDS.toLocaleString("en-US")} path commands, the most the importer reads; simplify the drawing.`);
    const rel = ch === ch.toLowerCase();
    const C = ch.toUpperCase();
    if (C === "Z") {
      if (st.sub) {
        st.sub.closed = true;
        flush();
      }
      cur = start;
      ctrl = null;
      ctrlKind = null;
      sc.skipWsp();
      continue;
    }
    let firstSet = true;
    do {
      const ox = rel ? cur[0] : 0;
      const oy = rel ? cur[1] : 0;
      let nextCtrl: Pt | null = null;
      let nextKind: "cubic" | "quad" | null = null;
      switch (C) {
        case "M": {
          const p: Pt = [ox + num(), oy + num()];
          if (firstSet) {
            begin(p);
            cur = p;
            start = p;
          } else lineTo(p);
          break;
        }
        case "L":
          lineTo([ox + num(), oy + num()]);
          break;
        case "H":
          lineTo([ox + num(), cur[1]]);
          break;
        case "V":
          lineTo([cur[0], oy + num()]);
          break;
        case "C":
        case "S": {
          let c1: Pt;
          if (C === "C") c1 = [ox + num(), oy + num()];
          else c1 = ctrl && ctrlKind === "cubic" ? [2 * cur[0] - ctrl[0], 2 * cur[1] - ctrl[1]] : cur;
          const c2: Pt = [ox + num(), oy + num()];
          const p: Pt = [ox + num(), oy + num()];
          const s = current();
          const t = (q: Pt) => apply(m, q[0], q[1]);
          s.points.push(...flattenCubic(t(cur), t(c1), t(c2), t(p), tol, budget, where));
          s.curves++;
          cur = p;
          nextCtrl = c2;
          nextKind = "cubic";
          break;
        }
        case "Q":
        case "T": {
          let c1: Pt;
          if (C === "Q") c1 = [ox + num(), oy + num()];
          else c1 = ctrl && ctrlKind === "quad" ? [2 * cur[0] - ctrl[0], 2 * cur[1] - ctrl[1]] : cur;
          const p: Pt = [ox + num(), oy + num()];
          const s = current();
          const t = (q: Pt) => apply(m, q[0], q[1]);
          s.points.push(...flattenQuad(t(cur), t(c1), t(p), tol, budget, where));
          s.curves++;
          cur = p;
          nextCtrl = c1;
          nextKind = "quad";
          break;
        }
        case "A": {
          const rx = num();
          const ry = num();
          const rot = num();
          const large = flag();
          const sweep = flag();
          const p: Pt = [ox + num(), oy + num()];
          const e = endpointToCentre(cur[0], cur[1], rx, ry, rot, large, sweep, p[0], p[1]);
          if (e.kind === "line") lineTo(p);
          else if (e.kind === "arc") {
            const s = current();
            const pts = flattenArc(e.arc, m, tol, budget, where);
            pts[pts.length - 1] = apply(m, p[0], p[1]);
            s.points.push(...pts);
            s.arcs++;
            cur = p;
          }
          break;
        }
      }
      ctrl = nextCtrl;
      ctrlKind = nextKind;
      firstSet = false;
    } while (more());
    sc.skipWsp();
  }
  flush();
  return out;
}
