// The helper's suggestions, each re-checked here by the module itself: the changed design must pass
// the check the suggestion is for (and a corner radius just under the suggested one must not).
import { describe, expect, it } from "vitest";
import { checkLoads, suggestFixes } from "@/lib/loads";
import { loadsInputSchema, type LoadsInputDraft } from "@/lib/validation/loads";

const plywood = { modulusGpa: 6.86, poisson: 0.3 }; // the shop library's birch plywood row (J. Korean Wood Sci. Technol. 53(4):429)

function input(over: Partial<LoadsInputDraft>) {
  return loadsInputSchema.parse({
    spec: { mode: "track-for-wheel", wheel: { kind: "polygon", sides: 4, side: 400 } },
    use: "ride-on",
    mu: 0.6, // rubber tread on dry plywood, the library's common-practice figure
    wheel: { ...plywood, treadWidthMm: 36 },
    track: { ...plywood, widthMm: 300, depthMm: 36, supportSpanMm: 300 },
    ...over,
  });
}

/** Applies a suggestion the way the studio's button does: the spec and the check inputs it carries. */
function applied(base: ReturnType<typeof input>, s: ReturnType<typeof suggestFixes>[number]) {
  return loadsInputSchema.parse({ ...base, ...(s.inputs ?? {}), spec: s.spec ?? base.spec });
}

describe("the helper", () => {
  it("a square on dry rubber and plywood (μ 0.6 < 1): a WARNING, cleared by the suggested number of sides", () => {
    const base = input({});
    const report = checkLoads(base);
    expect(report.cautions.find((c) => c.check === "grip")?.signal).toBe("WARNING");
    const s = suggestFixes(base, report).find((x) => x.check === "grip" && x.spec);
    expect(s).toBeDefined();
    const sides = (s!.spec!.wheel as { sides: number }).sides;
    // tan(π/n + atan 0.2) × 1.3 ≤ 0.6 first holds at n = 14 (worked by hand: π/14 = 12.9°, +11.3° → tan 24.2° = 0.449, × 1.3 = 0.584).
    expect(sides).toBe(14);
    const after = checkLoads(applied(base, s!));
    expect(after.grip.ok).toBe(true);
    expect(after.cautions.some((c) => c.check === "grip")).toBe(false);
    // One side fewer does not clear it: the suggestion is the smallest such change.
    const fewer = checkLoads(
      loadsInputSchema.parse({
        ...base,
        spec: { ...(base.spec as object), wheel: { kind: "polygon", sides: 13, side: 400 } },
      }),
    );
    expect(fewer.grip.ok).toBe(false);
  });

  it("another tread from the library", () => {
    const base = input({ treads: [{ name: "Soft rubber", mu: 2.2, modulusGpa: 0.005, poisson: 0.49 }] });
    const s = suggestFixes(base, checkLoads(base)).find((x) => x.check === "grip" && x.inputs?.mu !== undefined);
    expect(s?.change).toMatch(/Soft rubber/);
    expect(checkLoads(applied(base, s!)).grip.ok).toBe(true);
  });

  it("a corner radius for steel on steel: the smallest that clears the contact check", () => {
    const steel = { modulusGpa: 200, poisson: 0.3, allowableMpa: 250 };
    const base = input({
      use: "push-along",
      spec: { mode: "track-for-wheel", wheel: { kind: "polygon", sides: 6, inradius: 100 } },
      wheel: { ...steel, treadWidthMm: 10 },
      track: { ...steel, widthMm: 40, depthMm: 40, supportSpanMm: 300 },
    });
    const report = checkLoads(base);
    expect(report.contact.radiusMm).toBe(0);
    expect(report.cautions.find((c) => c.check === "contact")?.avoid).toMatch(
      /Needs a corner radius: round the wheel's corners to at least/,
    );
    const s = suggestFixes(base, report).find((x) => x.check === "contact" && x.spec);
    expect(s).toBeDefined();
    const rc = (s!.spec!.wheel as { cornerRadius: number }).cornerRadius;
    expect(rc).toBe(report.contact.cornerRadiusNeeded);
    expect(checkLoads(applied(base, s!)).contact.ok).toBe(true);
    const smaller = checkLoads(
      loadsInputSchema.parse({
        ...base,
        spec: { ...(s!.spec as object), wheel: { ...(s!.spec!.wheel as object), cornerRadius: rc - 0.5 } },
      }),
    );
    expect(smaller.contact.ok).toBe(false);
  });

  it("a shorter support span", () => {
    const base = input({ track: { ...plywood, widthMm: 300, depthMm: 18, supportSpanMm: 900 } });
    const report = checkLoads(base);
    expect(report.deflection.ok).toBe(false);
    const s = suggestFixes(base, report).find((x) => x.check === "deflection");
    expect(s!.inputs!.track!.supportSpanMm).toBeLessThan(900);
    expect(checkLoads(applied(base, s!)).deflection.ok).toBe(true);
  });

  it("a lower design speed when the wheel's own inertia tips the grip over", () => {
    const base = input({
      mu: 1.35,
      traction: 0,
      use: "push-along",
      speedMps: 3,
      wheel: { ...plywood, treadWidthMm: 36, densityKgM3: 680 },
    });
    expect(checkLoads(loadsInputSchema.parse({ ...base, speedMps: 0.1 })).grip.ok).toBe(true);
    const report = checkLoads(base);
    expect(report.grip.ok).toBe(false);
    const s = suggestFixes(base, report).find((x) => x.check === "grip" && x.inputs?.speedMps !== undefined);
    expect(s!.inputs!.speedMps).toBeLessThan(3);
    expect(checkLoads(applied(base, s!)).grip.ok).toBe(true);
  });

  it("a gap out of the finger band", () => {
    const base = input({ clearancesMm: { "wheel to fender": 12 } });
    const report = checkLoads(base);
    expect(report.cautions.find((c) => c.check === "gap")?.name).toBe("wheel to fender");
    const s = suggestFixes(base, report).find((x) => x.check === "gap");
    expect(s!.inputs!.clearancesMm!["wheel to fender"]).toBe(4);
    expect(checkLoads(applied(base, s!)).gaps[0].ok).toBe(true);
  });
});
