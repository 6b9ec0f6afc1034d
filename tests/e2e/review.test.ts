// The client's review in Chromium, end to end: the fabricator saves a revision and sends it with a
// deposit; the client opens the link from the captured e-mail on a phone, watches the mock-up roll
// (the drawn axle, read from the page's probe, stays level), pins a comment, approves, pays the
// deposit on the local payment service and comes back to a paid deposit; the cut-plan page then
// shows the approval's reference.
import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { mimeParts, partOfType, waitForMail } from "../support/mail";
import { ReviewPage, SendReviewForm } from "./pages/review-page";
import { StudioPage } from "./pages/studio-page";
import { baseUrl, launchBrowser, screenshotPath } from "./support/browser";
import { signedIn, VIEWPORTS } from "./support/session";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

const DESIGN = `Review run ${Date.now().toString(36)}`;

describe("the client's review", () => {
  it("goes from the fabricator's request to a signed, paid approval that the cut-plan page shows", async () => {
    // The fabricator saves a revision of a new design in the trike project and sends it.
    const shop = await signedIn(browser, "fabricator@example.test");
    const studio = new StudioPage(shop.page);
    await studio.create(1, DESIGN, /Square wheel/);
    const designId = Number(/\/designs\/(\d+)$/.exec(shop.page.url())![1]);
    await studio.saveRevision("For the client's review");
    await shop.page.goto(`${baseUrl}/projects/1`);
    const sent = await new SendReviewForm(shop.page).send({
      revision: `${DESIGN} R1`,
      message: "The trike run with your 6 m length. Please look at the humps near the entrance.",
      runLength: "6000",
      endTreatment: "flat",
      deposit: { amount: "250", currency: "GBP" },
    });
    expect(sent).toMatch(/Sent for review \(review \d+\); 1 e-mail\(s\) went out\./);
    await shop.page.screenshot({ path: screenshotPath("review-sent-project-page"), fullPage: true });

    // The client's e-mail: the link to the review, and the animated preview inline.
    const [mail] = await waitForMail("client@example.test", new RegExp(`Review requested: .*${DESIGN} R1`));
    expect(mail, "the review e-mail reached the client").toBeDefined();
    const parts = mimeParts(mail.raw);
    const text = partOfType(parts, /^text\/plain/)!.body.toString("utf8");
    const link = /https?:\/\/\S+\/projects\/1\/reviews\/\d+/.exec(text)![0];
    expect(partOfType(parts, /^image\/webp/), "the animated preview is attached").toBeDefined();

    // The client reviews on a phone.
    const client = await signedIn(browser, "client@example.test", VIEWPORTS.phone);
    await client.page.goto(link);
    const review = new ReviewPage(client.page);
    await review.waitForMockUp();
    await review.watch(90);
    const probe = (await review.probe())!;
    expect(probe.playing).toBe(true);
    expect(probe.runLengthMm).toBe(6000);
    // The drawn axle — set where the wheel's own outline rests on the track — stays on the axle line
    // within a pixel over the frames drawn (a square of side 400 mm keeps its axle level on its
    // catenary road: L. Hall and S. Wagon, "Roads and Wheels", Mathematics Magazine 65(5), 1992).
    const trace = probe.axleTrace.filter(Number.isFinite);
    expect(trace.length).toBeGreaterThanOrEqual(60);
    expect(Math.max(...trace) - Math.min(...trace)).toBeLessThanOrEqual(1);
    expect(Math.max(...trace.map((y) => Math.abs(y - probe.axleLine)))).toBeLessThanOrEqual(1);
    expect(probe.position).toBeGreaterThan(0);

    // A comment pinned where the wheel is, part way along the run.
    await review.pause();
    await review.scrubTo(0.3);
    await review.pinAndComment("Is this hump where the queue starts?");
    await client.page.getByText(/pin 1: .* along the run/).waitFor();
    expect(await client.page.getByText(/pin 1: .* along the run/).count()).toBe(1);
    await client.page.waitForFunction(() => window.__axlewrightReview?.markers === 1);
    await client.page.screenshot({ path: screenshotPath("review-phone"), fullPage: true });

    // Approval, then the deposit on the local payment service, then back to the review.
    await review.approve("Ada Penrose", 1);
    await client.page.waitForURL(/\/pay\/cs_test_/);
    await client.page.getByRole("button", { name: /^Pay / }).click();
    await client.page.waitForURL(/\/reviews\/\d+\?deposit=paid/);
    // The webhook may land a moment after the redirect: reload until the page says so.
    for (let i = 0; i < 20 && !/paid$/.test(await review.depositState().innerText()); i++) {
      await client.page.waitForTimeout(500);
      await client.page.reload();
    }
    expect(await review.depositState().innerText()).toBe("£250.00, paid");
    const reference = (await review.approvalReference().innerText()).trim();
    expect(reference).toMatch(/^[0-9a-f]{12}\/\d{4}-\d{2}-\d{2}$/);
    await client.page.screenshot({ path: screenshotPath("review-approved-phone"), fullPage: true });

    // The shop hears of it, and the cut-plan page carries the reference.
    expect(
      (await waitForMail("fabricator@example.test", new RegExp(`Approved: .*${DESIGN} R1`))).length,
    ).toBeGreaterThanOrEqual(1);
    await shop.page.goto(`${baseUrl}/projects/1/designs/${designId}/cut`);
    const onCutPage = shop.page.getByTestId("approval-reference");
    await onCutPage.waitFor();
    expect(await onCutPage.innerText()).toContain(reference);
    await shop.page.screenshot({ path: screenshotPath("cut-plan-approved"), fullPage: false });
    await Promise.all([shop.context.close(), client.context.close()]);
  });

  it("reads well on a tablet, and the shop sees it without a decision form", async () => {
    const tablet = await signedIn(browser, "client@example.test", VIEWPORTS.tablet);
    await tablet.page.goto(`${baseUrl}/projects`);
    await tablet.page.getByRole("link", { name: "Rolling shapes table" }).click();
    await tablet.page.getByRole("link", { name: "Open the review" }).first().click();
    const review = new ReviewPage(tablet.page);
    await review.waitForMockUp();
    // The drawing fills the tablet's width without spilling over it.
    const box = (await tablet.page.getByTestId("mockup-drawing").boundingBox())!;
    expect(box.width).toBeGreaterThan(700);
    expect(box.x + box.width).toBeLessThanOrEqual(VIEWPORTS.tablet.width);
    await tablet.page.screenshot({ path: screenshotPath("review-tablet"), fullPage: true });
    const url = tablet.page.url();
    await tablet.context.close();

    const shop = await signedIn(browser, "fabricator@example.test");
    await shop.page.goto(url);
    await new ReviewPage(shop.page).waitForMockUp();
    expect(await shop.page.getByTestId("decision-form").count()).toBe(0);
    expect(await shop.page.getByTestId("awaiting-client").innerText()).toMatch(/Only the project's client can approve/);
    await shop.context.close();
  });
});
