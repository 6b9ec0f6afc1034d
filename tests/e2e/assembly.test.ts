// The installer on site: opens the approved trike run's assembly sheet, prints it (the print view
// as a PDF, on A4 and on US Letter), ticks two parts as installed, and finds them in the build log.
import { execFileSync } from "node:child_process";
import { writeFileSync } from "node:fs";
import path from "node:path";
import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { AssemblyPage } from "./pages/assembly-page";
import { launchBrowser, outputDir, screenshotPath } from "./support/browser";
import { signedIn } from "./support/session";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

describe("the installer's assembly sheet", () => {
  it("prints on A4 and Letter, ticks two parts, and the build log shows them", async () => {
    const { context, page } = await signedIn(browser, "installer@example.test");
    const sheet = new AssemblyPage(page);
    await sheet.openFromProject("Square-wheel trike run");
    expect(await page.getByTestId("sheet-approval").innerText()).toMatch(
      /^[0-9a-f]{12}\/\d{4}-\d{2}-\d{2} by Ada Penrose/,
    );
    await page.screenshot({ path: screenshotPath("assembly-sheet"), fullPage: true });

    for (const [name, size] of [
      ["A4", /59[45]\.\d* x 841\.\d* pts \(A4\)/],
      ["US Letter", /612 x 792 pts \(letter\)/],
    ] as const) {
      await sheet.choosePaper(name);
      await page.emulateMedia({ media: "print" });
      // preferCSSPageSize: the page's own @page size, as the browser's print dialog would use it.
      const pdf = await page.pdf({ preferCSSPageSize: true, printBackground: true });
      await page.emulateMedia({ media: "screen" });
      const file = path.join(outputDir, `assembly-sheet-print-${name === "A4" ? "a4" : "letter"}.pdf`);
      writeFileSync(file, pdf);
      // Read back by Debian's poppler-utils (Chromium writes A4 as 594.96 × 841.92 pt, its whole-pixel rounding of ISO 216's 210 × 297 mm).
      expect(execFileSync("/usr/bin/pdfinfo", [file], { encoding: "utf8" })).toMatch(size);
      const text = execFileSync("/usr/bin/pdftotext", ["-layout", file, "-"], { encoding: "utf8" });
      for (const words of ["Layout plan", "Level and position", "Installer's sign-off", "T01", "±"])
        expect(text).toContain(words);
      // Screen-only controls do not print.
      expect(text).not.toContain("Download PDF");
    }

    const start = Number((await sheet.installedCount()).split(" ")[0]);
    await sheet.tick("T02");
    await sheet.tick("T03");
    expect(await sheet.installedCount()).toMatch(new RegExp(`^${start + 2} of \\d+$`));
    await sheet.openLog();
    const log = page.getByTestId("log-list");
    for (const part of ["T02", "T03"])
      expect(await log.getByText(`Installed part ${part}.`).count()).toBeGreaterThanOrEqual(1);
    await page.screenshot({ path: screenshotPath("build-log"), fullPage: true });
    await context.close();
  });
});
