// The benches' one timing rule: one warm-up run, then the median of `runs` timed runs, ms.
export function median(fn: () => unknown, runs = 15): number {
  fn();
  const t: number[] = [];
  for (let i = 0; i < runs; i++) {
    const s = performance.now();
    fn();
    t.push(performance.now() - s);
  }
  t.sort((a, b) => a - b);
  return t[t.length >> 1];
}
