// The studio in Chromium: every mode from a preset, a changed parameter with the readouts checked
// against the engine run here in the test, the roll played with the axle trace level on screen,
// revisions saved, reloaded and reopened; two revisions compared; the axle of an uploaded outline
// dragged and nudged on the canvas; uploads; and who may edit.
import path from "node:path";
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { PRESETS } from "@/lib/studio/presets";
import { isEngineError, MODE_NAMES, solve, type DesignSpecInput, type SolveResult } from "@/lib/track";
import { ComparePage } from "./pages/compare-page";
import { StudioPage } from "./pages/studio-page";
import { baseUrl, launchBrowser, screenshotPath } from "./support/browser";
import { engineFigure, showsValue, shownNumbers } from "./support/engine-figures";
import { signedIn } from "./support/session";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

const fixtures = path.resolve("tests/fixtures/outlines");
let squareDesignUrl = "";

const presetSpec = (id: string): DesignSpecInput => structuredClone(PRESETS.find((p) => p.id === id)!.spec);

/**
 * Every readout in `labels` comes to show the engine's value for this result (to the four digits
 * shown); waits while a newer solve is still on its way, and fails with the differences if not.
 */
async function expectEngineReadouts(studio: StudioPage, result: SolveResult, labels: string[], timeoutMs = 10_000) {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const wrong: string[] = [];
    for (const label of labels) {
      const shown = shownNumbers(await studio.readout(label));
      const engine = engineFigure(result, label);
      if (shown.length !== engine.length || shown.some((v, i) => !showsValue(v, engine[i])))
        wrong.push(`${label}: shows ${shown.join(", ")}, the engine says ${engine.join(", ")}`);
    }
    if (!wrong.length) return;
    if (Date.now() > deadline) expect(wrong, "readouts that differ from the engine").toEqual([]);
    await new Promise((r) => setTimeout(r, 100));
  }
}

/** The message of the EngineError the engine throws for this spec. */
function engineRefusal(spec: DesignSpecInput): string {
  try {
    solve(spec);
  } catch (e) {
    if (isEngineError(e)) return e.message;
    throw e;
  }
  throw new Error("the engine took a spec the studio refused");
}

/** Plays the roll for a while and checks the axle trace(s) stay level on screen, on their axle lines. */
async function expectLevelRoll(page: Page, studio: StudioPage, traces: Array<"axle" | "lower">) {
  await studio.play();
  await page.waitForTimeout(1500);
  await studio.pause();
  const probe = (await studio.probe())!;
  expect(probe.position, "the roll moved on").toBeGreaterThan(0.05);
  for (const which of traces) {
    const trace = which === "axle" ? probe.axleTrace : probe.lowerAxleTrace!;
    const line = which === "axle" ? probe.axleLine : probe.lowerAxleLine!;
    expect(trace.length, `${which} trace: points drawn`).toBeGreaterThan(10);
    const spread = Math.max(...trace) - Math.min(...trace);
    expect(spread, `the ${which} trace stays level on screen (px)`).toBeLessThan(0.5);
    expect(Math.abs(trace[0] - line), `the ${which} trace runs on its axle line (px)`).toBeLessThan(0.5);
  }
}

// One row per mode: the preset, the field changed and to what, the spec that makes, the readouts to
// compare with the engine, and which axle traces the probe reports.
const MODES: Array<{
  mode: string;
  preset: RegExp;
  presetId: string;
  field: string;
  value: string;
  changed: (s: DesignSpecInput) => DesignSpecInput;
  readouts: string[];
  traces: Array<"axle" | "lower">;
  /** A closed form from outside the engine for the changed design: [readout, value shown]. */
  known: [string, string];
}> = [
  {
    mode: "track-for-wheel",
    preset: /Square wheel/,
    presetId: "square",
    field: "Side (mm)",
    value: "300",
    changed: (s) => ({ ...s, wheel: { kind: "polygon", sides: 4, side: 300, cornerRadius: 0 } }),
    readouts: ["period", "depth", "wheel r"],
    traces: ["axle"],
    // Hall & Wagon 1992: a square of inradius A rolls on y = −A cosh(x/A) with period 2A·asinh(tan(π/4)) and
    // depth A(sec(π/4) − 1); side 300 mm → A = 150 mm → 264.41 mm and 62.13 mm.
    known: ["period", "264.4 mm"],
  },
  {
    mode: "wheel-for-track",
    preset: /Wheel for a sine track/,
    presetId: "sine-track",
    field: "Amplitude (mm)",
    value: "12",
    changed: (s) => ({ ...s, track: { kind: "sine", amplitude: 12, period: 100 } }),
    readouts: ["period", "depth", "axle height", "wheel r"],
    traces: ["axle"],
    // Sine track y = A sin(2πx/P): h = √((kP/2π)² + A²) (standard integral tables); A = 12, P = 100, k = 4 → 64.78 mm.
    known: ["axle height", "64.78 mm"],
  },
  {
    mode: "partner-wheel",
    preset: /Partner of an ellipse/,
    presetId: "ellipse-pair",
    field: "Semi-major axis (mm)",
    value: "110",
    changed: (s) => ({ ...s, wheel: { kind: "ellipse", semiMajor: 110, semiMinor: 80, axle: "focus" } }),
    readouts: ["centre distance", "driver r", "partner r"],
    traces: ["lower"],
    // Two equal ellipses about their foci mesh at a centre distance of the major axis, 2a = 220 mm
    // (Schwamb & Merrill 1904; Litvin et al. 2009).
    known: ["centre distance", "220 mm"],
  },
  {
    mode: "twin-wheels",
    preset: /Twin wheels/,
    presetId: "window-twins",
    field: "Amplitude (mm)",
    value: "25",
    changed: (s) => ({ ...s, track: { kind: "sine", amplitude: 25, period: 300 } }),
    readouts: ["axle height", "lower axle", "centre distance", "upper wheel r", "lower wheel r"],
    traces: ["axle", "lower"],
    // The sine track is point-symmetric, so the lower axle mirrors the upper: h = √((kP/2π)² + A²) with
    // A = 25, P = 300, k = 2 → 98.71 mm, and the centre distance is 2h = 197.4 mm.
    known: ["centre distance", "197.4 mm"],
  },
];

describe("the studio, as the fabricator", () => {
  it.each(MODES)("$mode: a preset, a changed parameter, a level roll, a saved revision reopened", async (m) => {
    const { context, page } = await signedIn(browser, "fabricator@example.test");
    const studio = new StudioPage(page);
    await studio.create(1, `Studio check: ${MODE_NAMES[m.mode as keyof typeof MODE_NAMES]}`, m.preset);
    if (m.mode === "track-for-wheel") squareDesignUrl = page.url();

    // The preset's readouts are the engine's.
    const before = solve(presetSpec(m.presetId));
    await expectEngineReadouts(studio, before, m.readouts);

    // Change one parameter: the readouts follow, to the engine's values for the changed spec.
    const text = await studio.readoutText();
    await page.getByLabel(m.field, { exact: true }).fill(m.value);
    await studio.waitForReadoutChange(text);
    const after = solve(m.changed(presetSpec(m.presetId)));
    await expectEngineReadouts(studio, after, m.readouts);
    expect(engineFigure(after, m.known[0]), "the change moves the figures").not.toEqual(
      engineFigure(before, m.known[0]),
    );
    expect(await studio.readout(m.known[0])).toBe(m.known[1]);
    await page.getByTestId("unsaved-flag").waitFor();

    // The rolling check arrives after the drawing, and it is the engine's check of the changed design.
    await studio.waitForCheck();
    const friction = Number(await page.locator("[data-check=friction] dd").first().innerText());
    expect(
      showsValue(friction, after.check.frictionDemand.max, 3),
      `friction demand ${friction} vs ${after.check.frictionDemand.max}`,
    ).toBe(true);

    await expectLevelRoll(page, studio, m.traces);
    await page.screenshot({ path: screenshotPath(`studio-${m.mode}`), fullPage: true });

    // Save, reload, reopen the revision read-only: it holds the changed parameter.
    await studio.saveRevision(`${m.field} ${m.value}`);
    await page.reload();
    await studio.waitForResult();
    expect(await page.getByTestId("unsaved-flag").count(), "nothing unsaved after saving").toBe(0);
    await studio.openRevision(1);
    const field = page.getByLabel(m.field, { exact: true });
    expect(await field.inputValue()).toBe(m.value);
    expect(await field.isDisabled()).toBe(true);
    await expectEngineReadouts(studio, after, m.readouts);
    await context.close();
  });

  it("compares two revisions: figures side by side and the outlines overlaid", async () => {
    const { context, page } = await signedIn(browser, "fabricator@example.test");
    const studio = new StudioPage(page);
    await studio.create(1, "Square, two sizes", /Square wheel/);
    await studio.saveRevision("400 mm side");
    const text = await studio.readoutText();
    await page.getByLabel("Side (mm)").fill("300");
    await studio.waitForReadoutChange(text);
    await studio.saveRevision("300 mm side");
    await page.getByLabel("Compare revision 1").check();
    await page.getByLabel("Compare revision 2").check();
    await page.getByRole("button", { name: "Compare R1 and R2" }).click();
    await page.waitForURL(/\/compare\?a=1&b=2$/);
    const compare = new ComparePage(page);
    await compare.waitUntilShown();

    // The page shows three decimals; each figure is the engine's for its revision.
    const r1 = solve(presetSpec("square"));
    const r2 = solve({ ...presetSpec("square"), wheel: { kind: "polygon", sides: 4, side: 300, cornerRadius: 0 } });
    const rows: Array<[string, (r: SolveResult) => number]> = [
      ["Period (one hump to the next)", (r) => r.period!],
      ["Track depth", (r) => r.depth!],
      ["Wheel radius, largest", (r) => r.wheel.rMax],
      // The studio's check figure, shown to 3 significant digits: the square's grip needed is 1 (slope 45°).
      ["Grip needed (μ)", (r) => r.check.frictionDemand.max],
    ];
    for (const [label, get] of rows) {
      const cells = (await compare.figure(label)).map((c) => Number(c.replace(/ mm$/, "")));
      expect(Math.abs(cells[0] - get(r1)), `${label}, R1`).toBeLessThanOrEqual(0.0005);
      expect(Math.abs(cells[1] - get(r2)), `${label}, R2`).toBeLessThanOrEqual(0.0005);
    }
    // Hall & Wagon 1992: period 2A·asinh(1) for inradius A = 200 and 150 mm.
    expect((await compare.figure("Period (one hump to the next)"))[0]).toBe("352.549 mm");
    expect((await compare.figure("Period (one hump to the next)"))[1]).toBe("264.412 mm");
    expect(await compare.figure("Note")).toEqual(["400 mm side", "300 mm side"]);

    const overlay = compare.overlay();
    await overlay.waitFor();
    expect(await overlay.isVisible()).toBe(true);
    const box = (await overlay.boundingBox())!;
    expect(box.width).toBeGreaterThan(100);
    expect(box.height).toBeGreaterThan(100);
    const paths = await overlay
      .locator("path")
      .evaluateAll((els) =>
        els.map((el) => ({ d: el.getAttribute("d") ?? "", dashed: el.hasAttribute("stroke-dasharray") })),
      );
    expect(paths).toHaveLength(2);
    expect(paths[0].d).not.toBe(paths[1].d);
    expect(paths.map((p) => p.dashed)).toEqual([false, true]);
    await page.screenshot({ path: screenshotPath("studio-compare"), fullPage: true });
    await context.close();
  });

  it("places an uploaded outline's axle by dragging it and with the arrow keys, refusing what the engine refuses", async () => {
    const { context, page } = await signedIn(browser, "fabricator@example.test");
    const studio = new StudioPage(page);
    await studio.create(1, "Notched outline", /Square wheel/);
    await page.getByTestId("wheel-kind").selectOption("outline");
    const text = await studio.readoutText();
    await page.getByTestId("upload-wheel").setInputFiles(path.join(fixtures, "notched-square.csv"));
    await page
      .getByTestId("upload-message")
      .filter({ hasText: /^Read \d+ points from notched-square\.csv/ })
      .waitFor();
    await studio.waitForReadoutChange(text);
    const axleX = page.getByLabel("Axle x (mm)", { exact: true });
    const axleY = page.getByLabel("Axle y (mm)", { exact: true });
    const spec0 = (await studio.workingSpec())!;
    if (spec0.wheel?.kind !== "outline") throw new Error("the working spec has no outline wheel");
    const a0 = spec0.wheel.axle;
    // The 200 mm square less a 1200 mm² notch centred at (20, 100): area centroid (102.47, 100).
    expect(a0.x).toBeCloseTo((200 * 200 * 100 - 1200 * 20) / (200 * 200 - 1200), 6);
    expect(a0.y).toBeCloseTo(100, 6);

    // Drag the axle 30 mm to the right.
    const { pixelsPerUnit: s } = (await studio.probe())!;
    const [hx, hy] = await studio.axleHandleCentre();
    await page.mouse.move(hx, hy);
    await page.mouse.down();
    await page.mouse.move(hx + 30 * s, hy, { steps: 6 });
    await page.mouse.up();
    const spec1 = (await studio.workingSpec())!;
    if (spec1.wheel?.kind !== "outline") throw new Error("the working spec has no outline wheel");
    const a1 = spec1.wheel.axle;
    // The pointer lands on whole pixels and the drag places to a pixel: two pixels of slack.
    expect(Math.abs(a1.x - (a0.x + 30)), "moved 30 mm right (mm)").toBeLessThan(2 / s);
    expect(Math.abs(a1.y - a0.y), "not moved up or down (mm)").toBeLessThan(2 / s);
    expect(Number(await axleX.inputValue())).toBe(a1.x);
    expect(Number(await axleY.inputValue())).toBe(a1.y);
    await expectEngineReadouts(studio, solve(spec1), ["period", "depth", "wheel r"]);
    await page.screenshot({ path: screenshotPath("studio-axle-dragged"), fullPage: true });

    // The arrow keys nudge it by 1 mm, Shift by 10 mm.
    const tidy = (v: number) => Number(v.toPrecision(12));
    await studio.axleHandle().focus();
    await page.keyboard.press("ArrowRight");
    await expect.poll(async () => Number(await axleX.inputValue())).toBe(tidy(a1.x + 1));
    await page.keyboard.press("Shift+ArrowDown");
    await page.keyboard.press("Shift+ArrowDown");
    await expect.poll(async () => Number(await axleY.inputValue())).toBe(tidy(a1.y - 20));
    const spec2 = (await studio.workingSpec())!;
    await expectEngineReadouts(studio, solve(spec2), ["period", "depth", "wheel r"]);
    // The notch's edges bound where the outline is star-shaped (3y ≥ 360 − x from the edge through
    // (0, 120) and (60, 100)), so 30 mm below the middle is refused.
    expect(await page.getByTestId("axle-refusal").count(), "nothing refused yet").toBe(0);
    await page.keyboard.press("Shift+ArrowDown");
    await studio.axleRefusal().waitFor();
    const refusal = await studio.axleRefusal().innerText();
    // Word for word what the engine says of that axle, asked here in the test.
    const refused = {
      ...spec2,
      wheel: { ...spec2.wheel!, axle: { x: tidy(a1.x + 1), y: tidy(a1.y - 30) } },
    } as DesignSpecInput;
    expect(refusal).toBe(engineRefusal(refused));
    expect(refusal).toMatch(/^The outline is not star-shaped about the axle/);
    expect(Number(await axleY.inputValue()), "a refused position is not taken").toBe(tidy(a1.y - 20));
    await page.screenshot({ path: screenshotPath("studio-axle-refused"), fullPage: true });

    // Typed into the form, the same position gets the same words.
    await axleY.fill(String(tidy(a1.y - 30)));
    const formAlert = page.locator("fieldset p[role=alert]", { hasText: "not star-shaped" }).first();
    await formAlert.waitFor();
    expect(await formAlert.innerText()).toBe(refusal);
    // Back to a good place; then a drag into the refused region in one move is refused too.
    await axleY.fill(String(tidy(a1.y - 20)));
    await axleY.blur();
    // Wait until the canvas shows that design again (a slow machine may still be drawing the last
    // one), and drag by this view's own scale.
    await expectEngineReadouts(studio, solve((await studio.workingSpec())!), ["period", "depth", "wheel r"]);
    await studio.axleHandle().waitFor();
    const { pixelsPerUnit: s2 } = (await studio.probe())!;
    const [gx, gy] = await studio.axleHandleCentre();
    await page.mouse.move(gx, gy);
    await page.mouse.down();
    await page.mouse.move(gx, gy + 40 * s2);
    await page.mouse.up();
    await studio.axleRefusal().waitFor();
    expect(await studio.axleRefusal().innerText()).toMatch(/not star-shaped about the axle/);
    expect(Number(await axleY.inputValue())).toBe(tidy(a1.y - 20));
    await context.close();
  });

  it("takes a valid outline upload and refuses a hostile one with the reason", async () => {
    const { context, page } = await signedIn(browser, "fabricator@example.test");
    await page.goto(squareDesignUrl);
    const studio = new StudioPage(page);
    await studio.waitForResult();
    await page.getByTestId("wheel-kind").selectOption("outline");
    await page.getByTestId("upload-wheel").setInputFiles(path.join(fixtures, "circle-two-arcs.svg"));
    await page.getByTestId("upload-message").waitFor();
    expect(await page.getByTestId("upload-message").innerText()).toMatch(/^Read \d+ points from circle-two-arcs\.svg/);
    // Each refusal replaces the message before it, so wait for the new words rather than read at once.
    const message = page.getByTestId("upload-message");
    await page.getByTestId("upload-wheel").setInputFiles(path.join(fixtures, "zipped.svg"));
    await message.filter({ hasText: /compressed/i }).waitFor();
    await page.getByTestId("upload-wheel").setInputFiles(path.join(fixtures, "entity-bomb.svg"));
    await message.filter({ hasText: /DOCTYPE|ENTITY|entit/i }).waitFor();
    expect(await message.getAttribute("role"), "a refusal is announced as an alert").toBe("alert");
    await page.screenshot({ path: screenshotPath("studio-upload-refused"), fullPage: true });
    await context.close();
  });
});

describe("the studio, as others", () => {
  it("lets a client member view the revisions but not edit", async () => {
    const { context, page } = await signedIn(browser, "client@example.test");
    await page.goto(squareDesignUrl);
    const studio = new StudioPage(page);
    await studio.waitForResult();
    expect(await page.getByRole("button", { name: "Save revision" }).count()).toBe(0);
    expect(await page.getByLabel("Side (mm)").isDisabled()).toBe(true);
    await page.getByTestId("revision-1").waitFor();
    await page.screenshot({ path: screenshotPath("studio-client-view"), fullPage: true });
    await context.close();
  });

  it("gives a non-member nothing", async () => {
    const { context, page } = await signedIn(browser, "gallery@example.test");
    const response = await page.goto(squareDesignUrl);
    expect(response?.status()).toBe(404);
    const api = await page.request.get(`${baseUrl}/api/designs/${squareDesignUrl.split("/").pop()}`);
    expect(api.status()).toBe(404);
    await context.close();
  });
});
