// Neighbourhood moves on a placement sequence, as in the sequence searches over BLF of Burke et
// al. (2006) and the 2-exchange of Gomes & Oliveira (2002, "A 2-exchange heuristic for nesting
// problems", EJOR 141:359–370): swap two copies, move one copy elsewhere, turn one copy to another
// allowed rotation, and (for a container too small for everything) move a copy that was left out
// to an earlier position. Each move reports the first position it changed, so that the decoder can
// keep the placements before it.
import type { Decoded, Gene } from "./decoder";
import type { Random } from "./random";

export interface Move {
  seq: Gene[];
  /** First position whose gene differs from the parent sequence. */
  from: number;
}

export function neighbour(
  seq: readonly Gene[],
  decoded: Decoded,
  rotations: (copy: number) => readonly number[],
  itemOf: (copy: number) => number,
  rng: Random,
): Move {
  const n = seq.length;
  const next = seq.slice();
  for (let attempt = 0; attempt < 20; attempt++) {
    const r = rng.next();
    if (r < 0.2 && decoded.unplacedCount > 0) {
      // Move a copy that was left out to an earlier position.
      const out: number[] = [];
      decoded.steps.forEach((s, i) => s.bin < 0 && out.push(i));
      const j = out[rng.int(out.length)];
      if (j === 0) continue;
      const i = rng.int(j);
      const [g] = next.splice(j, 1);
      next.splice(i, 0, g);
      return { seq: next, from: i };
    }
    if (r < 0.45) {
      const i = rng.int(n);
      const allowed = rotations(seq[i].copy).filter((r) => r !== seq[i].rot);
      if (allowed.length === 0) continue;
      next[i] = { copy: seq[i].copy, rot: allowed[rng.int(allowed.length)] };
      return { seq: next, from: i };
    }
    if (n < 2) break;
    let i = rng.int(n);
    let j = rng.int(n);
    if (i === j || itemOf(seq[i].copy) === itemOf(seq[j].copy)) continue;
    if (i > j) [i, j] = [j, i];
    if (r < 0.75) {
      [next[i], next[j]] = [next[j], next[i]];
    } else if (rng.next() < 0.5) {
      const [g] = next.splice(j, 1);
      next.splice(i, 0, g);
    } else {
      const [g] = next.splice(i, 1);
      next.splice(j, 0, g);
    }
    return { seq: next, from: i };
  }
  return { seq: next, from: n };
}
