// The shop library's forms: materials, stock sheets, machines. Every figure is in millimetres (or
// its SI unit) with limits a real shop would meet; a row must say where its figures come from.
import { z } from "zod";
import { DEFAULT_POISSON } from "./limits";
import { GRAIN_DIRECTIONS, MACHINE_KINDS, MATERIAL_KINDS, SOURCE_KINDS } from "@/db/schema";

function number(what: string, min: number, max: number, unit: string) {
  return z.coerce
    .number({ error: `Enter the ${what} as a number.` })
    .refine(Number.isFinite, { error: `Enter the ${what} as a number.` })
    .refine((v) => v > min, { error: `The ${what} must be more than ${min} ${unit}.` })
    .refine((v) => v <= max, { error: `The ${what} must be at most ${max} ${unit}.` });
}

const name = z
  .string({ error: "Enter a name." })
  .trim()
  .min(1, { error: "Enter a name." })
  .max(120, { error: "A name has at most 120 characters." });
const source = z
  .string({ error: "Say where the figures come from." })
  .trim()
  .min(3, { error: "Say where the figures come from (a source, or 'common practice')." })
  .max(500, { error: "Keep the source under 500 characters." });
const sourceKind = z.enum(SOURCE_KINDS, { error: "Choose published, common practice or measured." });
const optionalNumber = (what: string, min: number, max: number) =>
  z.preprocess((v) => (v === "" || v === undefined || v === null ? null : v), number(what, min, max, "").nullable());

export const rowIdField = z.coerce.number({ error: "No such row." }).int().positive({ error: "No such row." });

export const materialSchema = z.object({
  name,
  kind: z.enum(MATERIAL_KINDS, { error: "Choose a sheet or a tread." }).default("sheet"),
  thicknessMm: number("thickness", 0, 500, "mm"),
  densityKgM3: number("density", 0, 25_000, "kg/m³"),
  modulusGpa: number("modulus", 0, 1_000, "GPa"),
  strengthMpa: number("strength", 0, 5_000, "MPa"),
  // Left empty: the usual figure for wood and metals (as the column's default).
  poisson: z.preprocess(
    (v) => (v === "" || v === undefined || v === null ? DEFAULT_POISSON : v),
    z.coerce
      .number({ error: "Enter Poisson's ratio as a number." })
      .refine((v) => Number.isFinite(v) && v >= 0 && v < 0.5, {
        error: "Poisson's ratio must be from 0 to under 0.5.",
      }),
  ),
  allowableMpa: optionalNumber("allowable contact stress", 0, 10_000),
  frictionStatic: number("static friction coefficient", 0, 3, ""),
  frictionKinetic: optionalNumber("kinetic friction coefficient", 0, 3),
  frictionPair: z.string().trim().max(160, { error: "Keep the surfaces under 160 characters." }).default(""),
  source,
  sourceKind,
});

export const stockSheetSchema = z.object({
  name,
  materialId: rowIdField,
  lengthMm: number("length", 0, 20_000, "mm"),
  widthMm: number("width", 0, 20_000, "mm"),
  grain: z.enum(GRAIN_DIRECTIONS, { error: "Choose along the length, across the width, or none." }),
  source,
  sourceKind,
});

export const machineSchema = z
  .object({
    name,
    kind: z.enum(MACHINE_KINDS, { error: "Choose router, laser, waterjet or plasma." }),
    kerfMm: number("kerf", 0, 50, "mm"),
    bedLengthMm: number("bed length", 0, 20_000, "mm"),
    bedWidthMm: number("bed width", 0, 20_000, "mm"),
    minInsideRadiusMm: z.coerce
      .number({ error: "Enter the smallest inside radius as a number." })
      .refine((v) => Number.isFinite(v) && v >= 0 && v <= 100, {
        error: "The smallest inside radius must be between 0 and 100 mm.",
      }),
    source,
    sourceKind,
  })
  .refine((m) => m.kind !== "router" || m.minInsideRadiusMm >= m.kerfMm / 2 - 1e-9, {
    path: ["minInsideRadiusMm"],
    error: "A router cannot cut an inside corner tighter than its cutter radius (half the kerf).",
  });

export const SHOP_TABLES = ["materials", "stockSheets", "machines"] as const;
export type ShopTable = (typeof SHOP_TABLES)[number];

export const setShopRowActiveSchema = z.object({
  table: z.enum(SHOP_TABLES, { error: "No such list." }),
  id: rowIdField,
  active: z.enum(["true", "false"]).transform((v) => v === "true"),
});
