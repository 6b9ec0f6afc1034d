// The demo job in Chromium, from the project page to the downloaded ZIP: the "Square-wheel trike
// run" (6.0 m, 400 mm square wheels, 18 mm birch plywood on 2440 × 1220 mm sheets, 6 mm router).
import { execFileSync } from "node:child_process";
import { mkdtempSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { CutPlanPage } from "./pages/cut-plan-page";
import { baseUrl, launchBrowser, screenshotPath } from "./support/browser";
import { signedIn } from "./support/session";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

let cutPageUrl = "";

describe("the demo job's cut plan", () => {
  it("builds the parts, nests them with progress, saves the cut plan and downloads the ZIP", async () => {
    const { context, page } = await signedIn(browser, "fabricator@example.test");
    const cut = new CutPlanPage(page);
    await cut.openFromProject("Square-wheel trike run", "Trike run track");
    cutPageUrl = page.url();
    await cut.choose("Material", "Birch plywood 18 mm");
    await cut.choose("Stock sheet", "Birch plywood 18 mm, 2440 x 1220");
    await cut.choose("Machine", "CNC router, 6 mm cutter");
    await cut.fill("Run length on site (mm)", "6000");
    // 6000 mm over a 352.55 mm period (2·200·asinh 1 for a 400 mm square; Hall & Wagon 1992) is 17 whole periods.
    await cut.waitForRunSummary(/^17 periods of 352\.55 mm over 6000 mm/);

    // Bad input first: a run shorter than one period says so beside the field and keeps the value.
    await cut.fill("Run length on site (mm)", "300");
    await page.locator("#cut-runLength-error").waitFor();
    expect(await page.locator("#cut-runLength-error").innerText()).toMatch(/shorter than one period/);
    await cut.fill("Run length on site (mm)", "6000");
    await cut.waitForRunSummary(/^17 periods/);

    // No cut stations typed: the nest chooses the joints first (on by default).
    expect(await cut.cutStations()).toBe("");
    await cut.nest(6);
    await page.getByTestId("nest-progress").waitFor();
    await page.getByTestId("nest-result").waitFor({ timeout: 60_000 });
    expect(await cut.nestSummary().innerText()).toMatch(/^\d+ sheet\(s\), \d+\.\d % of the stock used overall/);
    expect(await page.getByTestId("unplaced").count()).toBe(0);
    expect(await page.getByTestId("sheet-view").count()).toBeGreaterThan(0);
    // The greedy cuts (6 + 6 + 5 periods) need two sheets; other whole-period lengths fit one
    // (tests/unit/cut-plan/segment-lengths.test.ts). The chosen stations go into the field.
    const joints = (await cut.jointChoice().innerText()).match(
      /^Joints at ([\d., ]+) mm: 1 sheet instead of 2 \(1 sheet saved\)\./,
    );
    expect(joints, await cut.jointChoice().innerText()).not.toBeNull();
    const stations = joints![1].split(", ");
    expect(await cut.cutStations()).toBe(stations.join(", "));
    expect(await page.getByTestId("sheet-view").count()).toBe(1);
    // Named by its number within the revision, never the database id.
    const saved = (await cut.save()).match(/^Saved as cut plan (\d+) of (R\d+)/);
    expect(saved).not.toBeNull();
    await page
      .getByTestId("stored-plan")
      .filter({ hasText: `Cut plan ${saved![1]} of ${saved![2]}, saved` })
      .waitFor();
    await page.screenshot({ path: screenshotPath("cut-plan-demo"), fullPage: true });

    const [download] = await Promise.all([page.waitForEvent("download"), page.getByTestId("download-zip").click()]);
    const file = path.join(mkdtempSync(path.join(tmpdir(), "axlewright-e2e-")), download.suggestedFilename());
    await download.saveAs(file);
    expect(download.suggestedFilename()).toMatch(/\.zip$/);
    // Listed by Info-ZIP's unzip, an independent reader of the format.
    const listing = execFileSync("unzip", ["-Z1", file], { encoding: "utf8" });
    for (const name of [/README\.txt/, /bom\.csv/, /sheet-1-mm\.dxf/, /sheet-1-preview\.png/])
      expect(listing).toMatch(name);
    // The saved plan, rebuilt by the server from its settings, is cut at the chosen stations.
    const readme = execFileSync("unzip", ["-p", file, "*README.txt"], { encoding: "utf8" });
    expect(readme).toContain(`Cuts at:     ${stations.map((x) => `${x} mm`).join(", ")} from the run's start`);
    await context.close();
  });

  it("can be cancelled, keeping the best layout found so far", async () => {
    const { context, page } = await signedIn(browser, "fabricator@example.test");
    await page.goto(cutPageUrl);
    const cut = new CutPlanPage(page);
    await cut.waitForRunSummary(/^17 periods/);
    // The plan saved above reopens with its chosen stations, whose parts fit one sheet and so end the
    // search at once. The usual cuts, without the choice, keep the nester searching for a cancel to stop.
    await cut.fill("Cut stations along the run (mm)", "");
    await cut.waitForRunSummary(/ in 3 segments /);
    await cut.chooseJoints(false);
    await cut.nest(60);
    await page.getByTestId("nest-progress").waitFor();
    await page.waitForTimeout(1500);
    await page.getByRole("button", { name: "Cancel" }).click();
    await page.getByTestId("nest-result").waitFor({ timeout: 20_000 });
    expect(await cut.nestSummary().innerText()).toMatch(/stopped early/);
    await context.close();
  });

  it("is not there for the project's client", async () => {
    const { context, page } = await signedIn(browser, "client@example.test");
    await page.goto(cutPageUrl || `${baseUrl}/projects`);
    await page.getByRole("heading", { name: "Not available to your role" }).waitFor();
    await context.close();
  });
});
