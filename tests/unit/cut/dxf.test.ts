// DXF files read back by an independent parser: ezdxf 0.18.1 (strict readfile + audit, run by
// tests/reference/dxf_check.py with /usr/bin/python3), and dxf-parser 1.1.2 in-process. Checks
// follow docs/fabrication.md §6.5: $INSUNITS (Autodesk DXF Reference: 4 = mm, 1 = in), layers in the LAYER
// table, closed polylines, no duplicate or zero-length segments (end points hashed at 1 µm), and the
// geometry equal to the parts' (which the track and wheel tests tie to the engine).
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import DxfParser from "dxf-parser";
import type { Pt } from "@/lib/track";
import { buildCutParts, type CutPlanResult } from "@/lib/cut/plan";
import { kerfParts, type ToolPath } from "@/lib/cut/kerf";
import { buildDrawing, partsRow, sheetParts } from "@/lib/cut/export/drawing";
import { drawingToDxf } from "@/lib/cut/export/dxf";
import { ringArea } from "@/lib/geometry/ring";
import type { SheetNestResult } from "@/lib/nest/types";
import { DEMO_SETTINGS, font, rowNest, SQUARE_SPEC, squareResult } from "./support/fixtures";
import { ezdxfCheck, type EzEntity, type EzFile } from "./support/dxf-check";

/** Rotation about the origin by a multiple of 90°, then translation: the nester's placement, written out here on its own. */
function place(p: readonly [number, number], deg: number, x: number, y: number): Pt {
  const q = ((Math.round(deg / 90) % 4) + 4) % 4;
  const [c, s] = [
    [1, 0],
    [0, 1],
    [-1, 0],
    [0, -1],
  ][q];
  return [p[0] * c - p[1] * s + x, p[0] * s + p[1] * c + y];
}

const um = (v: number, mmPer: number) => Math.round(v * mmPer * 1000);
const segKey = (a: readonly number[], b: readonly number[], k: number) => {
  const ka = `${um(a[0], k)},${um(a[1], k)}`;
  const kb = `${um(b[0], k)},${um(b[1], k)}`;
  return ka < kb ? `${ka}|${kb}` : `${kb}|${ka}`;
};

function segments(e: EzEntity): Array<[number[], number[]]> {
  if (e.type === "LINE") return [[e.start!, e.end!]];
  const p = e.points!;
  return p.map((v, i) => [v, p[(i + 1) % p.length]] as [number[], number[]]);
}

/** The structural checks every file must pass. */
function checkStructure(f: EzFile, insunits: number) {
  const mmPer = insunits === 1 ? 25.4 : 1;
  expect(f.audit_errors).toEqual([]);
  expect(f.insunits).toBe(insunits);
  for (const l of ["CUT_OUTSIDE", "CUT_INSIDE", "DRILL", "ENGRAVE", "REFERENCE"]) expect(f.layers).toContain(l);
  const seen = new Set<string>();
  let dup = 0;
  let zero = 0;
  for (const e of f.entities) {
    expect(f.layers).toContain(e.layer);
    expect(["LWPOLYLINE", "CIRCLE", "LINE", "TEXT"]).toContain(e.type);
    // Notes (the approval line) are text on REFERENCE, which is never cut.
    if (e.type === "TEXT") {
      expect(e.layer).toBe("REFERENCE");
      continue;
    }
    if (e.type === "LWPOLYLINE" || e.type === "POLYLINE") {
      expect(e.closed).toBe(true);
      expect(e.points!.every((v) => v[2] === 0)).toBe(true); // straight edges only
    }
    if (e.type === "CIRCLE") {
      expect(e.layer).toBe("DRILL");
      const k = `c${um(e.center![0], mmPer)},${um(e.center![1], mmPer)},${um(e.radius!, mmPer)}`;
      if (seen.has(k)) dup++;
      seen.add(k);
      continue;
    }
    if (e.type === "LINE") expect(e.layer).toBe("ENGRAVE");
    for (const [a, b] of segments(e)) {
      const k = segKey(a, b, mmPer);
      const [ka, kb] = k.split("|");
      if (ka === kb) zero++;
      if (seen.has(k)) dup++;
      seen.add(k);
    }
  }
  expect(zero).toBe(0);
  expect(dup).toBe(0);
}

describe("DXF export", () => {
  let plan: CutPlanResult;
  let paths: Map<string, ToolPath>;
  let nest: SheetNestResult;
  let files: EzFile[];
  let texts: Record<string, string>;
  beforeAll(async () => {
    plan = buildCutParts(SQUARE_SPEC, squareResult(), DEMO_SETTINGS, { font: font() });
    paths = (await kerfParts(plan.parts, plan.settings)).paths;
    nest = rowNest(plan.parts, { length: 2440, width: 1220 }, 10, 6);
    const frame = [{ minX: 0, minY: 0, maxX: 2440, maxY: 1220 }];
    const drawings = {
      parts: buildDrawing(partsRow(plan.parts, { gap: 26 }), { units: "mm" }),
      sheet: buildDrawing(sheetParts(plan.parts, nest.sheets[0].placements), { units: "mm", frames: frame }),
      inches: buildDrawing(sheetParts(plan.parts, nest.sheets[0].placements), { units: "in", frames: frame }),
      kerfed: buildDrawing(sheetParts(plan.parts, nest.sheets[0].placements), {
        units: "mm",
        frames: frame,
        toolPaths: paths,
      }),
      noted: buildDrawing(sheetParts(plan.parts, nest.sheets[0].placements), {
        units: "in",
        frames: frame,
        notes: ["APPROVED R1 0123456789ab/2026-12-02 by A. Client", "Trike run track R1"],
      }),
    };
    const dir = mkdtempSync(join(tmpdir(), "axlewright-dxf-"));
    texts = {};
    const list = Object.entries(drawings).map(([name, d]) => {
      const path = join(dir, `${name}.dxf`);
      texts[name] = drawingToDxf(d);
      writeFileSync(path, texts[name]);
      return path;
    });
    files = ezdxfCheck(list);
  });

  it("reads back strictly with 0 audit errors, units declared, layers, closed and unique", () => {
    const [parts, sheet, inches, kerfed] = files;
    expect(parts.dxfversion).toBe("AC1021"); // AutoCAD 2007 (Autodesk DXF Reference, $ACADVER)
    checkStructure(parts, 4);
    checkStructure(sheet, 4);
    checkStructure(inches, 1);
    checkStructure(kerfed, 4);
    checkStructure(files[4], 1);
  });

  it("writes notes as TEXT on REFERENCE, above the sheet and in the drawing's unit", () => {
    const notes = files[4].entities.filter((e) => e.type === "TEXT");
    expect(notes.map((e) => e.text)).toEqual([
      "APPROVED R1 0123456789ab/2026-12-02 by A. Client",
      "Trike run track R1",
    ]);
    for (const n of notes) {
      // 10 mm cap height in inches (25.4 mm to the inch), above the 1220 mm sheet.
      expect(n.height).toBeCloseTo(10 / 25.4, 9);
      expect(n.insert![1]).toBeGreaterThan(1220 / 25.4);
    }
    expect(notes[0].insert![1]).toBeGreaterThan(notes[1].insert![1]);
  });

  it("places every part's outline, holes, drills and engraving where the nest put them", () => {
    const sheet = files[1];
    const polys = sheet.entities.filter((e) => e.type === "LWPOLYLINE");
    const byFirst = new Map(polys.map((e) => [`${um(e.points![0][0], 1)},${um(e.points![0][1], 1)},${e.layer}`, e]));
    const byId = new Map(plan.parts.map((p) => [p.id, p]));
    let rings = 0;
    let circles = 0;
    const lines = new Set<string>();
    for (const pl of nest.sheets[0].placements) {
      const part = byId.get(pl.id)!;
      const check = (ring: Pt[], layer: string) => {
        const pts = ring.map((q) => place(q, pl.rotation, pl.x, pl.y));
        const e = byFirst.get(`${um(pts[0][0], 1)},${um(pts[0][1], 1)},${layer}`);
        expect(e, `${part.id} ${layer} ring at ${pts[0].join(", ")}`).toBeDefined();
        expect(e!.points).toHaveLength(pts.length);
        e!.points!.forEach((v, i) => {
          expect(Math.abs(v[0] - pts[i][0])).toBeLessThan(1e-9);
          expect(Math.abs(v[1] - pts[i][1])).toBeLessThan(1e-9);
        });
        expect(e!.area!).toBeCloseTo(ringArea(ring), 6); // ezdxf.math.area against the shoelace of the part's ring
        rings++;
      };
      check(part.region.outer, "CUT_OUTSIDE");
      for (const h of part.region.holes) check(h, "CUT_INSIDE");
      for (const d of part.drill) {
        const c = place([d.x, d.y], pl.rotation, pl.x, pl.y);
        const e = sheet.entities.find(
          (x) => x.type === "CIRCLE" && Math.hypot(x.center![0] - c[0], x.center![1] - c[1]) < 1e-9,
        );
        expect(e?.radius).toBeCloseTo(d.diameter / 2, 12);
        circles++;
      }
      for (const s of part.engrave)
        for (let i = 1; i < s.length; i++)
          lines.add(segKey(place(s[i - 1], pl.rotation, pl.x, pl.y), place(s[i], pl.rotation, pl.x, pl.y), 1));
    }
    expect(polys.filter((e) => e.layer !== "REFERENCE")).toHaveLength(rings);
    expect(sheet.entities.filter((e) => e.type === "CIRCLE")).toHaveLength(circles);
    const dxfLines = new Set(sheet.entities.filter((e) => e.type === "LINE").map((e) => segKey(e.start!, e.end!, 1)));
    expect(dxfLines).toEqual(lines);
    // The sheet outline on REFERENCE, 2440 × 1220.
    const ref = polys.find((e) => e.layer === "REFERENCE")!;
    expect(ref.area).toBeCloseTo(2440 * 1220, 6);
  });

  it("writes inches as millimetres ÷ 25.4", () => {
    const mm = files[1].entities;
    const inch = files[2].entities;
    expect(inch).toHaveLength(mm.length);
    mm.forEach((e, i) => {
      const f = inch[i];
      expect(f.type).toBe(e.type);
      if (e.points) e.points.forEach((v, j) => expect(f.points![j][0] * 25.4).toBeCloseTo(v[0], 9));
      if (e.radius) expect(f.radius! * 25.4).toBeCloseTo(e.radius, 9);
      if (e.area) expect(f.area! * 25.4 * 25.4).toBeCloseTo(e.area, 4);
    });
  });

  it("holds the tool-centre paths when the kerf is in the file", () => {
    const kerfed = files[3];
    const outs = kerfed.entities.filter((e) => e.layer === "CUT_OUTSIDE");
    const byId = new Map(plan.parts.map((p) => [p.id, p]));
    const expected = nest.sheets[0].placements.map((pl) => ringArea(paths.get(pl.id)!.outer)).sort((a, b) => a - b);
    expect(
      outs
        .map((e) => e.area!)
        .sort((a, b) => a - b)
        .map((a) => Number(a.toFixed(3))),
    ).toEqual(expected.map((a) => Number(a.toFixed(3))));
    // Each tool path is larger than its part by about perimeter × k/2 (docs/fabrication.md §4.1).
    for (const pl of nest.sheets[0].placements)
      expect(ringArea(paths.get(pl.id)!.outer)).toBeGreaterThan(ringArea(byId.get(pl.id)!.region.outer));
  });

  it("stops on two parts drawn on top of each other instead of dropping one", () => {
    const w = plan.parts.find((p) => p.id === "W1")!;
    expect(() =>
      buildDrawing(
        [
          { part: w, rotation: 0, x: 500, y: 500 },
          { part: w, rotation: 0, x: 500, y: 500 },
        ],
        { units: "mm" },
      ),
    ).toThrow(/on top of each other/);
  });

  it("dxf-parser reads the same file in-process", () => {
    const dxf = new DxfParser().parseSync(texts.parts)!;
    expect(dxf.header.$INSUNITS).toBe(4);
    expect(Object.keys(dxf.tables.layer.layers)).toEqual(
      expect.arrayContaining(["CUT_OUTSIDE", "CUT_INSIDE", "DRILL", "ENGRAVE", "REFERENCE"]),
    );
    expect(dxf.entities).toHaveLength(files[0].entities.length);
    for (const e of dxf.entities)
      if (e.type === "LWPOLYLINE") expect((e as unknown as { shape: boolean }).shape).toBe(true);
    const wheel = plan.parts.find((p) => p.id === "W1")!;
    const polys = dxf.entities.filter((e) => e.type === "LWPOLYLINE") as unknown as Array<{
      vertices: Array<{ x: number; y: number }>;
    }>;
    // The wheel outline appears with the engine's vertex count (a square: 4 corners and the side's middle).
    expect(polys.some((p) => p.vertices.length === wheel.region.outer.length)).toBe(true);
  });
});
