// The demo job's cut-plan request (docs/product.md §3: 400 mm square wheels on a 6.0 m run, 18 mm birch
// plywood on 2440 × 1220 mm sheets, a 6 mm router), and a nest that holds, made the way a browser
// would (here with the plain shelf layout of lib/cut).
import { eq } from "drizzle-orm";
import { db } from "@/db";
import { machines, materials, stockSheets } from "@/db/schema";
import { getShopRows } from "@/db/queries/shop";
import { buildCutParts, nestItemsFor, shelfLayout } from "@/lib/cut";
import { composeSettings, type PlanChoice } from "@/lib/cut-plan/compose";
import { solve } from "@/lib/track";

export const SQUARE = {
  mode: "track-for-wheel",
  units: "mm",
  wheel: { kind: "polygon", sides: 4, side: 400, cornerRadius: 0 },
};

async function idByName(table: typeof materials | typeof stockSheets | typeof machines, name: string) {
  const [row] = await db.select({ id: table.id }).from(table).where(eq(table.name, name));
  return row.id;
}

export async function demoChoice(): Promise<PlanChoice> {
  return {
    materialId: await idByName(materials, "Birch plywood 18 mm"),
    stockSheetId: await idByName(stockSheets, "Birch plywood 18 mm, 2440 x 1220"),
    machineId: await idByName(machines, "CNC router, 6 mm cutter"),
    settings: { runLength: 6000, endTreatment: "flat", trackLines: 2, wheelCount: 2 },
  };
}

export async function validNest(c: PlanChoice, spec: unknown = SQUARE) {
  const library = await getShopRows(c);
  const settings = composeSettings(c, library, "Cut plan test");
  const result = solve(spec);
  const plan = buildCutParts(spec, result, settings);
  const items = await nestItemsFor(plan.parts, plan.settings);
  const s = plan.settings;
  return {
    nest: shelfLayout({
      items,
      sheet: { width: s.sheet.length, height: s.sheet.width },
      margin: s.margin,
      spacing: s.spacing,
    }),
    plan,
  };
}
