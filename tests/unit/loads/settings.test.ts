// A design's load settings: the library's defaults pass the schema, a bad stored row falls back to
// them (a page never breaks on an old row), and what a cut plan fixes overrides the board.
import { describe, expect, it } from "vitest";
import { checkLoads } from "@/lib/loads";
import {
  defaultLoadsSettings,
  loadsInputFor,
  settingsOrDefault,
  STARTING_LIBRARY,
  treadsOf,
} from "@/lib/loads/settings";
import { loadsSettingsSchema } from "@/lib/validation/loads";

const SQUARE = { mode: "track-for-wheel", wheel: { kind: "polygon", sides: 4, side: 400 } };

describe("load settings", () => {
  it("the defaults come from the library's first sheet and pass the schema", () => {
    const d = defaultLoadsSettings();
    expect(loadsSettingsSchema.parse(d)).toEqual(d);
    const sheet = STARTING_LIBRARY.find((m) => m.kind === "sheet")!;
    expect(d).toMatchObject({
      use: "push-along",
      mu: sheet.frictionStatic,
      wheel: { modulusGpa: sheet.modulusGpa, poisson: sheet.poisson },
      track: { widthMm: sheet.thicknessMm },
    });
  });

  it("a stored row that no longer passes falls back to the defaults, and says so", () => {
    expect(settingsOrDefault({ use: "hovering" }).stored).toBe(false);
    expect(settingsOrDefault(null).settings).toEqual(defaultLoadsSettings());
    expect(settingsOrDefault(defaultLoadsSettings()).stored).toBe(true);
  });

  it("the library's treads feed the helper; a cut plan's board and span replace the typed ones", () => {
    expect(treadsOf(STARTING_LIBRARY).map((t) => t.name)).toContain("Rubber tread 3 mm, 60 Shore A");
    const input = loadsInputFor(SQUARE, defaultLoadsSettings(), STARTING_LIBRARY, {
      widthMm: 36,
      depthMm: 80,
      supportSpanMm: 450,
    });
    expect(input.track).toMatchObject({ widthMm: 36, depthMm: 80, supportSpanMm: 450 });
    expect(checkLoads(input).deflection.spanMm).toBe(450);
  });
});
