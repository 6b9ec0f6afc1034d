// The shop library: what an admin or fabricator can add and change, the messages bad figures get,
// and that a refused save writes nothing.
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { eq } from "drizzle-orm";
import { db, pool } from "@/db";
import { machines, materials } from "@/db/schema";
import { listShopLibrary } from "@/db/queries/shop";
import {
  saveMachineAction,
  saveMaterialAction,
  saveStockSheetAction,
  setShopRowActiveAction,
} from "@/lib/actions/shop";
import { actAs } from "./support/session";
import { auditCount, makeUser, runTag } from "./support/fixtures";

vi.mock("@/auth", async () => (await import("./support/session")).mockAuth);
vi.mock("next/cache", async () => (await import("./support/session")).mockCache);

const form = (values: Record<string, string | number>) => {
  const f = new FormData();
  for (const [k, v] of Object.entries(values)) f.set(k, String(v));
  return f;
};

const router = (name: string, over: Record<string, string | number> = {}) => ({
  name,
  kind: "router",
  kerfMm: 6,
  bedLengthMm: 2500,
  bedWidthMm: 1250,
  minInsideRadiusMm: 3,
  source: "common practice",
  sourceKind: "common-practice",
  ...over,
});

beforeAll(async () => {
  actAs((await makeUser("fabricator", "shop-fabricator")).id);
});

afterAll(async () => {
  await pool.end();
});

describe("the seeded library", () => {
  it("holds the demo's plywood, sheet and router, each with a source", async () => {
    const library = await listShopLibrary();
    // The demo scenario (docs/product.md §3): 18 mm birch plywood on 2440 × 1220 mm sheets, a 6 mm router.
    const ply = library.materials.find((m) => m.name === "Birch plywood 18 mm");
    expect(ply?.thicknessMm).toBe(18);
    const sheet = library.stockSheets.find((s) => s.name === "Birch plywood 18 mm, 2440 x 1220");
    expect([sheet?.lengthMm, sheet?.widthMm, sheet?.materialName]).toEqual([2440, 1220, "Birch plywood 18 mm"]);
    const cutter = library.machines.find((m) => m.name === "CNC router, 6 mm cutter");
    expect([cutter?.kind, cutter?.kerfMm, cutter?.minInsideRadiusMm]).toEqual(["router", 6, 3]);
    for (const row of [...library.materials, ...library.stockSheets, ...library.machines])
      expect(row.source.length).toBeGreaterThan(10);
  });
});

describe("saving rows", () => {
  it("adds a machine, then changes it in place", async () => {
    const name = `Bench router ${runTag}`;
    const added = await saveMachineAction({}, form(router(name)));
    expect(added).toMatchObject({ ok: true, message: `Added ${name}.` });
    const [row] = await db.select().from(machines).where(eq(machines.name, name));
    const changed = await saveMachineAction(
      {},
      form(router(name, { id: row.id, kerfMm: 3.175, minInsideRadiusMm: 1.6 })),
    );
    expect(changed.ok).toBe(true);
    const [after] = await db.select().from(machines).where(eq(machines.id, row.id));
    expect([after.kerfMm, after.minInsideRadiusMm]).toEqual([3.175, 1.6]);
  });

  it.each([
    [{ kerfMm: 0 }, "kerfMm", "The kerf must be more than 0 mm."],
    [{ kerfMm: -2 }, "kerfMm", "The kerf must be more than 0 mm."],
    [{ kerfMm: "six" }, "kerfMm", "Enter the kerf as a number."],
    [
      { minInsideRadiusMm: 1 },
      "minInsideRadiusMm",
      "A router cannot cut an inside corner tighter than its cutter radius (half the kerf).",
    ],
    [{ source: "" }, "source", "Say where the figures come from (a source, or 'common practice')."],
  ])("refuses %o with a message on %s and writes nothing", async (over, field, message) => {
    const before = await auditCount();
    const state = await saveMachineAction({}, form(router(`Bad router ${runTag} ${field}`, over)));
    expect(state.ok).toBe(false);
    expect(state.fields?.[field]).toContain(message);
    expect(state.values?.name).toBe(`Bad router ${runTag} ${field}`);
    expect(await auditCount()).toBe(before);
  });

  it("refuses a second row with the same name", async () => {
    const name = `Twice ${runTag}`;
    expect((await saveMachineAction({}, form(router(name)))).ok).toBe(true);
    const again = await saveMachineAction({}, form(router(name)));
    expect(again).toMatchObject({ ok: false, status: 409 });
    expect(again.fields?.name).toEqual(["Already in use."]);
  });

  it("refuses a stock sheet of a material that does not exist", async () => {
    const state = await saveStockSheetAction(
      {},
      form({
        name: `Ghost sheet ${runTag}`,
        materialId: 999999,
        lengthMm: 2440,
        widthMm: 1220,
        grain: "length",
        source: "common practice",
        sourceKind: "common-practice",
      }),
    );
    expect(state).toMatchObject({ ok: false, status: 400 });
    expect(state.fields?.materialId).toEqual(["No such material."]);
  });

  it("retires and restores a material", async () => {
    const name = `Retiring ply ${runTag}`;
    const saved = await saveMaterialAction(
      {},
      form({
        name,
        thicknessMm: 12,
        densityKgM3: 680,
        modulusGpa: 7,
        strengthMpa: 40,
        frictionStatic: 0.6,
        frictionKinetic: "",
        frictionPair: "",
        source: "common practice",
        sourceKind: "common-practice",
      }),
    );
    expect(saved.ok).toBe(true);
    const [row] = await db.select().from(materials).where(eq(materials.name, name));
    expect(row.frictionKinetic).toBeNull();
    expect((await setShopRowActiveAction({}, form({ table: "materials", id: row.id, active: "false" }))).message).toBe(
      "Retired.",
    );
    expect((await listShopLibrary({ activeOnly: true })).materials.map((m) => m.name)).not.toContain(name);
    expect((await setShopRowActiveAction({}, form({ table: "materials", id: row.id, active: "true" }))).message).toBe(
      "Restored.",
    );
    expect((await listShopLibrary({ activeOnly: true })).materials.map((m) => m.name)).toContain(name);
  });
});
