// Seeded pseudo-random numbers: Marsaglia's xorshift128 (G. Marsaglia 2003, "Xorshift RNGs",
// Journal of Statistical Software 8(14)), its four state words filled from the seed by the
// paper's 32-bit xorshift. Same seed, same sequence, on every platform.
export interface Random {
  /** Uniform in [0, 1). */
  next(): number;
  /** Uniform integer in [0, n). */
  int(n: number): number;
}

export function seededRandom(seed: number): Random {
  let s = (seed >>> 0) ^ 0x9e3779b9 || 0x6c078965;
  const xorshift32 = () => {
    s ^= s << 13;
    s ^= s >>> 17;
    s ^= s << 5;
    return s >>> 0;
  };
  let x = xorshift32();
  let y = xorshift32();
  let z = xorshift32();
  let w = xorshift32();
  const next = () => {
    const t = x ^ (x << 11);
    x = y;
    y = z;
    z = w;
    w = (w ^ (w >>> 19) ^ (t ^ (t >>> 8))) >>> 0;
    return w / 4294967296;
  };
  return { next, int: (n) => Math.floor(next() * n) };
}
