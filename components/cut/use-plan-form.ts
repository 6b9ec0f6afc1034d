"use client";
// The cut plan's settings as typed, and the settings they compose with the chosen library rows.
import { useCallback, useMemo, useState } from "react";
import { composeSettings, type LibraryChoice } from "@/lib/cut-plan/compose";
import { formToChoice, type PlanForm } from "@/lib/cut-plan/form";

export interface PlannerLibrary {
  materials: LibraryChoice["material"][];
  sheets: (LibraryChoice["sheet"] & { materialId: number })[];
  machines: LibraryChoice["machine"][];
}

export function usePlanForm(initialForm: PlanForm, library: PlannerLibrary, projectName: string) {
  const [form, setForm] = useState<PlanForm>(initialForm);
  const set = <K extends keyof PlanForm>(key: K, value: PlanForm[K]) =>
    setForm((f) => {
      const next = { ...f, [key]: value };
      // A sheet of another material makes no sense: follow the material with its largest sheet.
      if (
        key === "materialId" &&
        !library.sheets.some((s) => String(s.id) === f.stockSheetId && String(s.materialId) === value)
      ) {
        const sheet = library.sheets
          .filter((s) => String(s.materialId) === value)
          .sort((a, b) => b.lengthMm * b.widthMm - a.lengthMm * a.widthMm)[0];
        if (sheet) next.stockSheetId = String(sheet.id);
      }
      return next;
    });

  /** The settings a form composes with the chosen library rows (null while a row is missing). */
  const settingsOf = useCallback(
    (f: PlanForm) => {
      const c = formToChoice(f);
      const material = library.materials.find((m) => m.id === c.materialId);
      const sheet = library.sheets.find((s) => s.id === c.stockSheetId);
      const machine = library.machines.find((m) => m.id === c.machineId);
      return material && sheet && machine ? composeSettings(c, { material, sheet, machine }, projectName) : null;
    },
    [library, projectName],
  );
  const choice = useMemo(() => formToChoice(form), [form]);
  const settings = useMemo(() => settingsOf(form), [form, settingsOf]);

  return { form, set, choice, settings, settingsOf };
}
