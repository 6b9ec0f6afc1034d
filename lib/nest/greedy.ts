// The first layout: copies in order of decreasing area (the usual first order for BLF, Burke et al.
// 2006), each in the allowed rotation that bottom-left-fill puts on the earliest container and
// ends nearest the left (smallest right edge). If the run is cancelled or out of time part-way, the
// remaining copies keep their first rotation so that a complete layout still comes back quickly.
import type { Budget } from "./budget";
import { decode, type Decoded, type DecoderSetup, type Gene } from "./decoder";

export async function greedyLayout(
  setup: DecoderSetup,
  order: readonly number[],
  rotations: (copy: number) => readonly number[],
  budget: Budget,
): Promise<{ seq: Gene[]; decoded: Decoded }> {
  const seq: Gene[] = [];
  let partial: Decoded | undefined;
  for (const copy of order) {
    const options = budget.done() ? rotations(copy).slice(0, 1) : rotations(copy);
    let best: { g: Gene; d: Decoded; key: [number, number] } | undefined;
    for (const rot of options) {
      const g = { copy, rot };
      const d = decode(setup, [...seq, g], seq.length, partial);
      const s = d.steps[d.steps.length - 1];
      const key: [number, number] = s.bin < 0 ? [Infinity, 0] : [s.bin, s.x + setup.set.shapes[s.shape].box.maxX];
      if (!best || key[0] < best.key[0] || (key[0] === best.key[0] && key[1] < best.key[1])) best = { g, d, key };
    }
    seq.push(best!.g);
    partial = best!.d;
    await budget.pause(() => ({
      bestUtilisation: 0,
      placed: seq.length,
      total: order.length,
      message: "first layout",
    }));
  }
  return { seq, decoded: partial ?? decode(setup, seq) };
}
