// The working spec of a design, kept in the browser so unsaved changes survive a reload.
import type { DesignSpecInput } from "@/lib/track";

/** One JSON value per design in the browser's storage under `axlewright:<what>:<design id>`. */
function perDesign<T>(what: string) {
  const key = (designId: number) => `axlewright:${what}:${designId}`;
  return {
    load(designId: number): T | null {
      try {
        const raw = globalThis.localStorage?.getItem(key(designId));
        return raw ? (JSON.parse(raw) as T) : null;
      } catch {
        return null;
      }
    },
    save(designId: number, value: T): void {
      try {
        globalThis.localStorage?.setItem(key(designId), JSON.stringify(value));
      } catch {
        /* storage full or disabled: the change stays in memory only */
      }
    },
    clear(designId: number): void {
      globalThis.localStorage?.removeItem(key(designId));
    },
  };
}

const drafts = perDesign<DesignSpecInput>("draft");
export const loadLocalDraft = drafts.load;
export const saveLocalDraft = drafts.save;
export const clearLocalDraft = drafts.clear;

/** Same design? Compared as JSON with keys sorted, so key order does not matter. */
export function sameSpec(a: unknown, b: unknown): boolean {
  const sorted = (v: unknown): unknown =>
    Array.isArray(v)
      ? v.map(sorted)
      : v && typeof v === "object"
        ? Object.fromEntries(
            Object.entries(v)
              .sort(([x], [y]) => (x < y ? -1 : 1))
              .map(([k, x]) => [k, sorted(x)]),
          )
        : v;
  return JSON.stringify(sorted(a)) === JSON.stringify(sorted(b));
}

/** The working load settings, kept beside the working spec (unchecked here: the caller parses them). */
const loads = perDesign<unknown>("loads");
export const loadLocalLoads = loads.load;
export const saveLocalLoads = loads.save;
export const clearLocalLoads = loads.clear;
