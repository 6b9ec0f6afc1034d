import type { Page } from "playwright-core";
import type { ReviewProbe } from "@/components/review/mock-up-probe";

/** The fabricator's send form on the project page. */
export class SendReviewForm {
  constructor(private readonly page: Page) {}

  async send(o: {
    revision: string;
    message: string;
    runLength?: string;
    endTreatment?: string;
    deposit?: { amount: string; currency: string };
  }) {
    const form = this.page.getByTestId("send-review-form");
    await form.getByLabel("Revision", { exact: true }).selectOption({ label: o.revision });
    await form.getByLabel("Message to the client").fill(o.message);
    if (o.runLength) await form.getByLabel("Run length", { exact: true }).fill(o.runLength);
    if (o.endTreatment) await form.getByLabel("End treatment").selectOption(o.endTreatment);
    if (o.deposit) {
      await form.getByLabel("Ask for a deposit on approval").check();
      await form.getByLabel("Deposit amount").fill(o.deposit.amount);
      await form.getByLabel("Currency").selectOption(o.deposit.currency);
    }
    await form.getByRole("button", { name: "Send for review" }).click();
    const message = this.page.getByTestId("send-review-message");
    await message.waitFor();
    return message.innerText();
  }
}

/** The review page: the mock-up, the comment thread, the decision. */
export class ReviewPage {
  constructor(private readonly page: Page) {}

  async waitForMockUp(frames = 30) {
    await this.page.getByTestId("mockup-drawing").waitFor({ timeout: 30_000 });
    await this.page.waitForFunction((n) => (window.__axlewrightReview?.frames ?? 0) >= n, frames, { timeout: 30_000 });
  }

  probe(): Promise<ReviewProbe | undefined> {
    return this.page.evaluate(
      () =>
        window.__axlewrightReview && {
          ...window.__axlewrightReview,
          axleTrace: [...window.__axlewrightReview.axleTrace],
        },
    );
  }

  /** Waits until at least `frames` more frames have been drawn while playing. */
  async watch(frames: number) {
    const start = (await this.probe())?.frames ?? 0;
    await this.page.waitForFunction((n) => (window.__axlewrightReview?.frames ?? 0) >= n, start + frames, {
      timeout: 30_000,
    });
  }

  pause() {
    return this.page.getByRole("group", { name: "Playback" }).getByRole("button", { name: /Pause/ }).click();
  }

  async scrubTo(share: number) {
    await this.page
      .getByRole("group", { name: "Playback" })
      .getByLabel("Position", { exact: true })
      .fill(String(share));
  }

  /** Pins the next comment where the wheel is now (the keyboard-friendly way), then posts it. */
  async pinAndComment(text: string) {
    await this.page.getByTestId("pin-toggle").click();
    await this.page.getByTestId("pin-at-wheel").click();
    await this.page.getByTestId("pin-at").waitFor();
    await this.page.getByRole("textbox", { name: "Add a comment" }).fill(text);
    await this.page.getByRole("button", { name: "Post comment" }).click();
    await this.page.getByTestId("comment-thread").getByRole("listitem").filter({ hasText: text }).waitFor();
  }

  async approve(name: string, revision: number) {
    const form = this.page.getByTestId("decision-form");
    await form.getByLabel("Your full name").fill(name);
    await form.getByLabel(`I approve revision ${revision} for fabrication`).check();
    await form.getByRole("button", { name: `Approve revision ${revision}` }).click();
  }

  approvalReference() {
    return this.page.getByTestId("approval-reference");
  }

  depositState() {
    return this.page.getByTestId("deposit-state");
  }
}
