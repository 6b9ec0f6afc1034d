// Where a revision's first cut plan starts (lib/cut-plan/form.ts startingChoice), over the seeded shop
// library (db/shop-library.json) numbered in the order the page lists it (by name): the project's
// figures win; without them a plywood sheet, never the larger mild steel one.
import { describe, expect, it } from "vitest";
import library from "@/db/shop-library.json";
import { formFromSettings, startingChoice, type ProjectStart } from "@/lib/cut-plan/form";
import { DEFAULT_CUT_SETTINGS } from "@/lib/cut/settings";

const byName = <T extends { name: string }>(rows: T[]) => [...rows].sort((a, b) => a.name.localeCompare(b.name));
const materials = byName(library.materials).map((m, i) => ({ id: 10 + i, name: m.name }));
const materialId = (name: string) => materials.find((m) => m.name === name)!.id;
const sheets = byName(library.stockSheets).map((s, i) => ({
  id: 100 + i,
  name: s.name,
  materialId: materialId(s.material),
  lengthMm: s.lengthMm,
  widthMm: s.widthMm,
}));
const machines = byName(library.machines).map((m, i) => ({ id: 200 + i, name: m.name, kind: m.kind }));
const shop = { materials, sheets, machines };

const sheetId = (name: string) => sheets.find((s) => s.name === name)!.id;
const machineId = (name: string) => machines.find((m) => m.name === name)!.id;
const sheetName = (id: number) => sheets.find((s) => s.id === id)?.name;
const machineName = (id: number) => machines.find((m) => m.id === id)?.name;

// The demo trike (docs/product.md): 6.0 m, two lines, 18 mm birch plywood on 2440 × 1220, a 6 mm router.
const trike: ProjectStart = {
  runLengthMm: 6000,
  trackLines: 2,
  stockSheetId: sheetId("Birch plywood 18 mm, 2440 x 1220"),
  machineId: machineId("CNC router, 6 mm cutter"),
};
const unset: ProjectStart = { runLengthMm: null, trackLines: null, stockSheetId: null, machineId: null };

describe("a new cut plan's starting choice", () => {
  it("takes the project's run, track lines, sheet (with its material) and machine", () => {
    const start = startingChoice(shop, { ...trike, runLengthMm: 5250, trackLines: 3 });
    expect(start.settings).toEqual({ runLength: 5250, trackLines: 3 });
    expect(sheetName(start.ids.stockSheetId)).toBe("Birch plywood 18 mm, 2440 x 1220");
    expect(start.ids.materialId).toBe(materialId("Birch plywood 18 mm"));
    expect(machineName(start.ids.machineId)).toBe("CNC router, 6 mm cutter");
    const form = formFromSettings(start.settings, start.ids);
    expect([form.runLength, form.trackLines]).toEqual(["5250", "3"]);
  });

  it("prefers the project's machine to the first router", () => {
    const start = startingChoice(shop, { ...unset, machineId: machineId("Abrasive waterjet") });
    expect(machineName(start.ids.machineId)).toBe("Abrasive waterjet");
  });

  it("puts the project's run ahead of the reviewed one, and keeps the review's end treatment", () => {
    const start = startingChoice(shop, trike, { runLength: 2400, endTreatment: "half" });
    expect(start.settings).toMatchObject({ runLength: 6000, endTreatment: "half" });
    // With no run on the project, the reviewed run is used.
    expect(startingChoice(shop, unset, { runLength: 4800, endTreatment: "flat" }).settings.runLength).toBe(4800);
  });

  it("without project figures starts on plywood, not the larger mild steel sheet, with a router", () => {
    for (const project of [null, unset]) {
      const start = startingChoice(shop, project);
      const name = sheetName(start.ids.stockSheetId)!;
      expect(name).toMatch(/plywood/i);
      expect(name).not.toMatch(/steel/i);
      expect(machines.find((m) => m.id === start.ids.machineId)?.kind).toBe("router");
      // The settings' own defaults (a 2400 mm run, two lines) apply.
      const form = formFromSettings(start.settings, start.ids);
      expect(Number(form.runLength)).toBe(DEFAULT_CUT_SETTINGS.runLength);
      expect(Number(form.trackLines)).toBe(DEFAULT_CUT_SETTINGS.trackLines);
    }
    // Mild steel is the largest sheet in the library, so the old rule (largest first) would have taken it.
    const largest = [...sheets].sort((a, b) => b.lengthMm * b.widthMm - a.lengthMm * a.widthMm)[0];
    expect(largest.name).toMatch(/steel/i);
  });

  it("falls back when the project's sheet or machine is no longer offered", () => {
    const retired = { ...trike, stockSheetId: 9999, machineId: 9998 };
    const start = startingChoice(shop, retired);
    expect(sheetName(start.ids.stockSheetId)).toMatch(/plywood/i);
    expect(machines.find((m) => m.id === start.ids.machineId)?.kind).toBe("router");
    // A sheet whose material is retired (not in the list) is not offered either.
    const noPly18 = { ...shop, materials: materials.filter((m) => m.name !== "Birch plywood 18 mm") };
    expect(sheetName(startingChoice(noPly18, trike).ids.stockSheetId)).toBe("Birch plywood 12 mm, 2440 x 1220");
  });

  it("takes the largest sheet when the library has no plywood", () => {
    const noPly = { ...shop, sheets: sheets.filter((s) => !/plywood/i.test(s.name)) };
    expect(sheetName(startingChoice(noPly, null).ids.stockSheetId)).toBe("Mild steel 6 mm, 2500 x 1250");
  });
});
