// The studio's load-path panel in Chromium: a square wheel with a rubber tread on dry plywood
// (μ 0.8, below the 1 a square needs at its corners even before any traction) shows a WARNING for
// grip, linked to the corner on the drawing; the helper's suggestion, applied with one click, goes
// into the draft and the re-check clears the warning.
import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { checkLoads } from "@/lib/loads";
import { loadsInputSchema } from "@/lib/validation/loads";
import { LoadsPanel } from "./pages/loads-panel";
import { StudioPage } from "./pages/studio-page";
import { launchBrowser, screenshotPath } from "./support/browser";
import { signedIn } from "./support/session";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

describe("load-path cautions in the studio", () => {
  it("warns about grip for a square on a dry pair with μ below 1, and the helper's fix clears it", async () => {
    const { context, page } = await signedIn(browser, "fabricator@example.test");
    try {
      const studio = new StudioPage(page);
      const loads = new LoadsPanel(page);
      await studio.create(1, "Square on rubber and plywood", /Square wheel/);
      await loads.setUse(/Ride-on/);
      await loads.chooseTread(/Rubber tread 3 mm/);
      await loads.waitForCautions({ has: "grip" });
      const before = await loads.cautions();
      const grip = before.find((c) => c.check === "grip")!;
      expect(grip.signal).toBe("WARNING");
      expect(grip.text).toMatch(/μ needed 1\.5 with traction H\/V = 0\.2/); // tan(45° + atan 0.2), docs/safety.md T7
      expect(grip.text).toContain("(0.8)");
      // The caution is linked to its place: "show" stops the roll at the corner and marks it.
      await page
        .getByTestId("loads-caution")
        .filter({ hasText: "more grip" })
        .getByRole("button", { name: /Show where/ })
        .click();
      await page.getByRole("button", { name: "Clear the mark" }).waitFor();
      await page.screenshot({ path: screenshotPath("loads-square-warning"), fullPage: true });

      const fix = loads.suggestion(/Use a wheel with \d+ sides instead of 4\./);
      const label = (await fix.getAttribute("aria-label"))!;
      const sides = Number(/with (\d+) sides/.exec(label)![1]);
      // The module itself agrees the suggested design passes (worked here, outside the browser).
      const settings = await page.evaluate(
        (id) => JSON.parse(localStorage.getItem(`axlewright:loads:${id}`) ?? "null"),
        studio.designId(),
      );
      const recheck = checkLoads(
        loadsInputSchema.parse({
          ...settings,
          spec: { mode: "track-for-wheel", units: "mm", wheel: { kind: "polygon", sides, side: 400, cornerRadius: 0 } },
        }),
      );
      expect(recheck.grip.ok).toBe(true);

      await fix.click();
      await loads.waitForCautions({ lacks: "grip" });
      expect((await studio.workingSpec())?.wheel).toMatchObject({ kind: "polygon", sides });
      expect(await page.getByTestId("unsaved-flag").isVisible()).toBe(true);
      await page.screenshot({ path: screenshotPath("loads-square-cleared"), fullPage: true });

      // Saved with the revision: the settings go to the server with it.
      await studio.saveRevision("More sides for grip");
      expect(await page.getByTestId("unsaved-flag").count()).toBe(0);
    } finally {
      await context.close();
    }
  }, 180_000);
});
