// The studio in Chromium: every mode from a preset, a changed parameter, the roll played with the
// axle trace level on screen, revisions saved and reopened, uploads, and who may edit.
import path from "node:path";
import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { StudioPage } from "./pages/studio-page";
import { baseUrl, launchBrowser, screenshotPath } from "./support/browser";
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

describe("the studio, as the fabricator", () => {
  it("solves a square wheel, follows a changed side, rolls level, and saves revisions", async () => {
    const { context, page } = await signedIn(browser, "fabricator@example.test");
    const studio = new StudioPage(page);
    await studio.create(1, "Trike track", /Square wheel/);
    squareDesignUrl = page.url();
    // Hall & Wagon 1992: a square of inradius A rolls on y = −A cosh(x/A) with period 2A·asinh(tan(π/4)).
    // Side 400 mm → A = 200 mm → period 352.549 mm, shown to 4 figures.
    await page.waitForFunction(() => document.body.innerText.includes("352.5 mm"));
    expect(await studio.readout("period")).toBe("352.5 mm");

    await page.getByLabel("Side (mm)").fill("300");
    // A = 150 mm → period 264.41 mm; depth A(sec(π/4) − 1) = 62.13 mm (Hall & Wagon 1992).
    await page.waitForFunction(() => document.body.innerText.includes("264.4 mm"));
    expect(await studio.readout("depth")).toBe("62.13 mm");
    await page.getByTestId("unsaved-flag").waitFor();

    await studio.play();
    await page.waitForTimeout(1500);
    await studio.pause();
    const probe = await studio.probe();
    expect(probe!.axleTrace.length).toBeGreaterThan(10);
    const spread = Math.max(...probe!.axleTrace) - Math.min(...probe!.axleTrace);
    expect(spread, "the axle trace stays level on screen (px)").toBeLessThan(0.5);
    await page.screenshot({ path: screenshotPath("studio-track-for-wheel"), fullPage: true });

    await studio.saveRevision("300 mm side for the trike");
    await page.reload();
    await studio.waitForResult();
    expect(await page.getByTestId("unsaved-flag").count(), "nothing unsaved after saving").toBe(0);
    await page.getByRole("link", { name: "R1" }).click();
    await page.getByTestId("read-only-badge").waitFor();
    await page.waitForFunction(() => document.body.innerText.includes("264.4 mm"));
    expect(await page.getByLabel("Side (mm)").isDisabled()).toBe(true);
    await context.close();
  });

  it.each([
    ["wheel-for-track", /Wheel for a sine track/, "axle height"],
    ["partner-wheel", /Partner of an ellipse/, "centre distance"],
    ["twin-wheels", /Twin wheels/, "axle height"],
  ])("opens the %s preset and shows the engine's figures", async (mode, preset, label) => {
    const { context, page } = await signedIn(browser, "fabricator@example.test");
    const studio = new StudioPage(page);
    await studio.create(1, `Preset ${mode}`, preset);
    expect(await studio.readout(label)).toMatch(/^\d+(\.\d+)? mm$/);
    if (mode === "partner-wheel") {
      // Two equal ellipses about their foci mesh at a centre distance of the major axis, 2a = 200 mm (Schwamb & Merrill 1904; Litvin et al. 2009).
      expect(await studio.readout("centre distance")).toBe("200 mm");
    }
    if (mode === "wheel-for-track") {
      // Sine track y = A sin(2πx/P): h = √((kP/2π)² + A²) (standard integral tables); A = 10, P = 100, k = 4 → 64.44 mm.
      expect(await studio.readout("axle height")).toBe("64.44 mm");
    }
    await studio.play();
    await page.waitForTimeout(800);
    await studio.pause();
    await page.screenshot({ path: screenshotPath(`studio-${mode}`), fullPage: true });
    await studio.saveRevision(`first ${mode}`);
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
