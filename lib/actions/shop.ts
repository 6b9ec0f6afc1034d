"use server";
// Shop library form actions (admins and fabricators): add or change a material, stock sheet or
// machine; retire or restore one.
import { revalidatePath } from "next/cache";
import { z } from "zod";
import { saveShopRow, setShopRowActive } from "@/db/queries/shop";
import { formAction } from "@/lib/server/action";
import { requireRole } from "@/lib/server/dal";
import {
  machineSchema,
  materialSchema,
  rowIdField,
  setShopRowActiveSchema,
  stockSheetSchema,
} from "@/lib/validation/shop";

const shopStaff = () => requireRole("admin", "fabricator");
// Forms for a new row send no id (or an empty one); forms for an existing row send its id.
const optionalId = z.object({ id: rowIdField.optional().or(z.literal("").transform(() => undefined)) });

function done(id: number | undefined, what: string) {
  revalidatePath("/shop");
  return id === undefined ? `Added ${what}.` : `Saved ${what}.`;
}

const materialForm = formAction(
  z.intersection(materialSchema, optionalId),
  shopStaff,
  async ({ id, ...values }, actor) => {
    await saveShopRow(actor, "materials", values, id);
    return done(id, values.name);
  },
);
export async function saveMaterialAction(...args: Parameters<typeof materialForm>) {
  return materialForm(...args);
}

const sheetForm = formAction(
  z.intersection(stockSheetSchema, optionalId),
  shopStaff,
  async ({ id, ...values }, actor) => {
    await saveShopRow(actor, "stockSheets", values, id);
    return done(id, values.name);
  },
);
export async function saveStockSheetAction(...args: Parameters<typeof sheetForm>) {
  return sheetForm(...args);
}

const machineForm = formAction(
  z.intersection(machineSchema, optionalId),
  shopStaff,
  async ({ id, ...values }, actor) => {
    await saveShopRow(actor, "machines", values, id);
    return done(id, values.name);
  },
);
export async function saveMachineAction(...args: Parameters<typeof machineForm>) {
  return machineForm(...args);
}

const activeForm = formAction(setShopRowActiveSchema, shopStaff, async (input, actor) => {
  await setShopRowActive(actor, input.table, input.id, input.active);
  revalidatePath("/shop");
  return input.active ? "Restored." : "Retired.";
});
export async function setShopRowActiveAction(...args: Parameters<typeof activeForm>) {
  return activeForm(...args);
}
