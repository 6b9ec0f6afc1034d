// The working spec of a design, kept in the browser so unsaved changes survive a reload.
import type { DesignSpecInput } from "@/lib/track";

const key = (designId: number) => `axlewright:draft:${designId}`;

export function loadLocalDraft(designId: number): DesignSpecInput | null {
  try {
    const raw = globalThis.localStorage?.getItem(key(designId));
    return raw ? (JSON.parse(raw) as DesignSpecInput) : null;
  } catch {
    return null;
  }
}

export function saveLocalDraft(designId: number, spec: DesignSpecInput): void {
  try {
    globalThis.localStorage?.setItem(key(designId), JSON.stringify(spec));
  } catch {
    /* storage full or disabled: the change stays in memory only */
  }
}

export function clearLocalDraft(designId: number): void {
  globalThis.localStorage?.removeItem(key(designId));
}

/** Same design? Compared as JSON with keys sorted, so key order does not matter. */
export function sameSpec(a: unknown, b: unknown): boolean {
  const sorted = (v: unknown): unknown =>
    Array.isArray(v) ? v.map(sorted) : v && typeof v === "object" ? Object.fromEntries(Object.entries(v).sort(([x], [y]) => (x < y ? -1 : 1)).map(([k, x]) => [k, sorted(x)])) : v;
  return JSON.stringify(sorted(a)) === JSON.stringify(sorted(b));
}

const loadsKey = (designId: number) => `axlewright:loads:${designId}`;

/** The working load settings, kept beside the working spec (unchecked here: the caller parses them). */
export function loadLocalLoads(designId: number): unknown {
  try {
    const raw = globalThis.localStorage?.getItem(loadsKey(designId));
    return raw ? JSON.parse(raw) : null;
  } catch {
    return null;
  }
}

export function saveLocalLoads(designId: number, loads: unknown): void {
  try {
    globalThis.localStorage?.setItem(loadsKey(designId), JSON.stringify(loads));
  } catch {
    /* storage full or disabled: the change stays in memory only */
  }
}

export function clearLocalLoads(designId: number): void {
  globalThis.localStorage?.removeItem(loadsKey(designId));
}
