// Readable by everyone (issue 12): every page of every role, walked in one signed-in browser
// context per account, passes the axe-core audit for WCAG 2.0 / 2.1 levels A and AA with no
// serious or critical finding, and shows none of the program's internal names in its visible text.
// The e-mails the app sent (read back from the local mail sink) are held to the same list.
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { mimeParts, sunkMessages, subjectOf } from "../support/mail";
import { PeoplePage } from "./pages/people-page";
import { ReviewPage } from "./pages/review-page";
import { StudioPage } from "./pages/studio-page";
import { auditPage, describeFindings } from "./support/axe";
import { baseUrl, launchBrowser, screenshotPath } from "./support/browser";
import { WALK, type WalkPage } from "./support/demo-pages";
import { describeNames, internalNamesIn, internalNamesOnPage } from "./support/internal-names";
import { signedIn } from "./support/session";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

/** Opens a page of the walk and waits until what it draws in the browser is there. */
async function visit(page: Page, p: WalkPage) {
  const response = await page.goto(`${baseUrl}${p.path}`);
  expect(response?.status(), `${p.name}: ${p.path}`).toBe(p.status ?? 200);
  await page.locator("h1").filter({ hasText: p.heading }).first().waitFor();
  if (p.ready === "studio") {
    const studio = new StudioPage(page);
    await studio.waitForResult();
    await studio.waitForCheck();
  } else if (p.ready === "review") await new ReviewPage(page).waitForMockUp(1);
  else if (p.ready === "cut") await page.locator('[data-testid^="part-"]').first().waitFor({ timeout: 30_000 });
  else if (p.ready === "assembly") await page.getByTestId("assembly-sheet").waitFor();
}

describe("the detector of internal names", () => {
  it("finds each leak the issue names and nothing in the app's own prose", () => {
    const leaks = [
      "The twin-wheels mode needs periodsPerTurn",
      "semiMajor must be at least semiMinor",
      "The point is outside the outline (wheel.points[3])",
      "mode track-for-wheel, rotations free",
      "Unexpected end of input",
      "The root is not bracketed on [0, 1]",
      "The integrand is not finite at x = 2",
      "Axle height NaN mm",
      "Made by undefined",
      "[object Object]",
      "See SAFETY.md §2.2",
      "not_found",
    ];
    for (const leak of leaks) expect(internalNamesIn(leak), leak).not.toEqual([]);
    const prose = [
      "The fabricator picks a wheel (or a track) and gets the exact profile that keeps the axle level.",
      "100 mm inradius hexagon for the table-top lane. Contact stress 1.2 MPa, 3.4 kN, 12 kPa; μ = 0.8.",
      "Download trike-run-track-R1-track.dxf and job.zip; the installer ticks each part.",
      "Twin wheels · Track for a wheel · Period (one hump to the next) · Client approval: 1a2b3c4d5e6f/2026-11-20.",
      "Mozilla/5.0 (X11; Linux x86_64) AppleWebKit/537.36 (KHTML, like Gecko) HeadlessChrome/140.0.0.0 Safari/537.36",
    ];
    for (const text of prose) expect(internalNamesIn(text), text).toEqual([]);
  });
});

describe.each(WALK)("every page, as $label", (account) => {
  it(`passes the accessibility audit and shows no internal names (${account.pages.length} pages)`, async () => {
    const { context, page } = account.email
      ? await signedIn(browser, account.email)
      : await browser.newContext().then(async (c) => ({ context: c, page: await c.newPage() }));
    const problems: string[] = [];
    try {
      for (const p of account.pages) {
        // A page that does not open is reported with the rest, and the walk goes on.
        const opened = await visit(page, p).then(
          () => true,
          (e: Error) => (problems.push(`${p.path}: did not open as expected: ${e.message.split("\n")[0]}`), false),
        );
        if (!opened) continue;
        const found = [
          ...describeFindings(p.path, await auditPage(page)),
          ...describeNames(p.path, await internalNamesOnPage(page)),
        ];
        // A screenshot of each page with a finding, and of the few the walk names to look at.
        if (found.length > 0 || p.screenshot)
          await page.screenshot({
            path: screenshotPath(`readable-${(account.email ?? "visitor").split("@")[0]}-${p.name}`),
            fullPage: found.length > 0,
          });
        problems.push(...found);
      }
    } finally {
      await context.close();
    }
    expect(problems).toEqual([]);
  }, 600_000);
});

describe("the e-mails the app sent", () => {
  it("show no internal names either", async () => {
    // At least one message of our own: the welcome of a person the admin adds here.
    const tag = Date.now().toString(36);
    const admin = await signedIn(browser, "admin@example.test");
    const people = new PeoplePage(admin.page);
    await people.open();
    await people.addPerson({
      name: `Ivo Marsh ${tag}`,
      email: `ivo.${tag}@example.test`,
      role: "installer",
      password: "welcome-password-2026",
    });
    await admin.context.close();

    let messages = await sunkMessages();
    for (let i = 0; i < 60 && !messages.some((m) => m.to.includes(`ivo.${tag}@example.test`)); i++) {
      await new Promise((r) => setTimeout(r, 150));
      messages = await sunkMessages();
    }
    expect(
      messages.some((m) => m.to.includes(`ivo.${tag}@example.test`)),
      "the welcome e-mail arrived",
    ).toBe(true);
    const problems: string[] = [];
    for (const m of messages) {
      const subject = subjectOf(m);
      const texts = mimeParts(m.raw)
        .filter((p) => /^text\/(plain|html)/i.test(p.headers["content-type"] ?? "text/plain"))
        .map((p) =>
          /^text\/html/i.test(p.headers["content-type"] ?? "")
            ? htmlText(p.body.toString("utf8"))
            : p.body.toString("utf8"),
        );
      for (const text of [subject, ...texts])
        problems.push(
          ...internalNamesIn(text).map(
            (f) => `"${subject}" to ${m.to.join(", ")}: ${f.what} "${f.found}" in "…${f.context}…"`,
          ),
        );
    }
    expect(problems).toEqual([]);
  });
});

/** The words of an HTML part as a mail reader shows them: no style, script, tags or attributes. */
function htmlText(html: string): string {
  return html
    .replace(/<(style|script)[\s\S]*?<\/\1>/gi, " ")
    .replace(/<[^>]+>/g, " ")
    .replace(/&nbsp;/g, " ")
    .replace(/&amp;/g, "&")
    .replace(/&lt;/g, "<")
    .replace(/&gt;/g, ">")
    .replace(/&quot;/g, '"')
    .replace(/&#39;/g, "'");
}
