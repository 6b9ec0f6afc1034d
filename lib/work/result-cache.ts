// Results of immutable inputs, kept within a memory bound (least recently used out first). An
// optimisation only: whatever is asked for is computed again when it is not here, so nothing may
// depend on finding it. Keys are SHA-256 digests (FIPS 180-4) of the canonical input.
import { sha256 } from "@noble/hashes/sha2.js";
import { bytesToHex, utf8ToBytes } from "@noble/hashes/utils.js";
import { LRUCache } from "lru-cache";

/**
 * Rough bytes held by a value: 8 per number, 2 per string character, 16 per object or array slot,
 * the byte length of binary data. Enough to bound the cache; it walks the value once.
 */
export function roughBytes(value: unknown, depth = 0): number {
  if (value === null || value === undefined) return 8;
  if (typeof value === "number" || typeof value === "boolean") return 8;
  if (typeof value === "string") return 2 * value.length + 16;
  if (ArrayBuffer.isView(value)) return value.byteLength + 64;
  if (depth > 64) return 64;
  if (Array.isArray(value)) {
    let n = 16 + 8 * value.length;
    for (const v of value) n += typeof v === "number" ? 0 : roughBytes(v, depth + 1);
    return n;
  }
  if (value instanceof Map) {
    let n = 64;
    for (const [k, v] of value) n += roughBytes(k, depth + 1) + roughBytes(v, depth + 1);
    return n;
  }
  if (typeof value === "object") {
    let n = 32;
    for (const [k, v] of Object.entries(value)) n += 2 * k.length + 16 + roughBytes(v, depth + 1);
    return n;
  }
  return 16;
}

/** A key for any JSON-able input: its JSON with sorted object keys, hashed. */
export function inputKey(...parts: unknown[]): string {
  return bytesToHex(sha256(utf8ToBytes(JSON.stringify(parts, sortedKeys))));
}

function sortedKeys(_key: string, value: unknown): unknown {
  if (value && typeof value === "object" && !Array.isArray(value) && !ArrayBuffer.isView(value))
    return Object.fromEntries(Object.entries(value).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0)));
  return value;
}

export interface ResultCache<V extends object> {
  /** The cached value, else `make()`'s (kept when it is not larger than an eighth of the bound). */
  get(key: string, make: () => Promise<V> | V): Promise<V>;
  readonly stats: { hits: number; misses: number; bytes: number; entries: number };
}

export function resultCache<V extends object>(maxBytes: number): ResultCache<V> {
  const lru = new LRUCache<string, V>({
    maxSize: Math.max(1, maxBytes),
    maxEntrySize: Math.max(1, Math.floor(maxBytes / 8)),
    sizeCalculation: (v) => Math.max(1, roughBytes(v)),
  });
  // Two requests for one key while it is being made share the one computation.
  const pending = new Map<string, Promise<V>>();
  const counts = { hits: 0, misses: 0 };
  return {
    async get(key, make) {
      const found = lru.get(key);
      if (found !== undefined) {
        counts.hits++;
        return found;
      }
      const running = pending.get(key);
      if (running) {
        counts.hits++;
        return running;
      }
      counts.misses++;
      const p = Promise.resolve()
        .then(make)
        .then((v) => {
          lru.set(key, v);
          return v;
        })
        .finally(() => pending.delete(key));
      pending.set(key, p);
      return p;
    },
    get stats() {
      return { ...counts, bytes: lru.calculatedSize, entries: lru.size };
    },
  };
}
