import "server-only";
// The shop library: materials, stock sheets and machines. Rows are retired rather than deleted, so a
// cut plan made with a row can still name it, and a retired row can be brought back.
import { asc, eq } from "drizzle-orm";
import { db } from "@/db";
import { isDuplicateKey } from "@/db/duplicate-key";
import { machines, materials, stockSheets, type Machine, type Material, type StockSheet } from "@/db/schema";
import { audit } from "./audit";
import type { CurrentUser } from "./current-user";
import { Refusal } from "./refusal";
import type { ShopTable } from "@/lib/validation/shop";

export interface StockSheetRow extends StockSheet {
  materialName: string;
  thicknessMm: number;
}

export interface ShopLibrary {
  materials: Material[];
  stockSheets: StockSheetRow[];
  machines: Machine[];
}

const tables = { materials, stockSheets, machines } as const;
const entityNames: Record<ShopTable, string> = {
  materials: "materials",
  stockSheets: "stock_sheets",
  machines: "machines",
};

export async function listShopLibrary({ activeOnly = false } = {}): Promise<ShopLibrary> {
  const [m, s, k] = await Promise.all([
    db.select().from(materials).orderBy(asc(materials.name)),
    db
      .select({ sheet: stockSheets, materialName: materials.name, thicknessMm: materials.thicknessMm })
      .from(stockSheets)
      .innerJoin(materials, eq(materials.id, stockSheets.materialId))
      .orderBy(asc(stockSheets.name)),
    db.select().from(machines).orderBy(asc(machines.name)),
  ]);
  const keep = <T extends { active: boolean }>(rows: T[]) => (activeOnly ? rows.filter((r) => r.active) : rows);
  return {
    materials: keep(m),
    stockSheets: keep(s.map((r) => ({ ...r.sheet, materialName: r.materialName, thicknessMm: r.thicknessMm }))),
    machines: keep(k),
  };
}

async function nameIsFree<T extends ShopTable>(table: T, name: string, exceptId?: number) {
  const t = tables[table];
  const [row] = await db.select({ id: t.id }).from(t).where(eq(t.name, name)).limit(1);
  if (row && row.id !== exceptId)
    throw new Refusal("conflict", "That name is already in the library.", { name: ["Already in use."] });
}

async function assertMaterial(id: number) {
  const [row] = await db.select({ id: materials.id }).from(materials).where(eq(materials.id, id)).limit(1);
  if (!row)
    throw new Refusal("bad_request", "Choose a material from the library.", { materialId: ["No such material."] });
}

type Values = {
  materials: typeof materials.$inferInsert;
  stockSheets: typeof stockSheets.$inferInsert;
  machines: typeof machines.$inferInsert;
};

/** Adds a row (id undefined) or changes one; either way the change is logged with its values. */
export async function saveShopRow<T extends ShopTable>(
  actor: CurrentUser,
  table: T,
  values: Values[T],
  id?: number,
): Promise<number> {
  await nameIsFree(table, values.name, id);
  if (table === "stockSheets") await assertMaterial((values as Values["stockSheets"]).materialId);
  const t = tables[table];
  try {
    return await db.transaction(async (tx) => {
      let rowId = id;
      if (rowId === undefined) {
        const [res] = await tx.insert(t).values(values as never);
        rowId = res.insertId;
      } else {
        const [res] = await tx
          .update(t)
          .set(values as never)
          .where(eq(t.id, rowId));
        if (res.affectedRows === 0) throw new Refusal("not_found", "No such row in the library.");
      }
      await audit(tx, {
        actorId: actor.id,
        action: id === undefined ? "create" : "update",
        entity: entityNames[table],
        entityId: rowId,
        detail: values as Record<string, unknown>,
      });
      return rowId;
    });
  } catch (error) {
    if (isDuplicateKey(error))
      throw new Refusal("conflict", "That name is already in the library.", { name: ["Already in use."] });
    throw error;
  }
}

export async function setShopRowActive(
  actor: CurrentUser,
  table: ShopTable,
  id: number,
  active: boolean,
): Promise<void> {
  const t = tables[table];
  await db.transaction(async (tx) => {
    const [res] = await tx.update(t).set({ active }).where(eq(t.id, id));
    if (res.affectedRows === 0) throw new Refusal("not_found", "No such row in the library.");
    await audit(tx, {
      actorId: actor.id,
      action: active ? "restore" : "retire",
      entity: entityNames[table],
      entityId: id,
    });
  });
}

export async function getShopRows(ids: { materialId: number; stockSheetId: number; machineId: number }) {
  const [[material], [sheet], [machine]] = await Promise.all([
    db.select().from(materials).where(eq(materials.id, ids.materialId)).limit(1),
    db.select().from(stockSheets).where(eq(stockSheets.id, ids.stockSheetId)).limit(1),
    db.select().from(machines).where(eq(machines.id, ids.machineId)).limit(1),
  ]);
  if (!material)
    throw new Refusal("bad_request", "Choose a material from the library.", { materialId: ["No such material."] });
  if (!sheet)
    throw new Refusal("bad_request", "Choose a stock sheet from the library.", {
      stockSheetId: ["No such stock sheet."],
    });
  if (!machine)
    throw new Refusal("bad_request", "Choose a machine from the library.", { machineId: ["No such machine."] });
  return { material, sheet, machine };
}
