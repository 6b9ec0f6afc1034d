// A design's load settings: defaults from the shop library, the library's treads for the helper, and
// the figures a stored cut plan fixes (the board's width and depth, the longest span between its
// supports), so the studio, the review, the cut-plan page, the README and the assembly sheet all
// check the same thing.
import starting from "@/db/shop-library.json";
import { loadsSettingsSchema, type LoadsInput, type LoadsSettings, type TreadOption } from "@/lib/validation/loads";

export interface LibraryMaterial {
  name: string;
  kind: "sheet" | "tread";
  thicknessMm: number;
  densityKgM3: number;
  modulusGpa: number;
  poisson: number;
  allowableMpa: number | null;
  frictionStatic: number;
  active?: boolean;
}

/** What a stored cut plan fixes about the track. */
export interface CutFacts {
  /** Board width across the run: sheet thickness × layers, mm. */
  widthMm: number;
  /** The solid band under the profile's lowest point, mm (the section is shallowest there). */
  depthMm: number;
  /** The longest span between supports, mm. */
  supportSpanMm: number;
}

/** The shop library's starting rows (db/shop-library.json): used when no library is at hand (the CLI export). */
export const STARTING_LIBRARY = starting.materials as LibraryMaterial[];

/** Starting depth of the track board and span between supports: the cut settings' defaults (lib/cut/settings.ts). */
const DEFAULT_DEPTH_MM = 80;
const DEFAULT_SPAN_MM = 600;

export function treadsOf(library: LibraryMaterial[]): TreadOption[] {
  return library
    .filter((m) => m.kind === "tread" && m.active !== false)
    .map((m) => ({
      name: m.name,
      mu: m.frictionStatic,
      modulusGpa: m.modulusGpa,
      poisson: m.poisson,
      ...(m.allowableMpa !== null ? { allowableMpa: m.allowableMpa } : {}),
    }));
}

const opt = (v: number | null) => (v === null ? {} : { allowableMpa: v });

/** Defaults: pushed by hand, the library's first sheet for wheel and track, its friction figure. */
export function defaultLoadsSettings(library: LibraryMaterial[] = STARTING_LIBRARY): LoadsSettings {
  const sheet = library.find((m) => m.kind === "sheet" && m.active !== false) ?? STARTING_LIBRARY[0];
  return {
    use: "push-along",
    load: {},
    mu: sheet.frictionStatic,
    wheel: {
      material: sheet.name,
      modulusGpa: sheet.modulusGpa,
      poisson: sheet.poisson,
      treadWidthMm: sheet.thicknessMm,
      densityKgM3: sheet.densityKgM3,
      ...opt(sheet.allowableMpa),
    },
    track: {
      material: sheet.name,
      modulusGpa: sheet.modulusGpa,
      poisson: sheet.poisson,
      widthMm: sheet.thicknessMm,
      depthMm: DEFAULT_DEPTH_MM,
      supportSpanMm: DEFAULT_SPAN_MM,
      densityKgM3: sheet.densityKgM3,
      ...opt(sheet.allowableMpa),
    },
  };
}

/** Stored settings if they are valid, else the defaults (an old or hand-edited row never breaks a page). */
export function settingsOrDefault(
  raw: unknown,
  library: LibraryMaterial[] = STARTING_LIBRARY,
): { settings: LoadsSettings; stored: boolean } {
  const parsed = raw == null ? null : loadsSettingsSchema.safeParse(raw);
  return parsed?.success
    ? { settings: parsed.data, stored: true }
    : { settings: defaultLoadsSettings(library), stored: false };
}

/** The check's whole input for a spec: settings, the library's treads, and what a cut plan fixes. */
export function loadsInputFor(
  spec: unknown,
  settings: LoadsSettings,
  library: LibraryMaterial[] = STARTING_LIBRARY,
  cut?: CutFacts,
): LoadsInput {
  const track = cut
    ? { ...settings.track, widthMm: cut.widthMm, depthMm: cut.depthMm, supportSpanMm: cut.supportSpanMm }
    : settings.track;
  return { ...settings, track, spec: spec as LoadsInput["spec"], treads: treadsOf(library) };
}
