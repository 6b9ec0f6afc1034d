// No-fit polygons per ordered pair of collision shapes (Bennell & Oliveira 2008), computed on
// first use and kept for the rest of the run; copies of one item share them.
import { boundsOfXY, union, type Box } from "@/lib/geometry/box";
import type { ClipperLib } from "@/lib/geometry/clipper";
import type { clipper } from "@/lib/geometry/clipper";
import { holeFit } from "./hole-fit";
import { noFitPolygon } from "./minkowski";
import type { ShapeSet } from "./shapes";

export interface Nfp {
  paths: clipper.Paths;
  box: Box;
  /** Every edge of every ring as x1, y1, x2, y2 (for penetration depths). */
  edges: Float64Array;
}

function edgeList(paths: clipper.Paths): Float64Array {
  const n = paths.reduce((s, p) => s + p.length, 0);
  const e = new Float64Array(4 * n);
  let k = 0;
  for (const p of paths)
    for (let i = 0; i < p.length; i++) {
      const q = p[(i + 1) % p.length];
      e[k++] = p[i].x;
      e[k++] = p[i].y;
      e[k++] = q.x;
      e[k++] = q.y;
    }
  return e;
}

export class NoFitCache {
  private readonly table: (Nfp | undefined)[];
  private readonly n: number;
  computed = 0;
  /** Time spent computing no-fit polygons, seconds. */
  seconds = 0;

  constructor(
    private readonly lib: ClipperLib,
    private readonly set: ShapeSet,
  ) {
    this.n = set.shapes.length;
    this.table = new Array(this.n * this.n);
  }

  private readonly holeTable = new Map<string, { paths: clipper.Paths; box: Box | null }>();

  /** Positions of shape `moving` inside hole `k` of shape `host` (placed at the origin), computed once. */
  holeFit(host: number, k: number, moving: number): { paths: clipper.Paths; box: Box | null } {
    const key = `${host}/${k}/${moving}`;
    let fit = this.holeTable.get(key);
    if (!fit) {
      const t0 = typeof performance !== "undefined" ? performance.now() : Date.now();
      const paths = holeFit(this.lib, this.set.shapes[host].holes[k], this.set.shapes[moving].orbiting);
      fit = { paths, box: paths.length ? paths.map((p) => boundsOfXY(p)).reduce((a, b) => union(a, b)) : null };
      this.holeTable.set(key, fit);
      this.seconds += ((typeof performance !== "undefined" ? performance.now() : Date.now()) - t0) / 1000;
    }
    return fit;
  }

  /** NFP of shape `moving` around shape `fixed` placed at the origin. */
  get(fixed: number, moving: number): Nfp {
    const k = fixed * this.n + moving;
    let nfp = this.table[k];
    if (!nfp) {
      const t0 = typeof performance !== "undefined" ? performance.now() : Date.now();
      const paths = noFitPolygon(this.lib, this.set.shapes[fixed].stationary, this.set.shapes[moving].orbiting);
      const box = paths.map((p) => boundsOfXY(p)).reduce((a, b) => union(a, b));
      nfp = { paths, box, edges: edgeList(paths) };
      this.table[k] = nfp;
      this.computed++;
      this.seconds += ((typeof performance !== "undefined" ? performance.now() : Date.now()) - t0) / 1000;
    }
    return nfp;
  }
}
