"use client";
// Forms of the shop library: one form per kind of row, used both to add a row (no `row`) and to
// change one (inside the row's "Edit" disclosure). A failed save keeps what was typed.
import { useActionState } from "react";
import type { Machine, Material } from "@/db/schema";
import type { StockSheetRow } from "@/db/queries/shop";
import {
  saveMachineAction,
  saveMaterialAction,
  saveStockSheetAction,
  setShopRowActiveAction,
} from "@/lib/actions/shop";
import { DEFAULT_POISSON } from "@/lib/validation/limits";
import type { ShopTable } from "@/lib/validation/shop";
import { Button } from "./ui/button";
import { MACHINE_KIND_LABELS, MATERIAL_KIND_LABELS } from "@/lib/labels";
import { SelectField, TextField } from "./ui/field";
import { FormMessage } from "./ui/notice";

const SOURCE_KIND_OPTIONS = [
  { value: "published", label: "Published source" },
  { value: "common-practice", label: "Common practice" },
  { value: "measured", label: "Measured in our shop" },
];

type Fields = Record<string, string[] | undefined> | undefined;

function useShopForm(action: typeof saveMaterialAction) {
  return useActionState(action, {});
}

/** Field ids must be unique on a page that holds one form per row. */
const fieldId = (prefix: string, name: string) => `${prefix}-${name}`;

function SourceFields({
  prefix,
  v,
  fields,
  row,
}: {
  prefix: string;
  v: Record<string, string>;
  fields: Fields;
  row?: { source: string; sourceKind: string };
}) {
  return (
    <>
      <TextField
        id={fieldId(prefix, "source")}
        label="Source of the figures"
        name="source"
        maxLength={500}
        defaultValue={v.source ?? row?.source}
        errors={fields?.source}
        hint="A book, standard, datasheet or page — or say it is common practice."
      />
      <SelectField
        id={fieldId(prefix, "sourceKind")}
        label="Kind of source"
        name="sourceKind"
        defaultValue={v.sourceKind ?? row?.sourceKind ?? "published"}
        errors={fields?.sourceKind}
        options={SOURCE_KIND_OPTIONS}
      />
    </>
  );
}

function Submit({ pending, adding }: { pending: boolean; adding: boolean }) {
  return (
    <Button type="submit" disabled={pending}>
      {pending ? "Saving…" : adding ? "Add" : "Save changes"}
    </Button>
  );
}

export function MaterialForm({ row }: { row?: Material }) {
  const [state, action, pending] = useShopForm(saveMaterialAction);
  const v = state.values ?? {};
  const f = state.fields;
  const p = row ? `material-${row.id}` : "material-new";
  const num = (key: keyof Material) =>
    v[key] ?? (row?.[key] === null || row?.[key] === undefined ? "" : String(row[key]));
  return (
    <form action={action} className="grid gap-3 sm:grid-cols-3" noValidate>
      {row ? <input type="hidden" name="id" value={row.id} /> : null}
      <TextField
        id={fieldId(p, "name")}
        label="Name"
        name="name"
        maxLength={120}
        defaultValue={v.name ?? row?.name}
        errors={f?.name}
      />
      <SelectField
        id={fieldId(p, "kind")}
        label="Used as"
        name="kind"
        defaultValue={v.kind ?? row?.kind ?? "sheet"}
        errors={f?.kind}
        options={Object.entries(MATERIAL_KIND_LABELS).map(([value, label]) => ({ value, label }))}
      />
      <TextField
        id={fieldId(p, "thicknessMm")}
        label="Thickness (mm)"
        name="thicknessMm"
        inputMode="decimal"
        defaultValue={num("thicknessMm")}
        errors={f?.thicknessMm}
      />
      <TextField
        id={fieldId(p, "densityKgM3")}
        label="Density (kg/m³)"
        name="densityKgM3"
        inputMode="decimal"
        defaultValue={num("densityKgM3")}
        errors={f?.densityKgM3}
      />
      <TextField
        id={fieldId(p, "modulusGpa")}
        label="Modulus (GPa)"
        name="modulusGpa"
        inputMode="decimal"
        defaultValue={num("modulusGpa")}
        errors={f?.modulusGpa}
      />
      <TextField
        id={fieldId(p, "strengthMpa")}
        label="Strength (MPa)"
        name="strengthMpa"
        inputMode="decimal"
        defaultValue={num("strengthMpa")}
        errors={f?.strengthMpa}
      />
      <TextField
        id={fieldId(p, "poisson")}
        label="Poisson's ratio ν"
        name="poisson"
        inputMode="decimal"
        defaultValue={num("poisson") || String(DEFAULT_POISSON)}
        errors={f?.poisson}
      />
      <TextField
        id={fieldId(p, "allowableMpa")}
        label="Allowable contact stress (MPa)"
        name="allowableMpa"
        inputMode="decimal"
        defaultValue={num("allowableMpa")}
        errors={f?.allowableMpa}
        hint="For wood: compression perpendicular to the grain. Leave empty if not known."
      />
      <TextField
        id={fieldId(p, "frictionStatic")}
        label="Static friction μ"
        name="frictionStatic"
        inputMode="decimal"
        defaultValue={num("frictionStatic")}
        errors={f?.frictionStatic}
      />
      <TextField
        id={fieldId(p, "frictionKinetic")}
        label="Kinetic friction μ"
        name="frictionKinetic"
        inputMode="decimal"
        defaultValue={num("frictionKinetic")}
        errors={f?.frictionKinetic}
        hint="Leave empty if not known."
      />
      <TextField
        id={fieldId(p, "frictionPair")}
        label="Surfaces the friction is for"
        name="frictionPair"
        maxLength={160}
        defaultValue={v.frictionPair ?? row?.frictionPair}
        errors={f?.frictionPair}
      />
      <SourceFields prefix={p} v={v} fields={f} row={row} />
      <div className="flex flex-col gap-2 sm:col-span-3">
        <FormMessage state={state} />
        <div>
          <Submit pending={pending} adding={!row} />
        </div>
      </div>
    </form>
  );
}

export function StockSheetForm({ row, materials }: { row?: StockSheetRow; materials: Material[] }) {
  const [state, action, pending] = useShopForm(saveStockSheetAction);
  const v = state.values ?? {};
  const f = state.fields;
  const p = row ? `sheet-${row.id}` : "sheet-new";
  return (
    <form action={action} className="grid gap-3 sm:grid-cols-3" noValidate>
      {row ? <input type="hidden" name="id" value={row.id} /> : null}
      <TextField
        id={fieldId(p, "name")}
        label="Name"
        name="name"
        maxLength={120}
        defaultValue={v.name ?? row?.name}
        errors={f?.name}
      />
      <SelectField
        id={fieldId(p, "materialId")}
        label="Material"
        name="materialId"
        defaultValue={v.materialId ?? String(row?.materialId ?? materials[0]?.id ?? "")}
        errors={f?.materialId}
        options={materials.map((m) => ({ value: String(m.id), label: m.name }))}
      />
      <SelectField
        id={fieldId(p, "grain")}
        label="Grain"
        name="grain"
        defaultValue={v.grain ?? row?.grain ?? "length"}
        errors={f?.grain}
        options={[
          { value: "length", label: "Along the length" },
          { value: "width", label: "Across the width" },
          { value: "none", label: "None" },
        ]}
      />
      <TextField
        id={fieldId(p, "lengthMm")}
        label="Length (mm)"
        name="lengthMm"
        inputMode="decimal"
        defaultValue={v.lengthMm ?? (row ? String(row.lengthMm) : "")}
        errors={f?.lengthMm}
      />
      <TextField
        id={fieldId(p, "widthMm")}
        label="Width (mm)"
        name="widthMm"
        inputMode="decimal"
        defaultValue={v.widthMm ?? (row ? String(row.widthMm) : "")}
        errors={f?.widthMm}
      />
      <SourceFields prefix={p} v={v} fields={f} row={row} />
      <div className="flex flex-col gap-2 sm:col-span-3">
        <FormMessage state={state} />
        <div>
          <Submit pending={pending} adding={!row} />
        </div>
      </div>
    </form>
  );
}

export function MachineForm({ row }: { row?: Machine }) {
  const [state, action, pending] = useShopForm(saveMachineAction);
  const v = state.values ?? {};
  const f = state.fields;
  const p = row ? `machine-${row.id}` : "machine-new";
  const num = (key: keyof Machine) => v[key] ?? (row ? String(row[key]) : "");
  return (
    <form action={action} className="grid gap-3 sm:grid-cols-3" noValidate>
      {row ? <input type="hidden" name="id" value={row.id} /> : null}
      <TextField
        id={fieldId(p, "name")}
        label="Name"
        name="name"
        maxLength={120}
        defaultValue={v.name ?? row?.name}
        errors={f?.name}
      />
      <SelectField
        id={fieldId(p, "kind")}
        label="Kind"
        name="kind"
        defaultValue={v.kind ?? row?.kind ?? "router"}
        errors={f?.kind}
        options={Object.entries(MACHINE_KIND_LABELS).map(([value, label]) => ({ value, label }))}
      />
      <TextField
        id={fieldId(p, "kerfMm")}
        label="Kerf or cutter diameter (mm)"
        name="kerfMm"
        inputMode="decimal"
        defaultValue={num("kerfMm")}
        errors={f?.kerfMm}
      />
      <TextField
        id={fieldId(p, "bedLengthMm")}
        label="Bed length (mm)"
        name="bedLengthMm"
        inputMode="decimal"
        defaultValue={num("bedLengthMm")}
        errors={f?.bedLengthMm}
      />
      <TextField
        id={fieldId(p, "bedWidthMm")}
        label="Bed width (mm)"
        name="bedWidthMm"
        inputMode="decimal"
        defaultValue={num("bedWidthMm")}
        errors={f?.bedWidthMm}
      />
      <TextField
        id={fieldId(p, "minInsideRadiusMm")}
        label="Smallest inside radius (mm)"
        name="minInsideRadiusMm"
        inputMode="decimal"
        defaultValue={num("minInsideRadiusMm")}
        errors={f?.minInsideRadiusMm}
      />
      <SourceFields prefix={p} v={v} fields={f} row={row} />
      <div className="flex flex-col gap-2 sm:col-span-3">
        <FormMessage state={state} />
        <div>
          <Submit pending={pending} adding={!row} />
        </div>
      </div>
    </form>
  );
}

export function RetireToggle({
  table,
  id,
  active,
  name,
}: {
  table: ShopTable;
  id: number;
  active: boolean;
  name: string;
}) {
  const [state, action, pending] = useActionState(setShopRowActiveAction, {});
  return (
    <form action={action} className="flex items-center gap-2">
      <input type="hidden" name="table" value={table} />
      <input type="hidden" name="id" value={id} />
      <input type="hidden" name="active" value={active ? "false" : "true"} />
      <Button
        type="submit"
        variant={active ? "caution" : "quiet"}
        disabled={pending}
        aria-label={`${active ? "Retire" : "Restore"} ${name}`}
      >
        {active ? "Retire" : "Restore"}
      </Button>
      {state.ok === false ? <span className="text-xs text-caution-ink">{state.message}</span> : null}
    </form>
  );
}
