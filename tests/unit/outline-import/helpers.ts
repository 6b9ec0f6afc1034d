import { readFileSync } from "node:fs";
import { expect } from "vitest";
import { importOutline, type ImportOptions, type ImportResult } from "@/lib/outline-import";

export const fixture = (name: string): Uint8Array =>
  new Uint8Array(readFileSync(new URL(`../../fixtures/outlines/${name}`, import.meta.url)));
export const fixtureText = (name: string): string => new TextDecoder().decode(fixture(name));

/** Imports a fixture file by name (as bytes, as an upload arrives). */
export function load(name: string, opts: ImportOptions): ImportResult {
  return importOutline({ name, bytes: fixture(name) }, opts);
}

export function ok(r: ImportResult): Extract<ImportResult, { ok: true }> {
  if (!r.ok) throw new Error(`expected ok, got error: ${r.error}`);
  return r;
}

export function refused(r: ImportResult, ...patterns: RegExp[]): string {
  expect(r.ok).toBe(false);
  const error = (r as { error: string }).error;
  for (const p of patterns) expect(error).toMatch(p);
  return error;
}

/** Shoelace area, written out independently of the library's own. */
export function area(points: ReadonlyArray<readonly [number, number]>): number {
  let s = 0;
  for (let i = 0; i < points.length; i++) {
    const [x0, y0] = points[i];
    const [x1, y1] = points[(i + 1) % points.length];
    s += x0 * y1 - x1 * y0;
  }
  return s / 2;
}
