// A cut plan's settings are what the fabricator chose on the page plus the figures of the chosen
// shop-library rows (sheet size and grain, material thickness, the machine's kerf and bed). The
// browser (to nest) and the server (to check and store) compose them with this same function, so
// both build exactly the same parts.
import { z } from "zod";
import type { CutSettingsInput } from "@/lib/cut/settings";

export interface LibraryChoice {
  material: { id: number; name: string; thicknessMm: number };
  sheet: { id: number; name: string; lengthMm: number; widthMm: number; grain: "length" | "width" | "none" };
  machine: {
    id: number;
    name: string;
    kind: "router" | "laser" | "waterjet" | "plasma";
    kerfMm: number;
    bedLengthMm: number;
    bedWidthMm: number;
    minInsideRadiusMm: number;
  };
}

/** The body of a cut-plan request: the chosen library rows by id, and the rest of the settings. */
export const planChoiceSchema = z.strictObject({
  materialId: z.number({ error: "Choose a material." }).int().positive({ error: "Choose a material." }),
  stockSheetId: z.number({ error: "Choose a stock sheet." }).int().positive({ error: "Choose a stock sheet." }),
  machineId: z.number({ error: "Choose a machine." }).int().positive({ error: "Choose a machine." }),
  /** Everything else of the cut settings (lib/cut/settings.ts); the library figures are filled in here. */
  settings: z.record(z.string(), z.unknown(), { error: "The settings must be an object." }),
});
export type PlanChoice = z.infer<typeof planChoiceSchema>;

/** Settings the library decides; a request may not set them itself. */
const FROM_LIBRARY = ["machine", "sheet", "material", "project"] as const;

export function composeSettings(
  choice: Pick<PlanChoice, "settings">,
  library: LibraryChoice,
  project: string,
): CutSettingsInput {
  const own = Object.fromEntries(
    Object.entries(choice.settings).filter(([k]) => !(FROM_LIBRARY as readonly string[]).includes(k)),
  );
  const { sheet, machine, material } = library;
  // The nester lays the sheet's length along x and keeps grain-bound parts along x; a sheet whose
  // grain runs across its width is the same sheet turned a quarter, so it is described that way.
  const across = sheet.grain === "width";
  return {
    ...own,
    project: project.slice(0, 60),
    material: material.name.slice(0, 80),
    sheet: {
      length: across ? sheet.widthMm : sheet.lengthMm,
      width: across ? sheet.lengthMm : sheet.widthMm,
      thickness: material.thicknessMm,
      grain: sheet.grain === "none" ? "none" : "length",
    },
    machine: {
      kind: machine.kind,
      kerf: machine.kerfMm,
      bed: { length: machine.bedLengthMm, width: machine.bedWidthMm },
      minInsideRadius: machine.minInsideRadiusMm,
    },
  } as CutSettingsInput;
}
