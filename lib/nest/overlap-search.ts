// Overlap minimisation in a container of fixed size by guided local search, the separation step of
// the strip-packing methods of Egeblad, Nielsen & Odgaard (2007, "Fast neighborhood search for two-
// and three-dimensional nesting problems", EJOR 183:1249–1266), Umetani et al. (2009, "Solving the
// irregular strip packing problem via guided local search for overlap minimization", International
// Transactions in Operational Research 16(6):661–683) and Gardeyn, Vanden Berghe & Wauters (2025,
// arXiv:2509.13329). Parts may overlap while the search runs; the overlap of a pair is measured by
// its penetration depth read off their no-fit polygon (penetration.ts), weighted by a per-pair
// penalty. A move takes one colliding part to the position and rotation where its weighted overlap
// is least: an exactly free spot from the no-fit polygons if there is one (Bennell & Oliveira
// 2008), otherwise the best of random positions refined by coordinate descent. After each sweep
// over the colliding parts, the penalties of the pairs still colliding grow (Voudouris & Tsang
// 1999, "Guided local search and its application to the traveling salesman problem", EJOR
// 113:469–499), so the search leaves local minima where a few large overlaps are stuck.
import type { Box } from "@/lib/geometry/box";
import type { ClipperLib } from "@/lib/geometry/clipper";
import { clamp, feasibleRegion, type PlacedShape } from "./bottom-left-fill";
import type { Budget } from "./budget";
import type { Copy } from "./decoder";
import { innerFitRectangle } from "./inner-fit";
import type { Nfp, NoFitCache } from "./no-fit-cache";
import { penetrationDepth } from "./penetration";
import type { Random } from "./random";
import { EXACT_FIT_STEPS, type ShapeSet } from "./shapes";

/** Positions of all copies, in integer steps; shape = index into the shape set. */
export interface Arrangement {
  shape: number[];
  x: number[];
  y: number[];
}

export interface OverlapSetup {
  lib: ClipperLib;
  set: ShapeSet;
  nfps: NoFitCache;
  copies: readonly Copy[];
  /** Allowed shape indices (rotations) of each item. */
  shapesOf: readonly (readonly number[])[];
  container: Box;
  rng: Random;
}

/** A pair this shallow (in integer steps) counts as touching. */
const TOUCH = 0.75;
export interface SeparationTuning {
  /** Share of the smaller part's size that any collision costs on top of its depth. */
  collisionFloor: number;
  /** Penalty factor for a pair still colliding after a sweep, and decay towards 1 for the others. */
  penaltyGrowth: number;
  penaltyDecay: number;
  penaltyCap: number;
  /** Random positions tried per move: anywhere in the container, and near the part. */
  globalSamples: number;
  localSamples: number;
  maxDescentEvaluations: number;
  /**
   * Chance that a move which found no overlap-free position by sampling also asks the no-fit
   * polygons for one (exact, but the dearest step of a move).
   */
  freeSpotChance: number;
}

export const DEFAULT_SEPARATION: SeparationTuning = {
  collisionFloor: 0.1,
  penaltyGrowth: 1.2,
  penaltyDecay: 0.95,
  penaltyCap: 1e6,
  globalSamples: 40,
  localSamples: 20,
  maxDescentEvaluations: 200,
  freeSpotChance: 0.3,
};

export class OverlapSearch {
  readonly a: Arrangement;
  /** Part rotations evaluated so far, the unit of effort for giving up. */
  work = 0;
  private readonly n: number;
  private readonly w: Float64Array;
  private readonly pd: Float64Array;
  /** Added to every colliding pair's depth, so that a shallow collision still costs something. */
  private readonly floor: Float64Array;
  private readonly row: (Nfp | null)[];
  private readonly rowW: Float64Array;
  private readonly rowF: Float64Array;
  private readonly rowSign: Int8Array;
  private readonly ifps: (Box | null)[];
  private readonly allowed: number[][];
  private readonly slackIfps: (Box | null)[];

  constructor(
    private readonly s: OverlapSetup,
    start: Arrangement,
    private readonly t: SeparationTuning = DEFAULT_SEPARATION,
  ) {
    this.n = start.shape.length;
    this.ifps = s.set.shapes.map((sh) => innerFitRectangle(s.container, sh.box));
    this.slackIfps = s.set.shapes.map((sh) => innerFitRectangle(s.container, sh.box, EXACT_FIT_STEPS));
    this.a = { shape: start.shape.slice(), x: start.x.slice(), y: start.y.slice() };
    // Rotations that do not fit this container are out for this search.
    this.allowed = s.shapesOf.map((list) => list.filter((sh) => this.ifps[sh]));
    for (let i = 0; i < this.n; i++) {
      const allowed = this.allowed[s.copies[i].item];
      if (allowed.length === 0) throw new Error("OverlapSearch: a part fits the container in no rotation");
      if (!this.ifps[this.a.shape[i]]) this.a.shape[i] = allowed[0];
      const f = this.ifps[this.a.shape[i]]!;
      this.a.x[i] = clamp(this.a.x[i], f.minX, f.maxX);
      this.a.y[i] = clamp(this.a.y[i], f.minY, f.maxY);
    }
    this.w = new Float64Array(this.n * this.n).fill(1);
    this.pd = new Float64Array(this.n * this.n);
    this.floor = new Float64Array(this.n * this.n);
    this.row = new Array(this.n).fill(null);
    this.rowW = new Float64Array(this.n);
    this.rowF = new Float64Array(this.n);
    this.rowSign = new Int8Array(this.n);
    const size = this.a.shape.map((_, i) => Math.sqrt(s.set.itemArea[s.copies[i].item]) * s.set.scale);
    for (let i = 0; i < this.n; i++)
      for (let j = 0; j < this.n; j++) this.floor[i * this.n + j] = this.t.collisionFloor * Math.min(size[i], size[j]);
    for (let i = 0; i < this.n; i++) this.updateRow(i);
  }

  /**
   * Penetration depth of the pair (i, j) with i in `shapeI` at (x, y). The no-fit polygon always
   * has the lower-numbered copy fixed, so that the pair has one depth whichever of the two moves.
   */
  private depth(i: number, shapeI: number, x: number, y: number, j: number): number {
    const a = this.a;
    return j < i
      ? penetrationDepth(this.s.nfps.get(a.shape[j], shapeI), x - a.x[j], y - a.y[j])
      : penetrationDepth(this.s.nfps.get(shapeI, a.shape[j]), a.x[j] - x, a.y[j] - y);
  }

  private updateRow(i: number): void {
    const { n, a } = this;
    for (let j = 0; j < n; j++) {
      if (j === i) continue;
      const d = this.depth(i, a.shape[i], a.x[i], a.y[i], j);
      this.pd[i * n + j] = d;
      this.pd[j * n + i] = d;
    }
  }

  /** Loads the no-fit polygons of `shape` against every other copy, for cost(). */
  private loadRow(i: number, shape: number): void {
    const { n, a, row, rowW, rowF, rowSign } = this;
    for (let j = 0; j < n; j++) {
      row[j] = j === i ? null : j < i ? this.s.nfps.get(a.shape[j], shape) : this.s.nfps.get(shape, a.shape[j]);
      rowSign[j] = j < i ? 1 : -1;
      rowW[j] = this.w[i * n + j];
      rowF[j] = this.floor[i * n + j];
    }
  }

  /** Weighted overlap of the copy whose row is loaded, at (x, y); stops early past `cutoff`. */
  private cost(x: number, y: number, cutoff: number): number {
    const { n, a, row, rowW, rowF, rowSign } = this;
    let c = 0;
    for (let j = 0; j < n; j++) {
      const nfp = row[j];
      if (!nfp) continue;
      const sg = rowSign[j];
      const d = penetrationDepth(nfp, sg * (x - a.x[j]), sg * (y - a.y[j]));
      if (d > TOUCH) {
        c += rowW[j] * (d + rowF[j]);
        if (c >= cutoff) return c;
      }
    }
    return c;
  }

  /**
   * Exchanges the places of two copies of different items (each keeps its rotation), the
   * disruption of Imamichi et al. (2009) and Gardeyn et al. (2025) for leaving a layout whose
   * structure cannot be separated at this length.
   */
  swapTwo(): void {
    const { a, s, n } = this;
    for (let attempt = 0; attempt < 50; attempt++) {
      const i = s.rng.int(n);
      const j = s.rng.int(n);
      if (s.copies[i].item === s.copies[j].item) continue;
      const fi = this.ifps[a.shape[i]];
      const fj = this.ifps[a.shape[j]];
      if (!fi || !fj) continue;
      const [xi, yi, xj, yj] = [a.x[i], a.y[i], a.x[j], a.y[j]];
      a.x[i] = clamp(xj, fi.minX, fi.maxX);
      a.y[i] = clamp(yj, fi.minY, fi.maxY);
      a.x[j] = clamp(xi, fj.minX, fj.maxX);
      a.y[j] = clamp(yi, fj.minY, fj.maxY);
      this.updateRow(i);
      this.updateRow(j);
      return;
    }
  }

  /** Sum of penetration depths over all pairs, in integer steps. */
  totalOverlap(): number {
    let t = 0;
    for (let i = 0; i < this.n; i++)
      for (let j = i + 1; j < this.n; j++) if (this.pd[i * this.n + j] > TOUCH) t += this.pd[i * this.n + j];
    return t;
  }

  colliding(): number[] {
    const out: number[] = [];
    for (let i = 0; i < this.n; i++)
      for (let j = 0; j < this.n; j++)
        if (j !== i && this.pd[i * this.n + j] > TOUCH) {
          out.push(i);
          break;
        }
    return out;
  }

  /** Moves copy i to its least-overlap position; true when it moved. */
  move(i: number): boolean {
    const { a, s } = this;
    const rng = s.rng;
    this.loadRow(i, a.shape[i]);
    const current = this.cost(a.x[i], a.y[i], Infinity);
    if (current === 0) return false;
    let best = { v: current, shape: a.shape[i], x: a.x[i], y: a.y[i] };
    const shapes = this.allowed[s.copies[i].item].slice();
    for (let k = shapes.length - 1; k > 0; k--) {
      const r = rng.int(k + 1);
      [shapes[k], shapes[r]] = [shapes[r], shapes[k]];
    }
    const others: PlacedShape[] = [];
    for (let j = 0; j < this.n; j++) if (j !== i) others.push({ shape: a.shape[j], x: a.x[j], y: a.y[j] });
    for (const shape of shapes) {
      const f = this.ifps[shape];
      if (!f) continue;
      this.work++;
      this.loadRow(i, shape);
      const box = s.set.shapes[shape].box;
      const size = Math.max(box.maxX - box.minX, box.maxY - box.minY);
      let top = { v: Infinity, x: 0, y: 0 };
      const trial = (x: number, y: number) => {
        x = Math.round(clamp(x, f.minX, f.maxX));
        y = Math.round(clamp(y, f.minY, f.maxY));
        const v = this.cost(x, y, top.v);
        if (v < top.v) top = { v, x, y };
      };
      if (shape === a.shape[i]) trial(a.x[i], a.y[i]);
      for (let k = 0; k < this.t.globalSamples; k++)
        trial(f.minX + rng.next() * (f.maxX - f.minX), f.minY + rng.next() * (f.maxY - f.minY));
      for (let k = 0; k < this.t.localSamples; k++)
        trial(a.x[i] + (rng.next() - 0.5) * size, a.y[i] + (rng.next() - 0.5) * size);
      const refined = this.descend(top, f, size / 8);
      if (refined.v < best.v) best = { shape, ...refined };
      if (best.v === 0) break;
      if (rng.next() < this.t.freeSpotChance) {
        const free = this.freeSpot(shape, others, a.x[i], a.y[i]);
        if (free) {
          best = { v: 0, shape, ...free };
          break;
        }
      }
    }
    if (!(best.v < current)) return false;
    a.shape[i] = best.shape;
    a.x[i] = best.x;
    a.y[i] = best.y;
    this.updateRow(i);
    return true;
  }

  /** An overlap-free position for `shape` among `others`, the one nearest (x, y); null if none. */
  private freeSpot(shape: number, others: PlacedShape[], x: number, y: number): { x: number; y: number } | null {
    const slack = this.slackIfps[shape];
    const f = this.ifps[shape]!;
    if (!slack) return null;
    const region = feasibleRegion(this.s.lib, this.s.nfps, shape, others, slack);
    let best: { x: number; y: number; d: number } | null = null;
    for (const path of region)
      for (const q of path) {
        const px = clamp(q.x, f.minX, f.maxX);
        const py = clamp(q.y, f.minY, f.maxY);
        const d = (px - x) ** 2 + (py - y) ** 2;
        if (!best || d < best.d) best = { x: px, y: py, d };
      }
    return best;
  }

  /** Coordinate descent: the step doubles after a success and halves after a failure, down to one integer step. */
  private descend(start: { v: number; x: number; y: number }, f: Box, step0: number) {
    let { v, x, y } = start;
    const maxStep = Math.max(1, Math.round(step0));
    let step = maxStep;
    let evaluations = 0;
    while (v > 0 && evaluations < this.t.maxDescentEvaluations) {
      let moved = false;
      const h = Math.round(step * Math.SQRT1_2);
      for (const [dx, dy] of [
        [step, 0],
        [-step, 0],
        [0, step],
        [0, -step],
        [h, h],
        [-h, -h],
        [h, -h],
        [-h, h],
      ]) {
        const nx = clamp(x + dx, f.minX, f.maxX);
        const ny = clamp(y + dy, f.minY, f.maxY);
        if (nx === x && ny === y) continue;
        const c = this.cost(nx, ny, v);
        evaluations++;
        if (c < v) {
          [v, x, y, moved] = [c, nx, ny, true];
          break;
        }
      }
      if (moved) step = Math.min(maxStep, step * 2);
      else if (step === 1) break;
      else step = Math.max(1, Math.floor(step / 2));
    }
    return { v, x, y };
  }

  /** Raises the penalty of every pair still colliding and lets the others decay back towards 1. */
  private penalise(): void {
    const { n } = this;
    for (let k = 0; k < n * n; k++)
      this.w[k] =
        this.pd[k] > TOUCH
          ? Math.min(this.t.penaltyCap, this.w[k] * this.t.penaltyGrowth)
          : Math.max(1, this.w[k] * this.t.penaltyDecay);
  }

  /**
   * Sweeps over the colliding copies until none collide (true), or until `maxStall` units of work
   * (part rotations evaluated) pass without a new lowest total overlap (false).
   */
  async run(budget: Budget, maxStall: number, pause: () => Promise<void>): Promise<boolean> {
    let bestTotal = this.totalOverlap();
    let since = this.work;
    while (!budget.done()) {
      const list = this.colliding();
      if (list.length === 0) return true;
      for (let k = list.length - 1; k > 0; k--) {
        const r = this.s.rng.int(k + 1);
        [list[k], list[r]] = [list[r], list[k]];
      }
      for (const i of list) {
        if (budget.done()) return false;
        this.move(i);
        budget.iterations++;
        await pause();
      }
      const t = this.totalOverlap();
      if (t === 0) return true;
      if (t < bestTotal * (1 - 1e-9)) {
        bestTotal = t;
        since = this.work;
      } else if (this.work - since > maxStall) return false;
      this.penalise();
    }
    return false;
  }
}
