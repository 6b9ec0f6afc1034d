// The result cache (lib/work/result-cache.ts): within its memory bound whatever is put in, one
// computation for two callers of one key, refusals never kept, and keys that ignore key order.
import { describe, expect, it } from "vitest";
import { inputKey, resultCache, roughBytes } from "@/lib/work/result-cache";

describe("the result cache", () => {
  it("stays within its bound, dropping the least recently used first", async () => {
    const cache = resultCache<{ points: number[] }>(100_000);
    const value = () => ({ points: Array.from({ length: 1000 }, (_, i) => i) });
    // Each value is about 8 kB (1000 numbers at 8 bytes), so about 12 fit.
    expect(roughBytes(value())).toBeGreaterThan(8000);
    await cache.get("first", value);
    for (let i = 0; i < 50; i++) {
      await cache.get(`k${i}`, value);
      await cache.get("first", value); // kept in use, so never the one dropped
    }
    expect(cache.stats.bytes).toBeLessThanOrEqual(100_000);
    expect(cache.stats.entries).toBeGreaterThan(5);
    expect(cache.stats.entries).toBeLessThan(51);
    const misses = cache.stats.misses;
    await cache.get("first", value);
    expect(cache.stats.misses).toBe(misses);
    await cache.get("k0", value); // long since dropped: made again
    expect(cache.stats.misses).toBe(misses + 1);
  });

  it("makes a value once for callers who ask for it together", async () => {
    const cache = resultCache<{ n: number }>(1_000_000);
    let made = 0;
    const slow = () => new Promise<{ n: number }>((resolve) => setTimeout(() => resolve({ n: ++made }), 20));
    const [a, b] = await Promise.all([cache.get("x", slow), cache.get("x", slow)]);
    expect(made).toBe(1);
    expect(a).toBe(b);
  });

  it("never keeps a refusal: the next caller tries again", async () => {
    const cache = resultCache<{ ok: boolean }>(1_000_000);
    await expect(
      cache.get("bad", () => {
        throw new Error("refused");
      }),
    ).rejects.toThrow("refused");
    expect(await cache.get("bad", () => ({ ok: true }))).toEqual({ ok: true });
  });

  it("does not keep a value larger than an eighth of its bound", async () => {
    const cache = resultCache<{ points: number[] }>(80_000);
    await cache.get("big", () => ({ points: new Array(2000).fill(1) }));
    expect(cache.stats.entries).toBe(0);
  });

  it("keys inputs by content, whatever the order of their keys", () => {
    expect(inputKey({ a: 1, b: { c: 2, d: 3 } })).toBe(inputKey({ b: { d: 3, c: 2 }, a: 1 }));
    expect(inputKey({ a: 1 })).not.toBe(inputKey({ a: 2 }));
    expect(inputKey({ a: [1, 2] })).not.toBe(inputKey({ a: [2, 1] }));
  });
});
