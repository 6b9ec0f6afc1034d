// LINE and ARC entities joined end to end, within the chord tolerance, into chains (one loop when
// they meet). Ends are found through a grid of tolerance-sized cells, so joining stays near linear.

import { fail, fmt, fmtPt, type Pt, type Subpath } from "./common";
import { dist } from "./geometry";

/** One LINE or ARC, already flattened and in output coordinates. */
export interface Piece {
  points: Pt[];
  label: string;
  arcs: number;
}

/** LINE and ARC pieces joined end to end where their ends lie within tol (reversing as needed). */
export function chain(pieces: Piece[], tol: number, notes: string[]): Subpath[] {
  const cell = tol;
  const grid = new Map<string, Array<{ piece: number; end: 0 | 1 }>>();
  const key = (p: Pt, dx = 0, dy = 0) => {
    const gx = Math.floor(p[0] / cell) + dx;
    const gy = Math.floor(p[1] / cell) + dy;
    if (!Number.isFinite(gx) || !Number.isFinite(gy))
      fail("The DXF's coordinates are too large for the tolerance; use a larger tolerance.");
    return `${gx},${gy}`;
  };
  const endOf = (i: number, end: 0 | 1): Pt =>
    end === 0 ? pieces[i].points[0] : pieces[i].points[pieces[i].points.length - 1];
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
        for (const c of grid.get(key(p, dx, dy)) ?? [])
          if (!used[c.piece] && dist(endOf(c.piece, c.end), p) <= tol) found.push(c);
    return found;
  };
  const out: Subpath[] = [];
  for (let s = 0; s < pieces.length; s++) {
    if (used[s]) continue;
    used[s] = true;
    // The chain grows at both ends: tail in order, head in reverse (pushing keeps joining linear).
    const tail = pieces[s].points.slice();
    const head: Pt[] = [];
    const startPt = () => (head.length ? head[head.length - 1] : tail[0]);
    let arcs = pieces[s].arcs;
    let count = 1;
    const first = pieces[s].label;
    for (const direction of ["forward", "backward"] as const) {
      for (;;) {
        const tip = direction === "forward" ? tail[tail.length - 1] : startPt();
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
        const add = pieces[c.piece].points;
        // Skip the shared end; forward runs from the joined end, backward towards it.
        if (direction === "forward") {
          if (c.end === 0) for (let k = 1; k < add.length; k++) tail.push(add[k]);
          else for (let k = add.length - 2; k >= 0; k--) tail.push(add[k]);
        } else if (c.end === 1) for (let k = add.length - 2; k >= 0; k--) head.push(add[k]);
        else for (let k = 1; k < add.length; k++) head.push(add[k]);
      }
      // A chain that came back to its start needs no backward pass.
      if (direction === "forward" && count > 1 && dist(tail[0], tail[tail.length - 1]) <= tol) break;
    }
    const pts = head.reverse().concat(tail);
    const closed = dist(pts[0], pts[pts.length - 1]) <= tol && pts.length > 2;
    out.push({
      points: pts,
      closed,
      arcs,
      curves: 0,
      label: `the chain of ${count} LINE/ARC piece${count === 1 ? "" : "s"} that includes ${first}`,
    });
  }
  if (out.length > 1)
    notes.push(
      `the LINE and ARC entities form ${out.length} separate chains (joined where ends lie within ${fmt(tol)})`,
    );
  return out;
}
